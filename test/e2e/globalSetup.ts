/**
 * Builds every site variant the end-to-end tests need ONCE and serves each on a free local
 * port: the demo catalog at the root, the same under a sub-path (/census/), a hostile catalog
 * (markup, quotes and non-Latin text in ids, passthrough columns and the config's texts), and
 * the root build with its Parquet file removed. Catalogs are derived with the CLI; the demo's population results
 * (dawn-census population) come from a cheaper sampler than the demo config's (see cheapSurveyConfig).
 * URLs and file paths reach the tests through `inject(...)`.
 */
import type { TestProject } from 'vitest/node';
import { execFileSync } from 'node:child_process';
import { cpSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { parse, stringify } from 'yaml';
import { serveStatic, type StaticServer } from '../../scripts/lib/staticServer.ts';
import { findChromium } from './browser.ts';
import { HOSTILE_CONFIG, hostileCsv } from './hostileCatalog.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    /** Demo catalog built at the root. */
    siteUrl: string;
    /** Demo catalog built under /census/. */
    subUrl: string;
    /** Hostile catalog built at the root. */
    hostileUrl: string;
    /** The root build with data/catalog.parquet removed. */
    missingUrl: string;
    /** The root build with data/catalog.parquet replaced by bytes that are not Parquet. */
    corruptUrl: string;
    /** Demo catalog built with CENSUS_OBJECT_PAGES=viewer (the layout of large catalogs). */
    viewerUrl: string;
    /** The demo catalog's Parquet file (the one copied into the site). */
    demoParquet: string;
    /** The hostile catalog's Parquet file. */
    hostileParquet: string;
  }
}

const root = resolve(import.meta.dirname, '../..');
const servers: StaticServer[] = [];
let outDir: string | undefined;

/**
 * The demo config with absolute paths, writing to `catalog`, and the smallest sampler the config allows (8 walkers ×
 * 100 steps instead of 16 walkers until convergence, some 2000 steps): the pages need the population results'
 * shape, not a converged fit, and the full run costs a minute or more of CPU on a 2-core machine.
 */
function cheapSurveyConfig(catalog: string): string {
  const doc = parse(readFileSync(join(root, 'data-demo/census.config.yaml'), 'utf8')) as {
    input: { path: string };
    output?: string;
    survey: { relation_fit?: Record<string, unknown> };
  };
  doc.input.path = join(root, 'data-demo', doc.input.path);
  doc.output = catalog;
  doc.survey.relation_fit = { ...doc.survey.relation_fit, walkers: 8, steps: 100 };
  return stringify(doc);
}

function derive(args: string[]): void {
  execFileSync(process.execPath, [join(root, 'bin/dawn-census.js'), 'derive', ...args, '--quiet'], { cwd: root, stdio: ['ignore', 'ignore', 'inherit'] });
}

/**
 * The environment of a child build: vitest sets Vite's own variables (BASE_URL, MODE, …) in
 * process.env, and a build that inherits BASE_URL=/ would link every page to the root.
 */
function buildEnv(extra: Record<string, string>): NodeJS.ProcessEnv {
  const env = { ...process.env };
  for (const k of ['BASE_URL', 'MODE', 'DEV', 'PROD', 'SSR', 'NODE_ENV']) delete env[k];
  for (const k of Object.keys(env)) if (k.startsWith('VITEST') || k.startsWith('VITE_')) delete env[k];
  return { ...env, ...extra };
}

function build(catalog: string, base: string, dist: string, extra: Record<string, string> = {}): void {
  execFileSync(process.execPath, [join(root, 'node_modules/astro/astro.js'), 'build', '--silent'], {
    cwd: root,
    env: buildEnv({ CENSUS_CATALOG: catalog, CENSUS_OUT_DIR: dist, CENSUS_BASE: base, ...extra }),
    stdio: ['ignore', 'ignore', 'inherit'],
  });
}

export async function setup(project: TestProject): Promise<void> {
  findChromium(); // fail early, with the install hint, when there is no browser
  outDir = mkdtempSync(join(tmpdir(), 'census-e2e-'));
  const demoParquet = join(outDir, 'demo/catalog.parquet');
  derive([join(root, 'data-demo/catalog.csv'), '-c', join(root, 'data-demo/census.config.yaml'), '-o', demoParquet, '--draws', '300']);
  const cheapConfig = join(outDir, 'demo/census.config.yaml');
  writeFileSync(cheapConfig, cheapSurveyConfig(demoParquet));
  execFileSync(process.execPath, [join(root, 'bin/dawn-census.js'), 'population', '-c', cheapConfig, '--quiet'], { cwd: root, stdio: ['ignore', 'ignore', 'inherit'] });

  const hostileDir = join(outDir, 'hostile');
  mkdirSync(hostileDir, { recursive: true });
  writeFileSync(join(hostileDir, 'hostile.csv'), hostileCsv());
  writeFileSync(join(hostileDir, 'hostile.config.yaml'), HOSTILE_CONFIG);
  const hostileParquet = join(hostileDir, 'out/catalog.parquet');
  derive([join(hostileDir, 'hostile.csv'), '-c', join(hostileDir, 'hostile.config.yaml'), '-o', hostileParquet]);

  const rootDist = join(outDir, 'site-root');
  const subDist = join(outDir, 'site-sub');
  const hostileDist = join(outDir, 'site-hostile');
  const missingDist = join(outDir, 'site-missing');
  build(demoParquet, '/', rootDist);
  build(demoParquet, '/census/', subDist);
  build(hostileParquet, '/', hostileDist);
  const viewerDist = join(outDir, 'site-viewer');
  build(demoParquet, '/', viewerDist, { CENSUS_OBJECT_PAGES: 'viewer' });
  cpSync(rootDist, missingDist, { recursive: true });
  rmSync(join(missingDist, 'data/catalog.parquet'));
  const corruptDist = join(outDir, 'site-corrupt');
  cpSync(missingDist, corruptDist, { recursive: true });
  writeFileSync(join(corruptDist, 'data/catalog.parquet'), 'PAR1 this is not a Parquet file, only its first four bytes are right. '.repeat(40));

  const serve = async (dist: string, base: string) => {
    const s = await serveStatic(dist, base);
    servers.push(s);
    return s.url;
  };
  project.provide('siteUrl', await serve(rootDist, '/'));
  project.provide('subUrl', await serve(subDist, '/census/'));
  project.provide('hostileUrl', await serve(hostileDist, '/'));
  project.provide('missingUrl', await serve(missingDist, '/'));
  project.provide('corruptUrl', await serve(corruptDist, '/'));
  project.provide('viewerUrl', await serve(viewerDist, '/'));
  project.provide('demoParquet', demoParquet);
  project.provide('hostileParquet', hostileParquet);
}

export async function teardown(): Promise<void> {
  await Promise.all(servers.map((s) => s.close()));
  if (outDir) rmSync(outDir, { recursive: true, force: true });
}
