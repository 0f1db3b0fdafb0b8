#!/usr/bin/env node
// Compiles the command (src/catalog, src/core) to lib/ with tsc (types are checked by
// `npm run typecheck`, so emit only), copies the worker bootstraps and the site build's
// resolution hook (plain .mjs) beside it, and bundles the derive worker (with the core) and the
// derive command each into one file.
// `--if-stale` skips the build when lib/ is newer than every source file (the test setup uses it).
import { execFileSync } from 'node:child_process';
import { copyFileSync, existsSync, readFileSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { topLevelConst } from './lib/topLevelConst.mjs';

const root = fileURLToPath(new URL('..', import.meta.url));
const stamp = path.join(root, 'lib', '.built');

function newest(dir) {
  let t = 0;
  for (const e of readdirSync(dir, { withFileTypes: true })) {
    const p = path.join(dir, e.name);
    t = Math.max(t, e.isDirectory() ? newest(p) : statSync(p).mtimeMs);
  }
  return t;
}

const sources = ['src/catalog', 'src/core'].map((d) => path.join(root, d));
// The build's own scripts count as sources: a change to how lib/ is made remakes it.
const buildFiles = ['tsconfig.cli.json', 'scripts/build-cli.mjs', 'scripts/lib/topLevelConst.mjs'].map((f) => path.join(root, f));
const stale = () => !existsSync(stamp) || Math.max(...sources.map(newest), ...buildFiles.map((f) => statSync(f).mtimeMs)) > statSync(stamp).mtimeMs;

if (!process.argv.includes('--if-stale') || stale()) {
  const tsc = createRequire(import.meta.url).resolve('typescript/bin/tsc');
  execFileSync(process.execPath, [tsc, '-p', path.join(root, 'tsconfig.cli.json'), '--noCheck'], { stdio: 'inherit' });
  copyFileSync(path.join(root, 'src/catalog/derive/deriveWorkerBootstrap.mjs'), path.join(root, 'lib/catalog/derive/deriveWorkerBootstrap.mjs'));
  copyFileSync(path.join(root, 'src/catalog/population/relationWorkerBootstrap.mjs'), path.join(root, 'lib/catalog/population/relationWorkerBootstrap.mjs'));
  copyFileSync(path.join(root, 'src/catalog/cli/siteResolveHook.mjs'), path.join(root, 'lib/catalog/cli/siteResolveHook.mjs'));
  const { build } = createRequire(import.meta.url)('esbuild');
  const bundled = { bundle: true, format: 'esm', platform: 'node', target: 'node20', logLevel: 'warning' };
  // The derive worker and the science core as one file (see src/catalog/derive/deriveWorkerEntry.ts).
  await build({
    ...bundled,
    entryPoints: [path.join(root, 'lib/catalog/derive/deriveWorkerEntry.js')],
    outfile: path.join(root, 'lib/catalog/derive/deriveWorker.bundle.js'),
  });
  // The derive command and everything of ours it imports as one file, which main loads instead of
  // the modules one by one. Packages stay imports. The error classes main tells apart with
  // instanceof stay imports of their own modules, shared with main (a bundled copy would be
  // another class).
  const cliDir = path.join(root, 'lib/catalog/cli');
  const sharedClasses = /[\\/]catalog[\\/](config[\\/]ConfigError|readers[\\/]CatalogError|cli[\\/]UsageError|outputs[\\/]OutputRefused)\.js$/;
  const keepSharedClasses = {
    name: 'keep-shared-classes',
    setup(b) {
      b.onResolve({ filter: /(ConfigError|CatalogError|UsageError|OutputRefused)\.js$/ }, (args) => {
        const file = path.resolve(args.resolveDir, args.path);
        if (!sharedClasses.test(file)) return undefined;
        const rel = path.relative(cliDir, file).split(path.sep).join('/');
        return { path: rel.startsWith('.') ? rel : `./${rel}`, external: true };
      });
    },
  };
  await build({
    ...bundled,
    entryPoints: [path.join(cliDir, 'deriveCommand.js')],
    outfile: path.join(cliDir, 'deriveCommand.bundle.js'),
    packages: 'external',
    plugins: [keepSharedClasses],
  });
  // esbuild writes the modules' top-level `const`s as `var`, which V8 reads from memory at every
  // use instead of building them into the optimized code (see lib/topLevelConst.mjs).
  for (const bundle of [path.join(root, 'lib/catalog/derive/deriveWorker.bundle.js'), path.join(cliDir, 'deriveCommand.bundle.js')]) {
    writeFileSync(bundle, topLevelConst(readFileSync(bundle, 'utf8')).code);
  }
  writeFileSync(stamp, new Date().toISOString() + '\n');
}
