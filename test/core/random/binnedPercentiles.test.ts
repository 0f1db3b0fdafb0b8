import { describe, expect, it } from 'vitest';
import { binnedPercentiles } from '../../../src/core/random/binnedPercentiles.ts';
import { createRng, standardNormal } from '../../../src/core/random/index.ts';

/** numpy's default 'linear' quantile from a full sort (the definition the fast path must reproduce exactly). */
function sortedQuantile(values: Float64Array, p: number): number {
  const s = Float64Array.from(values).sort();
  const h = (s.length - 1) * p;
  const k = Math.floor(h);
  const t = h - k;
  return t === 0 ? s[k]! : s[k]! + (s[Math.min(k + 1, s.length - 1)]! - s[k]!) * t;
}
const bySort = (v: Float64Array) => ({ p16: sortedQuantile(v, 0.16), p50: sortedQuantile(v, 0.5), p84: sortedQuantile(v, 0.84) });

describe('binnedPercentiles', () => {
  const rng = createRng(77);

  it('gives exactly the full-sort percentiles of normal Monte Carlo samples of many sizes', () => {
    for (const n of [64, 65, 200, 1000, 1999, 2000, 2001, 20000]) {
      const v = Float64Array.from({ length: n }, () => 7 + 0.4 * standardNormal(rng));
      const before = Float64Array.from(v);
      const got = binnedPercentiles(v);
      expect(got, `n = ${n}`).not.toBeNull();
      const want = bySort(v);
      // lerp may round differently from a + (b − a) t in the last bit; compare to 1 ulp-ish
      expect(Math.abs(got!.p16 - want.p16)).toBeLessThanOrEqual(1e-15 * Math.abs(want.p16));
      expect(Math.abs(got!.p50 - want.p50)).toBeLessThanOrEqual(1e-15 * Math.abs(want.p50));
      expect(Math.abs(got!.p84 - want.p84)).toBeLessThanOrEqual(1e-15 * Math.abs(want.p84));
      expect(v).toEqual(before); // the sample is left as it was
    }
  });

  it('handles ties, discrete values and a constant sample exactly', () => {
    const ties = Float64Array.from({ length: 2000 }, () => Math.floor(rng.next() * 5));
    expect(binnedPercentiles(ties)).toEqual(bySort(ties));
    expect(binnedPercentiles(new Float64Array(500).fill(3.25))).toEqual({ p16: 3.25, p50: 3.25, p84: 3.25 });
  });

  it('declines (returns null) when outliers crowd the needed bins, or for non-finite values and tiny samples', () => {
    const crowded = Float64Array.from({ length: 2000 }, () => standardNormal(rng));
    crowded[0] = 1e9; // one outlier: the whole bulk falls into one bin
    expect(binnedPercentiles(crowded)).toBeNull();
    const withNaN = Float64Array.from({ length: 100 }, (_, i) => i);
    withNaN[5] = NaN;
    expect(binnedPercentiles(withNaN)).toBeNull();
    const withInf = Float64Array.from({ length: 100 }, (_, i) => i);
    withInf[9] = Infinity;
    expect(binnedPercentiles(withInf)).toBeNull();
    expect(binnedPercentiles(new Float64Array(10))).toBeNull();
  });
});
