/**
 * `npm start`: derive the demo catalog with its config, run the population step when the config
 * describes its survey (`survey:`), build the site for it, and serve it locally, printing the URL. Options: --config <census.config.yaml> (default the demo's),
 * --port <n> (default 4321).
 */
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { parse } from 'yaml';
import { serveStatic } from './lib/staticServer.ts';

const root = resolve(import.meta.dirname, '..');
const args = process.argv.slice(2);
const opt = (name: string, fallback: string): string => {
  const i = args.indexOf(name);
  return i >= 0 && args[i + 1] ? args[i + 1]! : fallback;
};
const configPath = resolve(opt('--config', resolve(root, 'data-demo/census.config.yaml')));
const port = Number(opt('--port', '4321'));

const config = parse(readFileSync(configPath, 'utf8')) as { output?: string; site?: { base?: string }; survey?: unknown };
const catalog = resolve(dirname(configPath), config.output ?? 'out/catalog.parquet');
let base = config.site?.base ?? '/';
if (!base.startsWith('/')) base = '/' + base;
if (!base.endsWith('/')) base += '/';

console.log(`Deriving the catalog of ${configPath} …`);
execFileSync(process.execPath, [resolve(root, 'bin/dawn-census.js'), 'derive', '-c', configPath, '-o', catalog], { stdio: 'inherit' });

if (config.survey !== undefined) {
  console.log('Space densities and the selection-aware relation (dawn-census population) …');
  execFileSync(process.execPath, [resolve(root, 'bin/dawn-census.js'), 'population', '-c', configPath, '--catalog', catalog], { stdio: 'inherit' });
}

console.log('Building the site …');
const dist = resolve(root, 'dist');
execFileSync(process.execPath, [resolve(root, 'node_modules/astro/astro.js'), 'build', '--silent'], {
  cwd: root,
  stdio: 'inherit',
  env: { ...process.env, CENSUS_CATALOG: catalog, CENSUS_BASE: base, CENSUS_OUT_DIR: dist },
});

const server = await serveStatic(dist, base, port);
console.log(`\nDawn Census is being served at ${server.url}\n(Ctrl-C stops it.)`);
