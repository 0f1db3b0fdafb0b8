/**
 * `npm run bench:site`: how fast the published site is for a reader. Builds the site for the
 * demo catalog and for a synthetic 100,000-row catalog (generated with the demo population
 * model, derived with the CLI, few draws and the `standard` reading only, so the derivation does
 * not dominate the run), and for 1,000,000 rows made by repeating those rows (and their readings)
 * with new ids; serves each locally, and measures in headless Chromium (fresh profile each time,
 * so nothing is cached):
 *   - the time from navigation to the first drawn chart on the landing page;
 *   - the latency of a filter-and-aggregate query in the SQL workspace (first run, and the
 *     median of five more), also on a 1,000,000-row Parquet made by repeating the 100k rows
 *     with new ids;
 *   - the bytes the server sent for each.
 * It also records each build's wall time, peak memory (with /usr/bin/time) and size on disk.
 * Every site is measured --runs times (default 3), each in a fresh browser; the table gives the
 * best and worst, and the load average before each catalog's runs (the machine is shared).
 * Options: --n <rows> (default 100000), --draws <n> (200), --runs <n> (3), --keep (leave the
 * work directory), --work <dir> (reuse a kept work directory: skips what is already there).
 */
import { spawnSync } from 'node:child_process';
import { copyFileSync, createWriteStream, existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { parse, stringify } from 'yaml';
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
const RUNS = Math.max(1, Number(opt('--runs', '3')));
const given = opt('--work', '');
const keep = args.includes('--keep') || given !== '';

const QUERY = `SELECT floor(z) AS z_from, count(*) AS n, median(log_edd_ratio) AS median_log_edd_ratio
FROM census
WHERE log_mbh > 7 AND log_edd_ratio IS NOT NULL
GROUP BY z_from
ORDER BY z_from`;

const work = given ? resolve(given) : mkdtempSync(join(tmpdir(), 'census-bench-'));
mkdirSync(work, { recursive: true });
const t = () => performance.now();
const secs = (ms: number) => `${(ms / 1000).toFixed(1)} s`;

const TIME = '/usr/bin/time';

/** Runs node with `cmd`; returns the peak resident memory in bytes when /usr/bin/time is there. */
function run(cmd: string[], env: Record<string, string> = {}): number | null {
  const measured = existsSync(TIME);
  const r = spawnSync(measured ? TIME : process.execPath, measured ? ['-f', 'census-bench-maxrss %M', process.execPath, ...cmd] : cmd, {
    cwd: root,
    stdio: ['ignore', 'ignore', 'pipe'],
    env: { ...process.env, ...env },
    maxBuffer: 64 * 1024 * 1024,
  });
  const err = r.stderr?.toString() ?? '';
  if (r.status !== 0) throw new Error(`${cmd.slice(0, 2).join(' ')} failed (${r.status ?? r.signal}):\n${err.slice(-4000)}`);
  const m = /census-bench-maxrss (\d+)/.exec(err);
  return m ? Number(m[1]) * 1024 : null;
}

/** The demo config with only the `standard` reading (the benchmark measures the site, not four derivations). */
function benchConfig(): string {
  const path = join(work, 'bench.config.yaml');
  const doc = parse(readFileSync(join(root, 'data-demo/census.config.yaml'), 'utf8')) as Record<string, unknown>;
  doc.readings = { use: ['standard'] };
  writeFileSync(path, stringify(doc));
  return path;
}

function derive(csv: string, out: string, extra: string[] = []): void {
  if (existsSync(out)) return;
  run([join(root, 'bin/dawn-census.js'), 'derive', csv, '-c', benchConfig(), '-o', out, '--quiet', ...extra]);
}

interface Built {
  ms: number | null;
  maxRss: number | null;
  bytes: number;
}

function dirBytes(dir: string): number {
  let n = 0;
  for (const e of readdirSync(dir, { recursive: true, withFileTypes: true })) if (e.isFile()) n += statSync(join(e.parentPath, e.name)).size;
  return n;
}

function build(catalog: string, dist: string, env: Record<string, string> = {}): Built {
  if (existsSync(join(dist, 'index.html'))) return { ms: null, maxRss: null, bytes: dirBytes(dist) };
  const t0 = t();
  const maxRss = run([join(root, 'node_modules/astro/astro.js'), 'build', '--silent'], { CENSUS_CATALOG: catalog, CENSUS_OUT_DIR: dist, CENSUS_BASE: '/', ...env });
  return { ms: t() - t0, maxRss, bytes: dirBytes(dist) };
}

async function writeSyntheticCsv(path: string, n: number): Promise<void> {
  if (existsSync(path)) return;
  const out = createWriteStream(path);
  for (const line of csvLines((function* () {
    for (const o of iterateDemoObjects({ n, seed: 777 })) yield o.row;
  })())) {
    if (!out.write(line)) await once(out, 'drain');
  }
  out.end();
  await once(out, 'finish');
}

/**
 * Repeats the rows of catalog `parquet` `times` times with new ids (`<id>~<k>`), and its readings
 * table likewise; the metadata sidecar is copied (it describes the 100k input, which the site only shows).
 */
async function repeatRows(parquet: string, out: string, times: number): Promise<void> {
  if (existsSync(out)) return;
  const db = await DuckDBInstance.create(':memory:');
  const con = await db.connect();
  const base = (p: string) => p.replace(/\.parquet$/, '');
  try {
    await con.run(
      `COPY (SELECT * REPLACE (id || '~' || k AS id) FROM read_parquet('${parquet}') CROSS JOIN range(${times}) AS r(k) ORDER BY k, "row")
       TO '${out}.part' (FORMAT parquet, COMPRESSION zstd, ROW_GROUP_SIZE 122880)`,
    );
    const readings = `${base(parquet)}.readings.parquet`;
    if (existsSync(readings)) {
      await con.run(
        `COPY (SELECT * REPLACE (id || '~' || k AS id) FROM read_parquet('${readings}') CROSS JOIN range(${times}) AS r(k) ORDER BY k)
         TO '${base(out)}.readings.parquet' (FORMAT parquet, COMPRESSION zstd, ROW_GROUP_SIZE 122880)`,
      );
    }
    copyFileSync(`${base(parquet)}.meta.json`, `${base(out)}.meta.json`);
    const { renameSync } = await import('node:fs');
    renameSync(`${out}.part`, out);
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
const load = () => loadavg().map((x) => x.toFixed(1)).join(' ');

/** "best–worst" of the finite values, with a unit. */
function range(values: (number | null)[], fmt: (v: number) => string): string {
  const v = values.filter((x): x is number => x !== null && Number.isFinite(x)).sort((a, b) => a - b);
  if (v.length === 0) return '—';
  return v.length === 1 || fmt(v[0]!) === fmt(v.at(-1)!) ? fmt(v[0]!) : `${fmt(v[0]!)}–${fmt(v.at(-1)!)}`;
}

try {
  console.log(`Work directory: ${work}; load average ${load()}`);
  console.log('Demo catalog: derive, build …');
  mkdirSync(join(work, 'demo'), { recursive: true });
  const demoParquet = join(work, 'demo/catalog.parquet');
  derive(join(root, 'data-demo/catalog.csv'), demoParquet);
  const demoDist = join(work, 'site-demo');
  const demoBuild = build(demoParquet, demoDist);

  console.log(`Synthetic catalog of ${N.toLocaleString('en')} rows: generate, derive (${DRAWS} draws, reading standard), build …`);
  mkdirSync(join(work, 'big'), { recursive: true });
  const bigCsv = join(work, 'big/input.csv');
  let t0 = t();
  await writeSyntheticCsv(bigCsv, N);
  const bigParquet = join(work, 'big/catalog.parquet');
  const derivedBefore = existsSync(bigParquet);
  derive(bigCsv, bigParquet, ['--draws', DRAWS]);
  const deriveBig = derivedBefore ? null : t() - t0;
  const bigDist = join(work, 'site-big');
  const bigBuild = build(bigParquet, bigDist);

  const times = Math.max(1, Math.round(1_000_000 / N));
  console.log(`${(N * times).toLocaleString('en')}-row Parquet: repeat the rows ×${times} with new ids, build …`);
  const millionParquet = join(work, 'million/catalog.parquet');
  mkdirSync(join(work, 'million'), { recursive: true });
  t0 = t();
  await repeatRows(bigParquet, millionParquet, times);
  const millionDist = join(work, 'site-million');
  const millionBuild = build(millionParquet, millionDist);

  const results: { name: string; size: string; built: Built; loads: string[]; m: Measure[]; chartTarget?: number; queryTarget?: number }[] = [];
  for (const [name, dist, parquet, built, chartTarget, queryTarget] of [
    ['demo', demoDist, demoParquet, demoBuild, 300, undefined],
    [`${Math.round(N / 1000)}k`, bigDist, bigParquet, bigBuild, 1000, undefined],
    [N * times === 1_000_000 ? '1M' : `${N * times}`, millionDist, millionParquet, millionBuild, 1000, 200],
  ] as const) {
    const server = await serveStatic(dist, '/');
    const loads: string[] = [];
    const m: Measure[] = [];
    try {
      for (let i = 0; i < RUNS; i++) {
        loads.push(load());
        console.log(`Measuring ${name}, run ${i + 1} of ${RUNS} (load average ${loads.at(-1)}) …`);
        m.push(await measure(server, true));
      }
      results.push({ name, size: mb(statSync(parquet).size), built, loads, m, chartTarget, queryTarget });
    } finally {
      await server.close();
    }
  }

  console.log(`\n(${N.toLocaleString('en')} rows ${deriveBig === null ? 'derived in an earlier run' : `derived in ${secs(deriveBig)}`})\n`);
  const head = ['catalog', 'Parquet', 'build (wall, peak memory, site size)', 'first chart (cold)', 'first chart (warm)', 'bytes before interaction', 'query (first)', 'query (median of 5)', 'query bytes', 'result rows', 'load average (1, 5, 15 min)'];
  const lines = results.map((r) => {
    const cold = r.m.map((x) => x.firstChartMs);
    const warmQuery = r.m.map((x) => x.queryMedianMs);
    const worstCold = Math.max(...cold.map((x) => x ?? Infinity));
    const worstQuery = Math.max(...warmQuery.map((x) => x ?? Infinity));
    return [
      r.name,
      r.size,
      `${r.built.ms === null ? 'built earlier' : secs(r.built.ms)}, ${r.built.maxRss === null ? '—' : mb(r.built.maxRss)}, ${mb(r.built.bytes)}`,
      range(cold, (v) => ms(v)) + (r.chartTarget ? (worstCold <= r.chartTarget ? ' ✓' : ` (≤ ${r.chartTarget})`) : ''),
      range(r.m.map((x) => x.firstChartWarmMs), (v) => ms(v)),
      range(r.m.map((x) => x.landingBytes || null), mb),
      range(r.m.map((x) => x.queryFirstMs), (v) => ms(v)),
      range(warmQuery, (v) => ms(v)) + (r.queryTarget ? (worstQuery <= r.queryTarget ? ' ✓' : ` (≤ ${r.queryTarget})`) : ''),
      range(r.m.map((x) => x.queryBytes), mb),
      r.m[0]?.rows ?? '',
      `${r.loads[0]} … ${r.loads.at(-1)}`,
    ];
  });
  const widths = head.map((h, i) => Math.max(h.length, ...lines.map((l) => l[i]!.length)));
  const fmt = (cells: readonly string[]) => '| ' + cells.map((c, i) => c.padEnd(widths[i]!)).join(' | ') + ' |';
  console.log(fmt(head));
  console.log('|' + widths.map((w) => '-'.repeat(w + 2)).join('|') + '|');
  for (const l of lines) console.log(fmt(l));
  console.log(`\nBest–worst of ${RUNS} runs each; ✓ when the worst run meets the target. Load average at the end: ${load()}.`);
  console.log(`Targets: first chart (cold) ≤ 300 ms and ≤ 1 MB before interaction (demo), ≤ 1 s (100k, 1M); query ≤ 200 ms at 1M (warm median). Query:\n${QUERY}`);
} finally {
  if (keep) console.log(`Work directory kept: ${work}`);
  else rmSync(work, { recursive: true, force: true });
}
