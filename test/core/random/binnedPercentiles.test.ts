import { describe, expect, it } from 'vitest';
import { binnedPercentiles } from '../../../src/core/random/binnedPercentiles.ts';
import { createRng, standardNormal } from '../../../src/core/random/index.ts';

/**
 * numpy's default 'linear' quantile from a full sort (the definition the fast path must reproduce exactly),
 * rounded as numpy 1.24's `_lerp` (function_base.py) rounds it: a + (b − a)t below t = 0.5, b − (b − a)(1 − t)
 * from 0.5 up. (With a + (b − a)t throughout, the exact comparisons held only for the samples these seeds give.)
 */
function sortedQuantile(values: Float64Array, p: number): number {
  const s = Float64Array.from(values).sort();
  const h = (s.length - 1) * p;
  const k = Math.floor(h);
  const t = h - k;
  if (t === 0) return s[k]!;
  const a = s[k]!;
  const b = s[Math.min(k + 1, s.length - 1)]!;
  return t >= 0.5 ? b - (b - a) * (1 - t) : a + (b - a) * t;
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

  it('reads the last values of a sample whose length is not a multiple of four like the others (range, counts and gathering)', () => {
    // The passes go four values at a time; these put what matters into the one to three left over.
    for (const n of [1001, 1002, 1003]) {
      const withNaN = Float64Array.from({ length: n }, (_, i) => i);
      withNaN[n - 1] = NaN;
      expect(binnedPercentiles(withNaN), `NaN last, n = ${n}`).toBeNull();
      const outlier = Float64Array.from({ length: n }, () => standardNormal(rng));
      outlier[n - 1] = 1e9; // the range comes from the last value alone: the bulk crowds one bin
      expect(binnedPercentiles(outlier), `outlier last, n = ${n}`).toBeNull();
      // The order statistics the percentiles need, moved to the end (swapped with the last values).
      const v = Float64Array.from({ length: n }, (_, i) => 100 + i * 0.5);
      [0.5, 0.16, 0.84].forEach((p, j) => {
        const k = Math.floor((n - 1) * p);
        [v[k], v[n - 1 - j]] = [v[n - 1 - j]!, v[k]!];
      });
      expect(binnedPercentiles(v), `needed values last, n = ${n}`).toEqual(bySort(v));
      // The smallest and largest values last.
      const w = Float64Array.from({ length: n }, () => standardNormal(rng));
      w[n - 1] = -6;
      w[n - 2] = 6;
      expect(binnedPercentiles(w), `extremes last, n = ${n}`).toEqual(bySort(w));
    }
  });

  it('counts the largest value in the last bin when it is tied and needed, at any place of a step of four', () => {
    // Source of truth: the full sort (numpy's linear rule, bySort). The range is [0, 8], so the maximum
    // lands exactly on the bins' end ((8 − 0) · 512/8 = 512) and must be counted in the last bin. It takes
    // the 25 places of one residue mod 4 among the first 100 (the four-at-a-time pass): a quarter of the
    // sample, so the 84th percentile is the maximum.
    const own = createRng(78); // its own stream: the other tests' samples stay as they were
    for (let j = 0; j < 4; j++) {
      // A normal sample first, so that what the previous case left in the working arrays cannot stand in for the answer.
      binnedPercentiles(Float64Array.from({ length: 2000 }, () => standardNormal(own)));
      const v = Float64Array.from({ length: 101 }, (_, i) => (i < 100 && i % 4 === j ? 8 : (i * 7919) % 101 / 16));
      expect(Math.max(...v)).toBe(8);
      expect(binnedPercentiles(v), `maximum at places ${j} mod 4`).toEqual(bySort(v));
      expect(bySort(v).p84).toBe(8);
    }
  });

  it('answers when a needed bin holds exactly as many values as it may (512), the bin at the top of the range', () => {
    // Source of truth: the full sort. 88 values in [0, 500) and 512 in [998.1, 1000], all inside the last
    // of the 512 bins of [0, 1000] (width 1000/512 ≈ 1.95): the median and 84th percentile lie there.
    const v = Float64Array.from({ length: 600 }, (_, i) => (i < 88 ? i * 5.5 : 998.1 + ((i - 88) * 1.9) / 511));
    expect(v[599]).toBe(1000);
    const got = binnedPercentiles(v);
    expect(got).not.toBeNull();
    expect(got).toEqual(bySort(v));
  });

  it('reads the bin of no value past the sample\'s end, where a longer sample left one', () => {
    // Source of truth: the full sort. The bin of each value is kept in an array grown to the longest
    // sample seen; the first call leaves at place 100 the bin of 15, which the second (0..99, one
    // value per bin, the same range) needs for its 16th percentile. Reading place 100 would gather a
    // value that is not in the sample into that bin.
    const longer = Float64Array.from({ length: 104 }, (_, i) => (i < 100 ? i : 15));
    expect(binnedPercentiles(longer)).toEqual(bySort(longer));
    const v = Float64Array.from({ length: 100 }, (_, i) => i);
    expect(binnedPercentiles(v)).toEqual(bySort(v));
    expect(bySort(v)).toEqual({ p16: 15.84, p50: 49.5, p84: 83.16 }); // (n − 1)p = 15.84, 49.5, 83.16 on 0..99
  });

  it('orders −0 before +0 as a full sort does, so an order statistic among zeros keeps its sign', () => {
    // 30 × −1, then 20 × +0 and 20 × −0 (in that order), then 31 × +1: sorted, index 50 is the first +0.
    const v = Float64Array.from([...Array(30).fill(-1), ...Array(20).fill(0), ...Array(20).fill(-0), ...Array(31).fill(1)]);
    const got = binnedPercentiles(v)!;
    expect(Object.is(got.p50, bySort(v).p50)).toBe(true);
    expect(Object.is(got.p50, 0)).toBe(true);
  });

  it('stays exact on the next sample after declining part-way through its needed bins', () => {
    // 400 values spread over [0, 1000) and 1600 packed into [999.6, 999.9]: the 16th percentile's
    // bin is sparse, the median's crowded, so the call declines after setting up the first bin.
    const spread = Float64Array.from({ length: 2000 }, (_, i) => (i < 400 ? i * 2.5 : 999.6 + rng.next() * 0.3));
    expect(binnedPercentiles(spread)).toBeNull();
    for (let t = 0; t < 20; t++) {
      const v = Float64Array.from({ length: 2000 }, () => standardNormal(rng));
      expect(binnedPercentiles(v)).toEqual(bySort(v));
    }
  });
});
