import { describe, expect, it } from 'vitest';
import { comovingVolumeMpc3Sr } from '../../../src/core/population/comovingVolume.ts';
import { detectionProbability } from '../../../src/core/population/detectionModel.ts';
import { lineRedshiftWindow } from '../../../src/core/population/lineRedshiftWindow.ts';
import { simulateSample } from '../../../src/core/population/simulateSample.ts';
import type { StellarMassFunction } from '../../../src/core/population/stellarMassFunctions.ts';
import type { SurveySpec } from '../../../src/core/population/surveySpec.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { cosmo, erdf, recipe } from '../../helpers/populationInjection.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// A Schechter shape invented for the test (log M* = 10.5, α = −1.5), drawn on [8, 11.5].
const SMF: StellarMassFunction[] = [{ id: 'test', label: 'test', z: 5, logMchar: 10.5, alpha: -1.5, logPhiStar: -4, reference: 'invented for the test', provenance: 'from memory' }];
const POP = { alpha: 6.4, beta: 1.05, sigma: 0.5, erdf, mStarRange: [8, 11.5] as const };
const ERR = { ex: 0.25, eyMeas: 0.15 };
const RANGE: [number, number] = [27000, 53000];
const open: SurveySpec = { fields: [{ name: 'all', areaArcmin2: 100, limits: { halpha: { kind: 'constant', fluxCgs: 1e-40 } } }], lamObsRangeAngstrom: RANGE, minFwhmKms: 0, minSnr: 0 };
const N = 4000;

const meanSd = (v: number[]): [number, number] => {
  const m = v.reduce((a, b) => a + b, 0) / v.length;
  return [m, Math.sqrt(v.reduce((a, b) => a + (b - m) * (b - m), 0) / (v.length - 1))];
};

describe('simulateSample without selection', () => {
  it('draws redshifts uniform in comoving volume across the line\'s window', () => {
    // Closed form: u = (V_C(z) − V_C(z_min)) / (V_C(z_max) − V_C(z_min)) is uniform on [0, 1]: mean 1/2 (standard error
    // 1/√(12 N) = 0.0046), variance 1/12 (standard error about 0.0013 for N = 4000); tolerances 4 standard errors.
    const sim = simulateSample(cosmo, open, recipe, POP, N, ERR, createRng(21), SMF);
    expect(sim.objects.length).toBe(N);
    expect(sim.detectedFraction).toBe(1);
    const w = lineRedshiftWindow('halpha', RANGE)!;
    const vLo = comovingVolumeMpc3Sr(cosmo, 0, w.zMin);
    const vHi = comovingVolumeMpc3Sr(cosmo, 0, w.zMax);
    const u = sim.objects.map((o) => (comovingVolumeMpc3Sr(cosmo, 0, o.z) - vLo) / (vHi - vLo));
    expect(Math.min(...u)).toBeGreaterThanOrEqual(0);
    expect(Math.max(...u)).toBeLessThanOrEqual(1);
    const [m, sd] = meanSd(u);
    expectClose(m, 0.5, { atol: 0.019, source: 'closed form: uniform on [0, 1], 4 × 1/√(12 N)' });
    expectClose(sd * sd, 1 / 12, { atol: 0.0053, source: 'closed form: variance 1/12 of a uniform, 4 standard errors' });
  });

  it('draws host masses from the Schechter shape, black holes about the relation, and adds the measurement errors', () => {
    // Schechter shape on [8, 10] (below m*, so that the range's end, not the exponential cut-off, ends the draws): mean
    // 8.62521063112088, sd 0.4955369316079283 (computed with scipy 1.10.1 integrate.quad); tolerance 4 standard errors. The relation's residual is N(0, 0.5),
    // x − m is N(0, 0.25), y − M_BH is N(0, √(0.3² + 0.15²)) (the calibration's scatter, then the measurement), all
    // checked to 4 standard errors (sd's standard error σ/√(2N)).
    const sim = simulateSample(cosmo, open, recipe, { ...POP, mStarRange: [8, 10] }, N, ERR, createRng(22), SMF);
    const [mMean, mSd] = meanSd(sim.objects.map((o) => o.mTrue));
    expect(Math.max(...sim.objects.map((o) => o.mTrue))).toBeLessThanOrEqual(10);
    expectClose(mMean, 8.62521063112088, { atol: 4 * 0.4955 / Math.sqrt(N), source: 'computed with scipy 1.10.1 integrate.quad' });
    expectClose(mSd, 0.4955369316079283, { atol: 4 * 0.4955 / Math.sqrt(2 * N), source: 'computed with scipy 1.10.1 integrate.quad' });
    const se = (s: number) => ({ mean: 4 * s / Math.sqrt(N), sd: 4 * s / Math.sqrt(2 * N) });
    const check = (v: number[], s: number, what: string): void => {
      const [m, sd] = meanSd(v);
      expectClose(m, 0, { atol: se(s).mean, source: `closed form: ${what} has mean 0` });
      expectClose(sd, s, { atol: se(s).sd, source: `closed form: ${what} has sd ${s}` });
    };
    check(sim.objects.map((o) => o.mbhTrue - POP.alpha - POP.beta * (o.mTrue - 10)), 0.5, 'the relation\'s residual');
    check(sim.objects.map((o) => o.x - o.mTrue), 0.25, 'x − M*');
    const sc = recipe.calibration.scatterDex;
    check(sim.objects.map((o) => o.y - o.mbhTrue), Math.hypot(sc, 0.15), 'y − M_BH');
    for (const o of sim.objects) expect(o.ey).toBe(Math.hypot(sc, 0.15));
  });
});

