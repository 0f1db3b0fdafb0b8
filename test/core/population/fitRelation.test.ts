import { describe, expect, it } from 'vitest';
import { createRng } from '../../../src/core/random/createRng.ts';
import { detectableFraction, fitRelation, RELATION_PRIORS, selectionBias, type RelationProblem } from '../../../src/core/population/fitRelation.ts';
import type { DetectionLinear } from '../../../src/core/population/detectionModel.ts';
import type { BatchLogProb } from '../../../src/core/population/ensembleSampler.ts';
import type { SelectionTable } from '../../../src/core/population/relationLikelihood.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { erdf, simulateAndFit, surveyWith, TRUTH } from '../../helpers/populationInjection.ts';

describe('fitRelation with the selection in the likelihood', () => {
  it('recovers the relation behind a survey that also requires a broad width', { timeout: 600_000 }, async () => {
    const { fit, naive, built, sim } = await simulateAndFit(surveyWith(1000), 6000, createRng(7), 400);
    for (const [p, truth] of [[fit.alpha, TRUTH.alpha], [fit.beta, TRUTH.beta], [fit.sigma, TRUTH.sigma]] as const) {
      const halfWidth = (p.p84 - p.p16) / 2;
      expect(Math.abs(p.p50 - truth)).toBeLessThan(2.5 * halfWidth);
    }
    // The naive fit's slope is flattened by the selection (Lauer et al. 2007, ApJ 670, 249: the bias is largest where
    // black holes are least massive); here it is below 0.6 against a true 1.05.
    expect(naive.beta.p50).toBeLessThan(0.6);
    // The selection bias at the sample's median M* is positive and close to the naive fit's excess there.
    const xs = sim.objects.map((o) => o.x).sort((a, b) => a - b);
    const mMed = xs[Math.floor(xs.length / 2)] as number;
    const weights = built.tables.map((_, t) => built.index.filter((i) => i === t).length);
    const bias = selectionBias(TRUTH.alpha, TRUTH.beta, TRUTH.sigma, mMed, built.tables, weights, erdf);
    expect(bias).toBeGreaterThan(0.3);
  });
});

/** A problem whose likelihood the test supplies: fitRelation itself reads only the observed (x, y). */
const observed = (xs: readonly number[], ys: readonly number[]): RelationProblem => ({
  data: xs.map((x, i) => ({ x, ex: 0.1, y: ys[i] as number, ey: 0.1, table: 0 })),
  tables: [], grids: { mStar: new Float64Array(0) }, erdf,
});

/** A batch likelihood of (alpha, beta, sigma) that keeps a copy of every batch it is asked for. */
function recording(f: (a: number, b: number, s: number) => number): { batches: Float64Array[]; fn: BatchLogProb } {
  const batches: Float64Array[] = [];
  const fn: BatchLogProb = (th, n) => {
    batches.push(th.slice(0, 3 * n));
    return Float64Array.from({ length: n }, (_, i) => f(th[3 * i] as number, th[3 * i + 1] as number, th[3 * i + 2] as number));
  };
  return { batches, fn };
}
const flat = (): number => 0;
const column = (batch: Float64Array, d: number): number[] => Array.from({ length: batch.length / 3 }, (_, i) => batch[3 * i + d] as number);
const mean = (v: readonly number[]): number => v.reduce((s, x) => s + x, 0) / v.length;
const SHORT = { walkers: 8, steps: 1, burn: 0 };

