/**
 * Benchmark of `dawn-census derive` (npm run bench:derive): makes an invented catalog with the
 * demo population model (scripts/lib/demoPopulation.ts) in .bench/ (gitignored; reused when it
 * exists), derives it with the CLI in a child process, and prints objects per second, wall time
 * and peak memory (VmHWM of the child, which includes its worker threads).
 *
 * Targets: 100,000 rows × 1000 draws in < 20 s on 2 cores; 1,000,000 rows within 2 GiB.
 *
 *   npm run bench:derive                       # 100,000 rows, 1000 draws, every core
 *   npm run bench:derive -- --rows 1000000     # the million-row memory case
 *   npm run bench:derive -- --draws 200 --threads 1
 *   npm run bench:derive -- --readings standard   # the same work as before readings existed
 */
import { spawn } from 'node:child_process';
import { createWriteStream, existsSync, mkdirSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { csvLines } from './lib/demoCsv.ts';
import { DEMO_MODEL, iterateDemoObjects } from './lib/demoPopulation.ts';

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const BENCH = join(ROOT, '.bench');
/** Seed of the synthetic catalog (any fixed value: the catalog is reused across runs). */
const CATALOG_SEED = 20240;

interface BenchOptions {
  rows: number;
  draws: number;
  threads: number;
}

/** Readings to derive (the config's `readings.use`), or null for the default (every built-in reading). */
let readingsUse: string[] | null = null;

function parseOptions(argv: string[]): BenchOptions {
  const o: BenchOptions = { rows: 100_000, draws: 1000, threads: availableParallelism() };
  for (let i = 0; i < argv.length; i++) {
    const key = argv[i]!.replace(/^--/, '');
    if (key === 'readings') {
      const ids = (argv[++i] ?? '').split(',').filter((x) => /^[a-z_][a-z0-9_]*$/.test(x));
      if (ids.length === 0) throw new Error('usage: bench-derive --readings id[,id…] (e.g. standard)');
      readingsUse = ids;
      continue;
    }
    const value = Number(argv[++i]);
    if (!(key in o) || !Number.isInteger(value) || value < 1) throw new Error(`usage: bench-derive [--rows N] [--draws N] [--threads N] (bad ${argv[i - 1]} ${argv[i]})`);
    o[key as keyof BenchOptions] = value;
  }
  return o;
}

async function ensureCatalog(rows: number): Promise<string> {
  const file = join(BENCH, `catalog-${rows}.csv`);
  if (existsSync(file)) return file;
  mkdirSync(BENCH, { recursive: true });
  const started = performance.now();
  const partial = `${file}.tmp-${process.pid}`;
  const out = createWriteStream(partial);
  const objects = (function* () {
    for (const o of iterateDemoObjects({ n: rows, seed: CATALOG_SEED })) yield o.row;
  })();
  for (const line of csvLines(objects)) {
    if (!out.write(line)) await new Promise<void>((r) => out.once('drain', () => r()));
  }
  await new Promise<void>((res, rej) => out.end((err?: Error | null) => (err ? rej(err) : res())));
  renameSync(partial, file);
  console.log(`made ${file} (${rows.toLocaleString('en-US')} invented rows) in ${((performance.now() - started) / 1000).toFixed(1)} s`);
  return file;
}

function writeConfig(): string {
  // The unit of the demo model's fluxes (as in data-demo/census.config.yaml); default settings otherwise.
  const unit = `${DEMO_MODEL.fluxUnitCgs} erg s-1 cm-2`;
  const mapped = ['flux_halpha', 'flux_halpha_err', 'flux_hbeta', 'flux_hbeta_err'].map((c) => `  ${c}: { unit: "${unit}" }`);
  const file = join(BENCH, 'bench.config.yaml');
  const readings = readingsUse ? `readings: { use: [${readingsUse.join(', ')}] }\n` : '';
  writeFileSync(file, `title: benchmark (invented data)\ncolumns:\n${mapped.join('\n')}\n${readings}`);
  return file;
}

function readHwmKiB(pid: number): number | null {
  try {
    const m = /VmHWM:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
    return m ? Number(m[1]) : null;
  } catch {
    return null;
  }
}

async function main(): Promise<void> {
  const o = parseOptions(process.argv.slice(2));
  const catalog = await ensureCatalog(o.rows);
  const config = writeConfig();
  const output = join(BENCH, `out-${o.rows}.parquet`);
  const args = [join(ROOT, 'bin', 'dawn-census.js'), 'derive', catalog, '-c', config, '-o', output, '--draws', String(o.draws), '--threads', String(o.threads)];
  console.log(`derive ${o.rows.toLocaleString('en-US')} rows × ${o.draws} draws on ${o.threads} thread(s)…`);
  // With GNU time the child's CPU time and peak RSS come from the kernel; CPU time matters on a
  // shared machine, where wall time also counts other people's work.
  const timeFile = join(BENCH, `time-${process.pid}.txt`);
  const gnuTime = existsSync('/usr/bin/time');
  const started = performance.now();
  const child = gnuTime
    ? spawn('/usr/bin/time', ['-f', '%U %S %M', '-o', timeFile, process.execPath, ...args], { stdio: ['ignore', 'inherit', 'inherit'] })
    : spawn(process.execPath, args, { stdio: ['ignore', 'inherit', 'inherit'] });
  let peakKiB = 0;
  // Without GNU time: VmHWM is the child's own high-water mark (worker threads share its address
  // space), so the last reading before it exits is its peak.
  const timer = setInterval(() => {
    const hwm = !gnuTime && child.pid !== undefined ? readHwmKiB(child.pid) : null;
    if (hwm !== null) peakKiB = Math.max(peakKiB, hwm);
  }, 50);
  const code = await new Promise<number | null>((res) => child.on('exit', (c) => res(c)));
  clearInterval(timer);
  const seconds = (performance.now() - started) / 1000;
  let cpuSeconds: number | null = null;
  if (gnuTime && existsSync(timeFile)) {
    const [user, sys, maxKiB] = readFileSync(timeFile, 'utf8').trim().split('\n').pop()!.split(' ').map(Number);
    cpuSeconds = user! + sys!;
    peakKiB = maxKiB!;
    rmSync(timeFile, { force: true });
  }
  if (code !== 0) {
    console.error(`derive failed with exit status ${code}`);
    process.exitCode = 1;
    return;
  }
  const peakMiB = peakKiB / 1024;
  console.log('');
  console.log(`rows          ${o.rows.toLocaleString('en-US')}`);
  console.log(`draws         ${o.draws}`);
  console.log(`threads       ${o.threads}`);
  console.log(`readings      ${readingsUse ? readingsUse.join(', ') : 'every built-in reading (the default)'}`);
  console.log(`wall time     ${seconds.toFixed(2)} s (process start to exit)`);
  console.log(`objects/s     ${Math.round(o.rows / seconds).toLocaleString('en-US')}`);
  if (cpuSeconds !== null) {
    console.log(`CPU time      ${cpuSeconds.toFixed(1)} s (user + system, all threads); ≈ ${(cpuSeconds / o.threads).toFixed(1)} s of wall time on ${o.threads} idle core(s)`);
  }
  console.log(`peak memory   ${peakKiB ? `${peakMiB.toFixed(0)} MiB (peak RSS of the derive process, worker threads included)` : 'not measured (no /proc)'}`);
  if (o.rows === 100_000 && o.draws === 1000) console.log(`target        < 20 s on 2 cores: ${seconds < 20 ? 'met' : 'NOT met'}`);
  if (o.rows >= 1_000_000 && peakKiB) console.log(`target        ≤ 2 GiB: ${peakMiB <= 2048 ? 'met' : 'NOT met'}`);
}

await main();
