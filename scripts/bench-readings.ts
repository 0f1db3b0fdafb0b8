/**
 * `npm run bench:readings`: how fast the Readings page re-derives the population under a reader's
 * own reading. Builds (or, with --reuse <dir>, reuses) a site for the demo catalog (400 objects ×
 * 2000 draws) and for a synthetic catalog (10,000 objects × 200 draws, generated with the demo
 * population model and derived under the standard reading only, to save time), serves each
 * locally and drives headless Chromium: opens the Readings page, waits until the page is idle,
 * then submits a custom reading several times (a different width deflation each time) and reads
 * the page's performance marks, from the submit to the redrawn summary, charts and comparison:
 *   - first: the first submit on a freshly opened page (a fresh browser profile each time), once
 *     the page has started and warmed its workers (it does so by itself after drawing);
 *   - again: the following submits on the same page.
 * Prints the best and worst of each, with the split (inputs ready, derived, summary row painted,
 * everything drawn), and the load average. Options: --n <objects> (10000), --draws <n> (200), --pages <n> fresh pages (3),
 * --again <n> submits after the first (4), --reuse <dir> (derive and build there once, reuse
 * later), --rebuild (with --reuse: build the sites again from the kept catalogs, after a change
 * to the site), --only demo|big.
 */
import { execFileSync } from 'node:child_process';
import { createWriteStream, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { once } from 'node:events';
import { parse, stringify } from 'yaml';
import type { Page } from 'playwright-core';
import { launchBrowser } from '../test/e2e/browser.ts';
import { csvLines } from './lib/demoCsv.ts';
import { iterateDemoObjects } from './lib/demoPopulation.ts';
import { serveStatic } from './lib/staticServer.ts';

const root = resolve(import.meta.dirname, '..');
const args = process.argv.slice(2);
const opt = (name: string, fallback: string) => {
  const i = args.indexOf(name);
  return i >= 0 && args[i + 1] ? args[i + 1]! : fallback;
};
const N = Number(opt('--n', '10000'));
const DRAWS = opt('--draws', '200');
const PAGES = Number(opt('--pages', '3'));
const AGAIN = Number(opt('--again', '4'));
const reuse = opt('--reuse', '');
const only = opt('--only', '');
const rebuild = args.includes('--rebuild');
const work = reuse || mkdtempSync(join(tmpdir(), 'census-bench-readings-'));

function run(cmd: string[], env: Record<string, string> = {}): void {
  execFileSync(process.execPath, cmd, { cwd: root, stdio: ['ignore', 'ignore', 'inherit'], env: { ...process.env, ...env } });
}

/** Builds the site; `viewer`: one in-browser object page instead of one page per object (faster; the Readings page is the same). */
function build(catalog: string, dist: string, viewer = false): void {
  run([join(root, 'node_modules/astro/astro.js'), 'build', '--silent'], { CENSUS_CATALOG: catalog, CENSUS_OUT_DIR: dist, CENSUS_BASE: '/', ...(viewer ? { CENSUS_OBJECT_PAGES: 'viewer' } : {}) });
}

/** The demo config with an absolute input path, `extra` merged in. */
function configWith(extra: Record<string, unknown>, csv: string, out: string): string {
  const doc = parse(readFileSync(join(root, 'data-demo/census.config.yaml'), 'utf8')) as Record<string, unknown>;
  const path = join(out, '..', 'census.config.yaml');
  writeFileSync(path, stringify({ ...doc, ...extra, input: { ...(doc.input as object), path: csv }, output: out }));
  return path;
}

async function writeSyntheticCsv(path: string, n: number): Promise<void> {
  const out = createWriteStream(path);
  for (const line of csvLines((function* () {
    for (const o of iterateDemoObjects({ n, seed: 777 })) yield o.row;
  })())) {
    if (!out.write(line)) await once(out, 'drain');
  }
  out.end();
  await once(out, 'finish');
}

/** Builds the site `name` in the work directory unless it is there already; returns its dist. */
async function site(name: 'demo' | 'big'): Promise<string> {
  const dir = join(work, name);
  const dist = join(dir, 'site');
  if (existsSync(join(dist, 'readings/index.html')) && !rebuild) return dist;
  mkdirSync(dir, { recursive: true });
  const parquet = join(dir, 'catalog.parquet');
  if (existsSync(join(dir, 'catalog.meta.json'))) {
    console.log(`${name}: the site is built again from the kept catalog …`);
    rmSync(dist, { recursive: true, force: true });
  } else if (name === 'demo') {
    console.log('Demo catalog: derive (2000 draws, every reading), build …');
    const config = configWith({}, join(root, 'data-demo/catalog.csv'), parquet);
    run([join(root, 'bin/dawn-census.js'), 'derive', '-c', config, '--quiet']);
  } else {
    console.log(`Synthetic catalog of ${N.toLocaleString('en')} objects: generate, derive (${DRAWS} draws, the standard reading), build …`);
    const csv = join(dir, 'catalog.csv');
    await writeSyntheticCsv(csv, N);
    const config = configWith({ readings: { use: ['standard'] } }, csv, parquet);
    run([join(root, 'bin/dawn-census.js'), 'derive', '-c', config, '--draws', DRAWS, '--quiet']);
  }
  build(parquet, dist, name === 'big');
  return dist;
}

interface Submit {
  /** Submit to the redrawn summary, charts and comparison, ms. */
  total: number;
  /** Submit to the painted summary row (the charts follow), ms. */
  summary: number;
  inputs: number;
  derived: number;
  objects: number;
}

/** Submits the custom reading with width deflation `d` and reads the page's marks of that submit. */
async function submit(page: Page, d: number): Promise<Submit> {
  await page.evaluate(() => performance.clearMarks());
  await page.fill('[data-custom-form] [name="deflation"]', String(d));
  await page.fill('[data-custom-form] [name="l5100"]', '5');
  await page.click('[data-custom-form] button[type="submit"]');
  await page.waitForFunction(() => performance.getEntriesByName('census:custom:drawn').length > 0, undefined, { timeout: 300_000 });
  // A string, not a function: tsx would wrap a function's inner names in a helper the page lacks.
  return page.evaluate(`(() => {
    const at = (n) => performance.getEntriesByName(n)[0].startTime;
    const start = at('census:custom:start');
    return {
      total: at('census:custom:drawn') - start,
      summary: at('census:custom:summary') - start,
      inputs: at('census:custom:inputs') - start,
      derived: at('census:custom:derived') - start,
      objects: Number(document.querySelector('[data-readings-page]')?.dataset.customDerived ?? 0),
    };
  })()`) as Promise<Submit>;
}

async function measure(url: string): Promise<{ first: Submit[]; again: Submit[]; ready: number[] }> {
  const ready: number[] = [];
  const first: Submit[] = [];
  const again: Submit[] = [];
  for (let p = 0; p < PAGES; p++) {
    const browser = await launchBrowser();
    try {
      const page = await (await browser.newContext({ viewport: { width: 1366, height: 768 } })).newPage();
      page.on('pageerror', (e) => console.error(`page error: ${e.message}`));
      await page.goto(new URL('readings/', url).href);
      await page.waitForFunction(() => document.querySelector<HTMLElement>('#reading-charts')?.dataset.reading, undefined, { timeout: 120_000 });
      await page.waitForLoadState('networkidle');
      // The workers are started, fed and warmed once the page has drawn (up to 20,000 objects): the first submit comes after that.
      await page.waitForFunction(() => document.querySelector<HTMLElement>('[data-readings-page]')?.dataset.liveReady === 'true', undefined, { timeout: 120_000 });
      // When the workers were fed and warmed (ms after the page was opened): a submit before that waits for it ('inputs').
      ready.push((await page.evaluate(`performance.getEntriesByName('census:live:ready')[0]?.startTime ?? NaN`)) as number);
      first.push(await submit(page, 2));
      for (let i = 0; i < AGAIN; i++) again.push(await submit(page, 2.5 + 0.5 * i));
    } finally {
      await browser.close();
    }
  }
  return { first, again, ready };
}

const ms = (v: number) => `${Math.round(v)} ms`;
const range = (xs: number[]) => (xs.length ? `${ms(Math.min(...xs))} – ${ms(Math.max(...xs))}` : '—');
const split = (xs: Submit[]) => {
  const best = xs.reduce((a, b) => (b.total < a.total ? b : a));
  return `inputs ${ms(best.inputs)}, derived ${ms(best.derived)}, summary painted ${ms(best.summary)}, drawn ${ms(best.total)}`;
};

try {
  const lines: string[] = [];
  const load = () => loadavg().map((x) => x.toFixed(2)).join(' ');
  for (const [name, target] of [['demo', 300], ['big', 2000]] as const) {
    if (only && only !== name) continue;
    const dist = await site(name);
    const server = await serveStatic(dist, '/');
    try {
      console.log(`Measuring ${name} (load average ${load()}) …`);
      const { first, again, ready } = await measure(server.url);
      const objects = first[0]?.objects ?? 0;
      const draws = name === 'demo' ? 2000 : Number(DRAWS);
      const best = Math.min(...first.map((s) => s.total), ...again.map((s) => s.total));
      lines.push(
        `${name}: ${objects.toLocaleString('en')} objects × ${draws} draws; target ≤ ${target} ms ${best <= target ? '(met at best)' : '(not met)'}`,
        `  first submit on a fresh page: ${range(first.map((s) => s.total))} (best: ${split(first)})`,
        `  later submits:                ${range(again.map((s) => s.total))} (best: ${split(again)})`,
        `  summary painted: first ${range(first.map((s) => s.summary))}, later ${range(again.map((s) => s.summary))}`,
        `  workers fed and warmed ${range(ready)} after the page was opened (in the background; a submit before waits)`,
      );
    } finally {
      await server.close();
    }
  }
  console.log(`\n${new Date().toISOString().slice(0, 10)}, load average ${load()} (1, 5, 15 min)\n${lines.join('\n')}`);
} finally {
  if (reuse) console.log(`Sites kept in ${work}`);
  else rmSync(work, { recursive: true, force: true });
}
