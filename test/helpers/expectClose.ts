import { expect } from 'vitest';

/** Tolerance of a comparison: relative (`rtol`), absolute (`atol`), or both (either passing is enough). */
export interface CloseOptions {
  rtol?: number;
  atol?: number;
  /** Where the expected value comes from: a paper and its table or equation, a library and version, "common practice, no source", "from memory" or "internal regression". */
  source: string;
}

/**
 * Asserts that `actual` is within tolerance of `expected`; the failure message prints
 * actual, expected, the tolerance and the source of the expected value.
 */
export function expectClose(actual: number, expected: number, opts: CloseOptions): void {
  const { rtol, atol, source } = opts;
  if (rtol === undefined && atol === undefined) throw new Error('expectClose needs rtol or atol');
  const diff = Math.abs(actual - expected);
  const okAbs = atol !== undefined && diff <= atol;
  const okRel = rtol !== undefined && diff <= rtol * Math.abs(expected);
  const ok = Number.isFinite(actual) && (okAbs || okRel);
  const tol = [rtol !== undefined ? `rtol ${rtol}` : '', atol !== undefined ? `atol ${atol}` : ''].filter(Boolean).join(', ');
  expect(ok, `actual ${actual}, expected ${expected} (${tol}; |diff| = ${diff.toExponential(3)}); source: ${source}`).toBe(true);
}
