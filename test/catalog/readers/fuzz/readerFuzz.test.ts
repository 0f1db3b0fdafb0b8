import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeTmpDir } from '../readerTestKit.ts';
import type { FuzzFormat } from './fuzzCases.ts';

// Structure-aware fuzzing of every reader (issue 8, "Never harm"): seeded, a fixed number of
// cases per format, each case within a time and memory budget. Every input must either read
// (status 0) or stop with a one-line CatalogError naming the file (exit status 2); nothing may
// throw anything else (exit status 1), hang or run out of memory.

const CASES = 30;
const CASE_BUDGET_MS = 3000; // per case, on a busy 2-core machine
const CHILD_HEAP_MB = 192; // memory budget of the one process that reads every case
const CHILD_TIMEOUT_MS = 100_000; // generous: the shared CI machine may be heavily loaded
const FORMATS: FuzzFormat[] = ['csv', 'ecsv', 'fits', 'votable', 'parquet'];
const driver = fileURLToPath(new URL('./fuzzDriver.ts', import.meta.url));

const { dir, cleanup } = makeTmpDir('fuzz');
afterAll(cleanup);

interface Outcome { format: FuzzFormat; seed: number; status: number; message: string; ms: number }

function runDriver(formats: FuzzFormat[]): Promise<{ outcomes: Outcome[]; code: number | null; stderr: string }> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, [`--max-old-space-size=${CHILD_HEAP_MB}`, '--import', 'tsx', driver, formats.join(','), '1', String(CASES), dir], { stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    let stderr = '';
    child.stdout.on('data', (d: Buffer) => { out += d.toString(); });
    child.stderr.on('data', (d: Buffer) => { stderr += d.toString(); });
    const timer = setTimeout(() => child.kill('SIGKILL'), CHILD_TIMEOUT_MS);
    child.on('close', (code) => {
      clearTimeout(timer);
      resolve({ outcomes: out.trim().split('\n').filter(Boolean).map((l) => JSON.parse(l) as Outcome), code, stderr });
    });
  });
}

// One child process for all formats keeps the start-up cost (tsx, DuckDB) to one.
let run: Awaited<ReturnType<typeof runDriver>>;
beforeAll(async () => { run = await runDriver(FORMATS); }, CHILD_TIMEOUT_MS + 10_000);

describe('the fuzz run', () => {
  it('finishes every case of every format in one process, without a crash, a hang or running out of memory', () => {
    const last = run.outcomes[run.outcomes.length - 1];
    expect({ code: run.code, finished: run.outcomes.length, stderr: run.stderr.slice(0, 500) }, `stopped after ${last?.format} seed ${last?.seed}`)
      .toEqual({ code: 0, finished: CASES * FORMATS.length, stderr: '' });
  });
});

describe.each(FORMATS)('fuzzing the %s reader', (format) => {
  it(`reads or rejects in one line each of ${CASES} mutated files, within ${CASE_BUDGET_MS} ms`, () => {
    const outcomes = run.outcomes.filter((o) => o.format === format);
    expect(outcomes).toHaveLength(CASES);
    for (const o of outcomes) {
      expect({ seed: o.seed, status: o.status, message: o.status === 1 ? o.message : '' }).not.toMatchObject({ status: 1 });
      if (o.status === 2) {
        expect(o.message, `seed ${o.seed}`).not.toMatch(/\n/);
        expect(o.message, `seed ${o.seed}`).toContain(`${format}-case-${o.seed}.`);
      }
      expect(o.ms, `seed ${o.seed} took ${o.ms} ms`).toBeLessThan(CASE_BUDGET_MS);
    }
    // The mutations must exercise both paths, or the fuzzing proves nothing.
    expect(outcomes.some((o) => o.status === 0), 'some cases read').toBe(true);
    expect(outcomes.some((o) => o.status === 2), 'some cases are rejected').toBe(true);
  });
});