describe('fitRelation: where the walkers start', () => {
  it('scans the intercept of the observed points’ least-squares line, from 2 dex below it to 0.5 above in steps of 0.1, at its slope and sigma 0.5', async () => {
    // Ordinary least squares by hand: x = (10, 14), y = (4, 6): x̄ = 12, ȳ = 5, Sxy = (−2)(−1) + (2)(1) = 4,
    // Sxx = 8, slope 0.5; at the pivot log M* = 10 the line is at 5 + 0.5 (10 − 12) = 4.
    const rec = recording(flat);
    await fitRelation(observed([10, 14], [4, 6]), createRng(1), SHORT, rec.fn);
    const scan = rec.batches[0] as Float64Array;
    expect(scan.length).toBe(26 * 3);
    column(scan, 0).forEach((a, k) => expectClose(a, 2 + 0.1 * k, { atol: 1e-12, source: 'hand OLS intercept 4, offsets −2 … +0.5 in 0.1' }));
    expect(column(scan, 1)).toEqual(Array(26).fill(0.5)); // hand OLS slope (exact in binary)
    expect(column(scan, 2)).toEqual(Array(26).fill(0.5));
  });

  it('scans at a finite slope when all hosts have the same mass, through the mean of the observed masses', async () => {
    // x = (10, 10): no spread, so no least-squares slope; every line through (10, ȳ = 5) has intercept 5 at the pivot.
    const rec = recording(flat);
    await fitRelation(observed([10, 10], [4, 6]), createRng(1), SHORT, rec.fn);
    const scan = rec.batches[0] as Float64Array;
    expect(scan.length).toBe(26 * 3);
    column(scan, 0).forEach((a, k) => expectClose(a, 3 + 0.1 * k, { atol: 1e-12, source: 'hand: ȳ = 5 at the pivot, offsets −2 … +0.5 in 0.1' }));
    const slopes = column(scan, 1);
    expect(slopes.every((b) => Number.isFinite(b) && b === slopes[0] && b >= RELATION_PRIORS.beta[0] && b <= RELATION_PRIORS.beta[1])).toBe(true);
  });

  it('includes the prior’s bounds: scan intercepts exactly on alpha = 2 and alpha = 12 are evaluated', async () => {
    // Hand OLS: y = (4, 6) puts the lowest scanned intercept at 4 − 2 = 2; y = (11.5, 13.5) puts the highest at
    // 11.5 + 0.5 = 12 (both exact in binary). RELATION_PRIORS' bounds are inclusive (its TSDoc).
    const low = recording(flat);
    await fitRelation(observed([10, 14], [4, 6]), createRng(1), SHORT, low.fn);
    expect(low.batches[0]?.length).toBe(26 * 3);
    expect(low.batches[0]?.[0]).toBe(2);
    const high = recording(flat);
    await fitRelation(observed([10, 14], [11.5, 13.5]), createRng(1), SHORT, high.fn);
    expect(high.batches[0]?.length).toBe(26 * 3);
    expect(high.batches[0]?.[25 * 3]).toBe(12);
  });

  it('draws the walkers around the scanned intercept of highest likelihood, the lowest one on a tie', async () => {
    // Hand OLS start at (4, 0.5); a likelihood peaked at alpha = 3.32 is highest at the scanned 3.3. The ball is
    // start + 0.1 N(0, 1) per parameter: 24 walkers give means to ±4 × 0.1/√24 = ±0.082 (closed form).
    const peaked = recording((a) => -0.5 * ((a - 3.32) / 0.1) ** 2);
    await fitRelation(observed([10, 14], [4, 6]), createRng(2), { walkers: 24, steps: 1, burn: 0 }, peaked.fn);
    const ball = peaked.batches[1] as Float64Array;
    expect(ball.length).toBe(24 * 3);
    for (const [d, centre] of [[0, 3.3], [1, 0.5], [2, 0.5]] as const) expectClose(mean(column(ball, d)), centre, { atol: 0.082, source: 'closed form: mean of the starting ball about the best scanned point' });
    // A flat likelihood ties the whole scan (5 … 7.5 about the hand OLS intercept 7 of y = (7, 9)): the lowest wins,
    // since the observed points sit above the intrinsic relation when the selection matters.
    const tied = recording(flat);
    await fitRelation(observed([10, 14], [7, 9]), createRng(2), { walkers: 24, steps: 1, burn: 0 }, tied.fn);
    const tiedBall = tied.batches[1] as Float64Array;
    expect(tiedBall.length).toBe(24 * 3);
    expectClose(mean(column(tiedBall, 0)), 5, { atol: 0.082, source: 'closed form: mean of the starting ball about the lowest scanned point' });
  });

  it('starts from the best scanned intercept inside the priors when the scan crosses the lower alpha bound', async () => {
    // Hand OLS: x = (10, 14), y = (3, 5): x̄ = 12, ȳ = 4, slope 0.5, at the pivot 4 + 0.5 (10 − 12) = 3. The scan
    // 1.0 … 3.5 is below alpha = 2 for its first ten points; the other 16 (2.0 … 3.5) are evaluated. A likelihood
    // peaked at 2.52 is highest at 2.5; the ball about it: 24 walkers, means to ±4 × 0.1/√24 = ±0.082 (closed form).
    const rec = recording((a) => -0.5 * ((a - 2.52) / 0.1) ** 2);
    await fitRelation(observed([10, 14], [3, 5]), createRng(6), { walkers: 24, steps: 1, burn: 0 }, rec.fn);
    const scan = rec.batches[0] as Float64Array;
    expect(scan.length).toBe(16 * 3);
    column(scan, 0).forEach((a, k) => expectClose(a, 2 + 0.1 * k, { atol: 1e-12, source: 'hand OLS intercept 3, offsets −1 … +0.5 in 0.1' }));
    const ball = rec.batches[1] as Float64Array;
    expect(ball.length).toBe(24 * 3);
    expectClose(mean(column(ball, 0)), 2.5, { atol: 0.082, source: 'closed form: mean of the starting ball about the best scanned point' });
  });
});

