/**
 * `npm run bench:site`: how fast the published site is for a reader. Builds the site for the
 * demo catalog and for a synthetic 100,000-row catalog (generated with the demo population
 * model, derived with the CLI and few draws), serves each locally, and measures in headless
 * Chromium (fresh profile each time, so nothing is cached):
 *   - the time from navigation to the first drawn chart on the landing page;
 *   - the latency of a filter-and-aggregate query in the SQL workspace (first run, and the
 *     median of five more), also on a 1,000,000-row Parquet made by repeating the 100k rows
 *     with new ids;
 *   - the bytes the server sent for each.
 * Prints a table with the targets. Options: --n <rows> (default 100000), --draws <n> (200),
 * --keep (leave the work directory).
 */
import { execFileSync } from 'node:child_process';
import { createWriteStream, mkdirSync, mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { once } from 'node:events';
import { DuckDBInstance } from '@duckdb/node-api';
import { launchBrowser } from '../test/e2e/browser.ts';
import { csvLines } from './lib/demoCsv.ts';
import { iterateDemoObjects } from './lib/demoPopulation.ts';
import { serveStatic, type StaticServer } from './lib/staticServer.ts';

const root = resolve(import.meta.dirname, '..');
const args = process.argv.slice(2);
const opt = (name: string, fallback: string) => {
  const i = args.indexOf(name);
  return i >= 0 && args[i + 1] ? args[i + 1]! : fallback;
};
const N = Number(opt('--n', '100000'));
const DRAWS = opt('--draws', '200');
const keep = args.includes('--keep');

const QUERY = `SELECT floor(z) AS z_from, count(*) AS n, median(log_edd_ratio) AS median_log_edd_ratio
FROM census
WHERE log_mbh > 7 AND log_edd_ratio IS NOT NULL
GROUP BY z_from
ORDER BY z_from`;

const work = mkdtempSync(join(tmpdir(), 'census-bench-'));
const t = () => performance.now();
const secs = (ms: number) => `${(ms / 1000).toFixed(1)} s`;

function run(cmd: string[], env: Record<string, string> = {}): void {
  execFileSync(process.execPath, cmd, { cwd: root, stdio: ['ignore', 'ignore', 'inherit'], env: { ...process.env, ...env } });
}

function derive(csv: string, out: string, extra: string[] = []): void {
  run([join(root, 'bin/dawn-census.js'), 'derive', csv, '-c', join(root, 'data-demo/census.config.yaml'), '-o', out, '--quiet', ...extra]);
}

function build(catalog: string, dist: string, env: Record<string, string> = {}): number {
  const t0 = t();
  run([join(root, 'node_modules/astro/astro.js'), 'build', '--silent'], { CENSUS_CATALOG: catalog, CENSUS_OUT_DIR: dist, CENSUS_BASE: '/', ...env });
  return t() - t0;
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

async function repeatRows(parquet: string, out: string, times: number): Promise<void> {
  const db = await DuckDBInstance.create(':memory:');
  const con = await db.connect();
  try {
    await con.run(
      `COPY (SELECT * REPLACE (id || '~' || k AS id) FROM read_parquet('${parquet}') CROSS JOIN range(${times}) AS r(k) ORDER BY k, "row")
       TO '${out}' (FORMAT parquet, COMPRESSION zstd, ROW_GROUP_SIZE 122880)`,
    );
  } finally {
    con.closeSync();
    db.closeSync();
  }
}

interface Measure {
  firstChartMs: number | null;
  firstChartWarmMs: number | null;
  landingBytes: number;
  queryFirstMs: number | null;
  queryMedianMs: number | null;
  queryBytes: number;
  rows: string;
}

const bytesSince = (s: StaticServer, from: number) => s.log.slice(from).reduce((a, r) => a + r.bytes, 0);

/**
 * Records, in the page, the time (ms from navigation start) at which a chart first is in the
 * DOM. A string, not a function: tsx would wrap a function's inner names in a helper the page lacks.
 */
const WATCH_FIRST_CHART = `(() => {
  const check = () => {
    if (window.__firstChart === undefined && document.querySelector('[data-chart] svg')) window.__firstChart = performance.now();
  };
  new MutationObserver(check).observe(document, { childList: true, subtree: true });
  document.addEventListener('DOMContentLoaded', check);
})();`;

async function firstChart(page: import('playwright-core').Page, url: string): Promise<number> {
  await page.goto(url, { waitUntil: 'commit' });
  await page.waitForFunction(() => (window as unknown as { __firstChart?: number }).__firstChart !== undefined, undefined, { timeout: 120_000 });
  return page.evaluate(() => (window as unknown as { __firstChart: number }).__firstChart);
}

async function measure(server: StaticServer, landing: boolean): Promise<Measure> {
  const browser = await launchBrowser();
  const m: Measure = { firstChartMs: null, firstChartWarmMs: null, landingBytes: 0, queryFirstMs: null, queryMedianMs: null, queryBytes: 0, rows: '' };
  try {
    if (landing) {
      const ctx = await browser.newContext({ viewport: { width: 1366, height: 768 } });
      await ctx.addInitScript({ content: WATCH_FIRST_CHART });
      const page = await ctx.newPage();
      const from = server.log.length;
      m.firstChartMs = await firstChart(page, server.url);
      // Everything the page loads on its own before the reader touches it.
      await page.waitForLoadState('networkidle');
      m.landingBytes = bytesSince(server, from);
      m.firstChartWarmMs = await firstChart(page, server.url);
      await ctx.close();
    }
    const ctx = await browser.newContext({ viewport: { width: 1366, height: 768 } });
    const page = await ctx.newPage();
    const from = server.log.length;
    await page.goto(new URL(`query/?sql=${encodeURIComponent(QUERY)}`, server.url).href);
    const times: number[] = [];
    for (let i = 0; i < 6; i++) {
      await page.evaluate(() => document.querySelector('[data-result-summary]')?.removeAttribute('data-ms'));
      await page.locator('[data-run]').click();
      await page.waitForFunction(() => document.querySelector('[data-result-summary]')?.getAttribute('data-ms') || !document.querySelector('#sql-error')?.hasAttribute('hidden'), undefined, { timeout: 120_000 });
      const err = await page.locator('#sql-error').textContent();
      if (err) throw new Error(`The benchmark query failed: ${err}`);
      times.push(Number(await page.locator('[data-result-summary]').getAttribute('data-ms')));
      m.rows = (await page.locator('[data-result-summary]').getAttribute('data-rows')) ?? '';
    }
    m.queryBytes = bytesSince(server, from);
    m.queryFirstMs = times[0]!;
    const warm = times.slice(1).sort((a, b) => a - b);
    m.queryMedianMs = warm[Math.floor(warm.length / 2)]!;
    await ctx.close();
  } finally {
    await browser.close();
  }
  return m;
}

const mb = (b: number) => `${(b / 1e6).toFixed(1)} MB`;
const ms = (v: number | null) => (v === null ? '—' : `${Math.round(v)} ms`);

try {
  const results: { name: string; size: string; build: string; m: Measure; chartTarget?: number; queryTarget?: number }[] = [];

  console.log('Demo catalog: derive, build …');
  const demoParquet = join(work, 'demo/catalog.parquet');
  derive(join(root, 'data-demo/catalog.csv'), demoParquet);
  const demoDist = join(work, 'site-demo');
  const demoBuild = build(demoParquet, demoDist);

  console.log(`Synthetic catalog of ${N.toLocaleString('en')} rows: generate, derive (${DRAWS} draws), build …`);
  mkdirSync(join(work, 'big'), { recursive: true });
  const bigCsv = join(work, 'big/catalog.csv');
  let t0 = t();
  await writeSyntheticCsv(bigCsv, N);
  const bigParquet = join(work, 'big/catalog.parquet');
  derive(bigCsv, bigParquet, ['--draws', DRAWS]);
  const deriveBig = t() - t0;
  const bigDist = join(work, 'site-big');
  const bigBuild = build(bigParquet, bigDist);

  console.log('1,000,000-row Parquet: repeat the rows ×10 with new ids …');
  const millionParquet = join(work, 'million/catalog.parquet');
  mkdirSync(join(work, 'million'), { recursive: true });
  await repeatRows(bigParquet, millionParquet, Math.max(1, Math.round(1_000_000 / N)));
  const millionDist = join(work, 'site-million');
  const millionBuild = build(millionParquet, millionDist);

  for (const [name, dist, parquet, buildMs, landing, chartTarget, queryTarget] of [
    ['demo', demoDist, demoParquet, demoBuild, true, 300, undefined],
    [`${Math.round(N / 1000)}k`, bigDist, bigParquet, bigBuild, true, 1000, undefined],
    ['1M', millionDist, millionParquet, millionBuild, true, 1000, 200],
  ] as const) {
    const server = await serveStatic(dist, '/');
    try {
      console.log(`Measuring ${name} …`);
      const m = await measure(server, landing);
      results.push({ name, size: mb(statSync(parquet).size), build: buildMs === null ? '—' : secs(buildMs), m, chartTarget, queryTarget });
    } finally {
      await server.close();
    }
  }

  console.log(`\n(${N.toLocaleString('en')} rows derived in ${secs(deriveBig)})\n`);
  const head = ['catalog', 'Parquet', 'build', 'first chart (cold)', 'first chart (warm)', 'landing bytes before interaction', 'query (first)', 'query (median of 5)', 'query bytes', 'result rows'];
  const lines = results.map((r) => [
    r.name,
    r.size,
    r.build,
    ms(r.m.firstChartMs) + (r.chartTarget ? (r.m.firstChartMs! <= r.chartTarget ? ' ✓' : ` ✗ (≤ ${r.chartTarget})`) : ''),
    ms(r.m.firstChartWarmMs),
    r.m.landingBytes ? mb(r.m.landingBytes) : '—',
    ms(r.m.queryFirstMs),
    ms(r.m.queryMedianMs) + (r.queryTarget ? (r.m.queryMedianMs! <= r.queryTarget ? ' ✓' : ` ✗ (≤ ${r.queryTarget})`) : ''),
    mb(r.m.queryBytes),
    r.m.rows,
  ]);
  const widths = head.map((h, i) => Math.max(h.length, ...lines.map((l) => l[i]!.length)));
  const fmt = (cells: readonly string[]) => '| ' + cells.map((c, i) => c.padEnd(widths[i]!)).join(' | ') + ' |';
  console.log(fmt(head));
  console.log('|' + widths.map((w) => '-'.repeat(w + 2)).join('|') + '|');
  for (const l of lines) console.log(fmt(l));
  console.log(`\nTargets: first chart (cold) ≤ 300 ms and ≤ 1 MB before interaction (demo), ≤ 1 s (100k, 1M); query ≤ 200 ms at 1M (warm median). Query:\n${QUERY}`);
} finally {
  if (keep) console.log(`Work directory kept: ${work}`);
  else rmSync(work, { recursive: true, force: true });
}