describe('simulateSample with selection', () => {
  it('detects the fraction that the exact detection probability predicts', () => {
    // Expected fraction: the mean of detectionProbability (Φ₂ of the linear criteria, exact for the chain) over the true
    // (z, M_BH) of an unselected draw; the selected draw (another seed) must match it within 4 binomial standard errors
    // plus the expectation's own sampling error (each ≤ 0.5/√N). A tabulated limit rising with wavelength.
    const limit = { kind: 'table' as const, lamObsAngstrom: [27000, 53000], fluxCgs: [2e-20, 8e-20] };
    const survey: SurveySpec = { ...open, fields: [{ name: 'A', areaArcmin2: 100, limits: { halpha: limit } }], minFwhmKms: 600 };
    const all = simulateSample(cosmo, open, recipe, POP, N, ERR, createRng(23), SMF);
    const crit = { limit, lamObsRangeAngstrom: RANGE, minFwhmKms: 600 };
    const expected = all.objects.reduce((s, o) => s + detectionProbability(cosmo, recipe, crit, erdf, o.mbhTrue, o.z), 0) / N;
    const sel = simulateSample(cosmo, survey, recipe, POP, N, ERR, createRng(24), SMF);
    expect(expected).toBeGreaterThan(0.1);
    expect(expected).toBeLessThan(0.9);
    expectClose(sel.detectedFraction, expected, { atol: 4 * Math.SQRT2 * 0.5 / Math.sqrt(N), source: 'detectionProbability (bivariate normal, exact for the linear chain), averaged over an unselected draw' });
    expect(sel.objects.length).toBe(Math.round(sel.detectedFraction * N));
  });

  it('refuses a first field that does not search the recipe\'s line inside the spectrograph', () => {
    const msg = 'simulateSample: the first field must search the recipe\'s line inside the spectrograph range';
    expect(() => simulateSample(cosmo, { ...open, fields: [] }, recipe, POP, 10, ERR, createRng(1), SMF)).toThrow(msg);
    expect(() => simulateSample(cosmo, { ...open, fields: [{ name: 'B', areaArcmin2: 1, limits: { hbeta: { kind: 'constant', fluxCgs: 1e-18 } } }] }, recipe, POP, 10, ERR, createRng(1), SMF)).toThrow(msg);
    expect(() => simulateSample(cosmo, { ...open, lamObsRangeAngstrom: [1000, 2000] }, recipe, POP, 10, ERR, createRng(1), SMF)).toThrow(msg);
  });
});