describe('fitRelation: sampling under the flat priors', () => {
  it('proposes differential-evolution moves unless told otherwise, and stretch moves when told', async () => {
    // ter Braak 2006 (Statistics and Computing 16, 239): y = x_i + γ (x_j − x_k) with j ≠ k from the other half, and
    // γ = 2.38/√(2·3) (1 + 0.1 z) (Nelson et al. 2014, ApJS 210, 11); |z| < 5 here. Goodman & Weare 2010 (CAMCoS 5,
    // 65, eqs. 7, 9, a = 2): y = x_j + Z (x_i − x_j), Z in [1/2, 2]. The first half's four proposals follow the ball.
    const g0 = 2.38 / Math.sqrt(6);
    const along = (u: number[], v: number[]): number | null => {
      const f = (u[0] as number) / (v[0] as number);
      return u.every((x, d) => Math.abs(x - f * (v[d] as number)) <= 1e-9 * Math.abs(x)) ? f : null;
    };
    const at = (batch: Float64Array, w: number): number[] => [0, 1, 2].map((d) => batch[3 * w + d] as number);
    const sub = (u: number[], v: number[]): number[] => u.map((x, d) => x - (v[d] as number));
    const isDifferential = (ball: Float64Array, y: number[], i: number): boolean => [4, 5, 6, 7].some((j) => [4, 5, 6, 7].some((k) => {
      const g = j === k ? null : along(sub(y, at(ball, i)), sub(at(ball, j), at(ball, k)));
      return g !== null && g > 0.5 * g0 && g < 1.5 * g0;
    }));
    const isStretch = (ball: Float64Array, y: number[], i: number): boolean => [4, 5, 6, 7].some((j) => {
      const z = along(sub(y, at(ball, j)), sub(at(ball, i), at(ball, j)));
      return z !== null && z >= 0.5 && z <= 2;
    });
    for (const move of [undefined, 'stretch'] as const) {
      const rec = recording(flat);
      await fitRelation(observed([10, 14], [7, 9]), createRng(3), { walkers: 8, steps: 1, burn: 0, ...(move ? { move } : {}) }, rec.fn);
      const [ball, proposals] = [rec.batches[1] as Float64Array, rec.batches[2] as Float64Array];
      expect(ball.length).toBe(8 * 3);
      expect(proposals.length).toBe(4 * 3);
      for (let i = 0; i < 4; i++) {
        expect(isDifferential(ball, at(proposals, i), i)).toBe(move === undefined);
        expect(isStretch(ball, at(proposals, i), i)).toBe(move === 'stretch');
      }
    }
  });

  it('sends the likelihood only positions inside the priors, keeps every sample there, and gives back the uniform box for a flat likelihood', async () => {
    const P = { alpha: [2, 12], beta: [-2, 4], sigma: [0.02, 2] }; // RELATION_PRIORS' documented bounds
    const inside = (a: number, b: number, s: number): boolean => a >= 2 && a <= 12 && b >= -2 && b <= 4 && s >= 0.02 && s <= 2;
    const rec = recording(flat);
    const fit = await fitRelation(observed([10, 14], [7, 9]), createRng(4), { walkers: 16, steps: 2000, burn: 500 }, rec.fn);
    for (const batch of rec.batches) {
      expect(batch.length).toBeGreaterThan(0);
      for (let i = 0; i < batch.length; i += 3) expect(inside(batch[i] as number, batch[i + 1] as number, batch[i + 2] as number)).toBe(true);
    }
    for (let i = 0; i < fit.samples.length; i += 3) expect(inside(fit.samples[i] as number, fit.samples[i + 1] as number, fit.samples[i + 2] as number)).toBe(true);
    // Closed form: uniform on [lo, hi] has its 16th, 50th and 84th percentiles at lo + (0.16, 0.5, 0.84)(hi − lo).
    // 16 × 1500 kept draws with τ < 30 steps (checked) are ≥ 800 independent: a quantile's sd is
    // √(q(1 − q)/800)(hi − lo) ≤ 0.018 (hi − lo); tolerance 0.07 (hi − lo).
    expect(Math.max(...fit.tau)).toBeLessThan(30);
    for (const [p, [lo, hi]] of [[fit.alpha, P.alpha], [fit.beta, P.beta], [fit.sigma, P.sigma]] as const) {
      const w = (hi as number) - (lo as number);
      expectClose(p.p16, (lo as number) + 0.16 * w, { atol: 0.07 * w, source: 'closed form: 16th percentile of the uniform prior' });
      expectClose(p.p50, (lo as number) + 0.5 * w, { atol: 0.07 * w, source: 'closed form: median of the uniform prior' });
      expectClose(p.p84, (lo as number) + 0.84 * w, { atol: 0.07 * w, source: 'closed form: 84th percentile of the uniform prior' });
    }
  });

  it('asks the likelihood nothing and cannot start when the observed points lie far outside the priors', async () => {
    // Hand OLS: x = (10, 14), y = (20, 22) give 20 at the pivot: every scanned intercept (18 … 20.5) and the ball
    // about it lie above the alpha prior's upper bound of 12.
    const rec = recording(flat);
    await expect(fitRelation(observed([10, 14], [20, 22]), createRng(5), SHORT, rec.fn)).rejects.toThrow('ensembleSample: no starting point with finite log probability');
    expect(rec.batches.length).toBe(0);
  });
});

