import { describe, expect, it } from 'vitest';
import { countPositive } from '../../../src/core/derive/countPositive.ts';
import { createRng } from '../../../src/core/random/index.ts';

/** The plain count, one value at a time (internal reference). */
function plain(a: Float64Array, b: Float64Array | null): number {
  let c = 0;
  for (let k = 0; k < a.length; k++) if ((a[k] as number) + (b ? (b[k] as number) : 0) > 0) c++;
  return c;
}

describe('countPositive', () => {
  it('counts the values above zero, and the sums above zero, for every length including the one to three left over by the steps of four', () => {
    const rng = createRng(11);
    for (let n = 0; n <= 13; n++) {
      const a = Float64Array.from({ length: n }, () => rng.next() - 0.5);
      const b = Float64Array.from({ length: n }, () => rng.next() - 0.5);
      expect(countPositive(a, null), `n = ${n}`).toBe(plain(a, null));
      expect(countPositive(a, b), `n = ${n}`).toBe(plain(a, b));
    }
  });

  it('counts a value in the last place, and neither zero nor NaN as above zero', () => {
    expect(countPositive(Float64Array.from([-1, -1, -1, -1, 2]), null)).toBe(1);
    expect(countPositive(Float64Array.from([-1, -1, -1, -1, -1, 0.5]), Float64Array.from([0, 0, 0, 0, 0, 0]))).toBe(1);
    expect(countPositive(Float64Array.from([0, -0, NaN, 1, NaN]), null)).toBe(1);
    expect(countPositive(Float64Array.from([1, -1, 0.5]), Float64Array.from([-1, 1.5, NaN]))).toBe(1);
    // NaN, zero and −0 at every place of a step of four, alone and as sums (NaN > 0 is false: it adds 0, not NaN).
    expect(countPositive(Float64Array.from([NaN, 0, -0, NaN, 3, NaN, 2, 0, 1]), null)).toBe(3);
    expect(countPositive(Float64Array.from([1, 1, 1, 1, 1]), Float64Array.from([NaN, -1, -2, NaN, -1]))).toBe(0);
  });
});
