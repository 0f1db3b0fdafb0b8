import { describe, expect, it } from 'vitest';
import { createProgressReporter, PROBLEMS_SHOWN } from '../../../src/catalog/cli/progressReporter.ts';
import type { RejectionEntry } from '../../../src/catalog/derive/rejectionReport.ts';

function sink(isTTY: boolean) {
  const chunks: string[] = [];
  return { chunks, out: { isTTY, columns: 120, write: (s: string) => chunks.push(s) } };
}

const problem = (row: number): RejectionEntry => ({ row, id: `o${row}`, column: 'z', value: '-1', reason: 'must be between 0 and 30', message: `row ${row} (id o${row}): z = -1: must be between 0 and 30` });

describe('the progress reporter', () => {
  it('prints a plain line at each 10 % when stderr is not a terminal', () => {
    const { chunks, out } = sink(false);
    const r = createProgressReporter(out, { label: 'cat.csv', quiet: false });
    for (let done = 0; done <= 1000; done += 50) r.progress({ rowsDone: done, rowsTotal: 1000, elapsedMs: done });
    r.finish('cat.rejections.csv');
    expect(chunks).toHaveLength(10);
    expect(chunks[0]).toBe('derive: 10% (100 of 1,000 rows, 1,000 objects/s)\n');
    expect(chunks[9]).toMatch(/^derive: 100% \(1,000 of 1,000 rows/);
  });

  it('redraws one line with a bar, objects/s and the time left on a terminal, and clears it at the end', () => {
    const { chunks, out } = sink(true);
    let t = 0;
    const r = createProgressReporter(out, { label: 'cat.csv', quiet: false, now: () => t });
    t = 1000;
    r.progress({ rowsDone: 250, rowsTotal: 1000, elapsedMs: 1000 });
    t = 1050; // within the redraw interval: skipped
    r.progress({ rowsDone: 260, rowsTotal: 1000, elapsedMs: 1050 });
    r.finish('cat.rejections.csv');
    expect(chunks).toHaveLength(2);
    expect(chunks[0]).toBe('\r\x1b[Kderive [██████░░░░░░░░░░░░░░░░░░]  25% · 250/1,000 objects · 250 objects/s · ETA 3.0 s');
    expect(chunks[1]).toBe('\r\x1b[K');
  });

  it(`prints the first ${PROBLEMS_SHOWN} row problems with the file name, then how many more there are`, () => {
    const { chunks, out } = sink(false);
    const r = createProgressReporter(out, { label: 'cat.csv', quiet: false });
    for (let i = 1; i <= PROBLEMS_SHOWN + 5; i++) r.problem(problem(i));
    r.finish('cat.rejections.csv');
    expect(chunks).toHaveLength(PROBLEMS_SHOWN + 1);
    expect(chunks[0]).toBe('cat.csv: row 1 (id o1): z = -1: must be between 0 and 30\n');
    expect(chunks[PROBLEMS_SHOWN]).toBe('… and 5 more row problems (all are in cat.rejections.csv)\n');
  });

  it('prints a notice on a line of its own, clearing the progress line on a terminal first, with control characters escaped', () => {
    const { chunks, out } = sink(true);
    let t = 0;
    const r = createProgressReporter(out, { label: 'cat.csv', quiet: false, now: () => t });
    t = 1000;
    r.progress({ rowsDone: 250, rowsTotal: 1000, elapsedMs: 1000 });
    r.notice('the widths look like m/s\x1b[31m');
    expect(chunks.slice(1)).toEqual(['\r\x1b[K', 'dawn-census: the widths look like m/s\\x1B[31m\n']);
    // Nothing to clear when no progress line is shown.
    const plain = sink(false);
    createProgressReporter(plain.out, { label: 'cat.csv', quiet: false }).notice('a note');
    expect(plain.chunks).toEqual(['dawn-census: a note\n']);
  });

  it('prints nothing when quiet', () => {
    const { chunks, out } = sink(true);
    const r = createProgressReporter(out, { label: 'cat.csv', quiet: true });
    r.progress({ rowsDone: 1000, rowsTotal: 1000, elapsedMs: 10 });
    for (let i = 1; i <= 30; i++) r.problem(problem(i));
    r.notice('a note');
    r.finish('cat.rejections.csv');
    expect(chunks).toEqual([]);
  });
});