// Selection tables written by hand: flux A = a0 + M + ℓ ≥ 0 alone, or with a width B = b0 − 0.25 M + 0.5 u − 0.25 ℓ ≥ 0
// (M true and u virial log mass, ℓ = log λ_Edd); calibration scatter 0.3 dex; the M* grid and prior of the fraction.
// The same numbers are in scripts/reference/relationSelection.py, which prints the reference values below.
const FLUX_ONLY: DetectionLinear = { possible: true, a0: -5.5, aM: 1, aL: 1, b0: 0, bM: 0, bU: 0, bL: 0, noWidthCut: true };
const FLUX_AND_WIDTH: DetectionLinear = { possible: true, a0: -5.3, aM: 1, aL: 1, b0: -1.4, bM: -0.25, bU: 0.5, bL: -0.25, noWidthCut: false };
const M_STAR = Float64Array.of(9, 9.5, 10.5, 11);
const tableOf = (linear: DetectionLinear | null): SelectionTable => ({ massPrior: Float64Array.of(1, 3, 2, 0.5), linear, calibrationScatter: 0.3 });
const ERDF = { meanLog: -0.6, sigmaLog: 0.4, reference: 'test values' };
const REL = [6.4, 1.05, 0.5] as const;
// Computed with scipy 1.10.1 / numpy 1.24.2 by scripts/reference/relationSelection.py (quad over M, Sheppard's
// integral for the bivariate normal; the flux-only values also in closed form, agreeing to 1e-15).
const BIAS_FLUX = 0.40379509038459405;
const BIAS_WIDTH = 0.37999383984970464;
const FRACTION_FLUX = 0.538820874845515;
const FRACTION_WIDTH = 0.5803262014517119;

