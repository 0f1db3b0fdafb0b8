import { describe, expect, it } from 'vitest';
import { expectClose } from '../../helpers/expectClose.ts';
import { createRng, fillNormal, lerp, percentiles16_50_84, quantile, selectInPlace } from '../../../src/core/random/index.ts';

/** Reference: numpy's 'linear' quantile from a full sort. */
function sortedQuantile(values: Float64Array, p: number): number {
  const s = Float64Array.from(values).sort();
  const h = (s.length - 1) * p;
  const k = Math.floor(h);
  return h === k ? (s[k] as number) : lerp(s[k] as number, s[k + 1] as number, h - k);
}

function randomArray(seed: number, n: number, duplicates: boolean): Float64Array {
  const rng = createRng(seed);
  const a = fillNormal(rng, new Float64Array(n), 0, 1);
  if (duplicates) for (let i = 0; i < n; i++) a[i] = Math.round((a[i] as number) * 2) + 0; // + 0 turns −0 into +0: equal values, but Object.is tells them apart
  return a;
}

const SIZES = [1, 2, 3, 4, 7, 10, 100, 601, 1000, 5001];

describe('quantile and percentiles16_50_84', () => {
  it('selectInPlace puts the k-th smallest at k with smaller values before and larger after', () => {
    for (const n of SIZES) {
      const a = randomArray(n, n, n % 2 === 0);
      const sorted = Float64Array.from(a).sort();
      const k = Math.floor(n / 3);
      selectInPlace(a, k);
      expect(a[k]).toBe(sorted[k]);
      for (let i = 0; i < k; i++) expect(a[i]! <= a[k]!).toBe(true);
      for (let i = k + 1; i < n; i++) expect(a[i]! >= a[k]!).toBe(true);
    }
  });

  it('equal the full-sort quantile exactly on random arrays, with and without ties', () => {
    const rng = createRng(2024);
    for (const n of SIZES) {
      for (const duplicates of [false, true]) {
        const base = randomArray(n * 7 + 1, n, duplicates);
        for (const p of [0, 0.16, 0.5, 0.84, 1, rng.next(), rng.next()]) {
          expect(quantile(Float64Array.from(base), p), `n=${n} p=${p} ties=${duplicates}`).toBe(sortedQuantile(base, p));
        }
        const pct = percentiles16_50_84(Float64Array.from(base));
        expect(pct).toEqual({ p16: sortedQuantile(base, 0.16), p50: sortedQuantile(base, 0.5), p84: sortedQuantile(base, 0.84) });
      }
    }
  });

  it('match numpy.percentile (default linear method)', () => {
    // Computed with numpy 1.24.2: np.percentile(x, [16, 50, 84]), np.quantile(x, 0.3), np.quantile(x, 0.975).
    const x = [3.1, -0.5, 7.25, 2.0, 2.0, 11.5, -4.75, 0.125, 5.5, 9.0, 1.0];
    const pct = percentiles16_50_84(Float64Array.from(x));
    const src = 'computed with numpy 1.24.2 np.percentile';
    expectClose(pct.p16, -0.12499999999999994, { rtol: 1e-15, source: src });
    expectClose(pct.p50, 2.0, { rtol: 1e-15, source: src });
    expectClose(pct.p84, 7.950000000000001, { rtol: 1e-15, source: src });
    expectClose(quantile(Float64Array.from(x), 0.3), 1.0, { rtol: 1e-15, source: src });
    expectClose(quantile(Float64Array.from(x), 0.975), 10.875, { rtol: 1e-15, source: src });
    const y = percentiles16_50_84(Float64Array.from([10, 20, 30, 40]));
    expectClose(y.p16, 14.8, { rtol: 1e-15, source: src });
    expectClose(y.p50, 25, { rtol: 1e-15, source: src });
    expectClose(y.p84, 35.2, { rtol: 1e-15, source: src });
  });

  it('reject an empty array and p outside [0, 1]', () => {
    expect(() => quantile(new Float64Array(0), 0.5)).toThrow(/empty/);
    expect(() => percentiles16_50_84(new Float64Array(0))).toThrow(/empty/);
    expect(() => quantile(Float64Array.from([1]), 1.5)).toThrow(/p must be in \[0, 1\], got 1.5/);
  });

  it('recover the analytic percentiles of a seeded log-normal (N = 1e5)', () => {
    // X = exp(μ + σZ): percentiles exp(μ + σ z_p) with z_0.84 = −z_0.16 = 0.994457883209753
    // (computed with scipy 1.10 norm.ppf). Standard error of a sample quantile of Z:
    // √(p(1−p)/N)/φ(z_p) = 1.2533/√N at the median, 1.507/√N at 16/84 %; tolerance 5 of those, in ln X.
    const mu = Math.log(3e7);
    const sigma = 0.4;
    const n = 100_000;
    const rng = createRng(777);
    const draws = fillNormal(rng, new Float64Array(n), mu, sigma).map(Math.exp);
    const { p16, p50, p84 } = percentiles16_50_84(draws);
    const z84 = 0.994457883209753;
    expect(Math.abs(Math.log(p50) - mu)).toBeLessThan((5 * sigma * 1.2533) / Math.sqrt(n));
    expect(Math.abs(Math.log(p16) - (mu - sigma * z84))).toBeLessThan((5 * sigma * 1.507) / Math.sqrt(n));
    expect(Math.abs(Math.log(p84) - (mu + sigma * z84))).toBeLessThan((5 * sigma * 1.507) / Math.sqrt(n));
  });
});