describe('selectionBias', () => {
  it('gives E[M | detected] − μ of a flux-limited (probit) selection at log M* = 9.5', () => {
    // Tolerance: the ±6σ grid leaves out the Gaussian's tails beyond 6σ (mass ~2e-9), ~1e-8 of the mean here.
    expectClose(selectionBias(...REL, 9.5, [tableOf(FLUX_ONLY)], [1], ERDF), BIAS_FLUX, { atol: 3e-8, source: 'scipy 1.10.1, scripts/reference/relationSelection.py (and the closed form there)' });
  });

  it('gives E[M | detected] − μ with a width cut as well (a bivariate normal selection)', () => {
    // Tolerance: the grid's truncation as above; the bivariate normal CDF adds ~1e-9.
    expectClose(selectionBias(...REL, 9.5, [tableOf(FLUX_AND_WIDTH)], [1], ERDF), BIAS_WIDTH, { atol: 3e-8, source: 'scipy 1.10.1, scripts/reference/relationSelection.py' });
  });

  it('is zero when the detection probability does not depend on the mass', () => {
    // Closed form: a constant selection leaves E[M | detected] = μ. The grid is symmetric about μ, so only rounding remains.
    const flat = { ...FLUX_ONLY, aM: 0 };
    expectClose(selectionBias(...REL, 9.5, [tableOf(flat)], [1], ERDF), 0, { atol: 1e-12, source: 'closed form: no selection on M, no bias' });
  });

  it('averages the tables with their weights, leaving out those without selection, without a possible detection, without a positive weight, or detecting nothing', () => {
    const never = { ...FLUX_ONLY, a0: -1000 }; // Φ(−2500) underflows to 0 at every node
    const tables = [FLUX_ONLY, null, { ...FLUX_ONLY, possible: false }, FLUX_AND_WIDTH, FLUX_ONLY, FLUX_AND_WIDTH, never].map(tableOf);
    const weights = [1, 2, 2, 3, 0, NaN, 2];
    // Weighted mean of the two reference values (weights 1 and 3); the grid's tolerance as above.
    expectClose(selectionBias(...REL, 9.5, tables, weights, ERDF), (BIAS_FLUX + 3 * BIAS_WIDTH) / 4, { atol: 3e-8, source: 'scipy 1.10.1, scripts/reference/relationSelection.py' });
    expect(selectionBias(...REL, 9.5, tables.slice(1, 3), [2, 2], ERDF)).toBeNaN();
  });
});

describe('detectableFraction', () => {
  it('gives the prior-weighted detection probability of the relation’s population, flux limit alone', () => {
    // Tolerance: normalCdf's 1e-14 relative.
    expectClose(detectableFraction(...REL, [tableOf(FLUX_ONLY)], [1], M_STAR, ERDF), FRACTION_FLUX, { atol: 1e-12, source: 'scipy 1.10.1, scripts/reference/relationSelection.py (closed form and quadrature)' });
  });

  it('gives the prior-weighted detection probability with a width cut as well', () => {
    // Tolerance: the bivariate normal CDF's absolute error, below ~1e-9 for |ρ| ≤ 0.95 (its TSDoc).
    expectClose(detectableFraction(...REL, [tableOf(FLUX_AND_WIDTH)], [1], M_STAR, ERDF), FRACTION_WIDTH, { atol: 1e-9, source: 'scipy 1.10.1, scripts/reference/relationSelection.py' });
  });

  it('averages the tables with their weights, counting an impossible table as 0 and leaving out those without selection or a positive weight', () => {
    const tables = [FLUX_ONLY, FLUX_AND_WIDTH, { ...FLUX_ONLY, possible: false }, null, FLUX_ONLY, FLUX_AND_WIDTH].map(tableOf);
    const weights = [1, 3, 2, 5, 0, NaN];
    // (1 × FRACTION_FLUX + 3 × FRACTION_WIDTH + 2 × 0)/6; tolerance of the width case.
    expectClose(detectableFraction(...REL, tables, weights, M_STAR, ERDF), (FRACTION_FLUX + 3 * FRACTION_WIDTH) / 6, { atol: 1e-9, source: 'scipy 1.10.1, scripts/reference/relationSelection.py' });
    expect(detectableFraction(...REL, tables.slice(3), [5, 0, NaN], M_STAR, ERDF)).toBeNaN();
  });
});
