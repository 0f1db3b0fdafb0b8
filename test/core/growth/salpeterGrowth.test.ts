import { describe, it, expect } from 'vitest';
import {
  eFolds,
  lambdaRequired,
  logMassAfter,
  logSeedMassRequired,
  salpeterTimeGyr,
} from '../../../src/core/growth/salpeterGrowth.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// Planck18 ages at z = 6 and z = 20, published-checks.md (computed with astropy 5.2.1), 5 decimals.
const AGE_Z6 = 0.92926;
const AGE_Z20 = 0.17811;
const DT = AGE_Z6 - AGE_Z20;
// The ages are rounded to 1e-5 Gyr, so Δt carries up to 1e-5 Gyr, i.e. 2e-4 e-folds at ε = 0.1: the
// tolerances below are that input rounding, not looser than the digits published.

describe('Eddington-limited (Salpeter) growth', () => {
  it('has an e-folding time of 50.05 Myr at ε = 0.1, λ = 1', () => {
    // published-checks.md (computed from t_Edd = 0.45049 Gyr); 2 decimals in Myr → atol 0.005 Myr.
    expectClose(salpeterTimeGyr(0.1, 1) * 1e3, 50.05, { atol: 0.005, source: 'published-checks.md (computed)' });
  });

  it('gives 15.0066 e-folds from z = 20 to z = 6 at ε = 0.1, λ = 1', () => {
    // published-checks.md (computed); atol 2e-4 from the rounding of the input ages (see top).
    expectClose(eFolds(DT, 0.1, 1, 1), 15.0066, { atol: 2e-4, source: 'published-checks.md (computed)' });
  });

  it('needs a 30.39 M_sun seed at z = 20 for 1e8 M_sun at z = 6 (λ = 1)', () => {
    // published-checks.md (computed); rtol 3e-4: 4 digits plus the 2e-4 e-fold input rounding.
    expectClose(10 ** logSeedMassRequired(8, DT, 0.1, 1, 1), 30.39, { rtol: 3e-4, source: 'published-checks.md (computed)' });
  });

  it('needs a 5.513e4 M_sun seed with λ = 0.5', () => {
    // published-checks.md (computed); rtol 2e-4 (4 digits plus input rounding).
    expectClose(10 ** logSeedMassRequired(8, DT, 0.1, 0.5, 1), 5.513e4, { rtol: 2e-4, source: 'published-checks.md (computed)' });
  });

  it('treats a duty cycle of one half like half the Eddington ratio', () => {
    expectClose(eFolds(DT, 0.1, 1, 0.5), eFolds(DT, 0.1, 0.5, 1), { rtol: 1e-12, source: 'form of the model' });
  });

  it('grows a seed back to the mass it was derived from', () => {
    const seed = logSeedMassRequired(7.8, 0.6, 0.1, 0.7, 0.9);
    expectClose(logMassAfter(seed, 0.6, 0.1, 0.7, 0.9), 7.8, { atol: 1e-12, source: 'round trip' });
  });

  it('recovers λ = 1 and λ = 0.5 from the seeds above', () => {
    // Inverse of the published-checks.md seeds; tolerance from their 4-digit rounding (Δln M ≈ 1.6e-4 over 15 e-folds).
    expectClose(lambdaRequired(8, Math.log10(30.39), DT, 0.1, 1), 1, { rtol: 5e-5, source: 'published-checks.md (computed), inverted' });
    expectClose(lambdaRequired(8, Math.log10(5.513e4), DT, 0.1, 1), 0.5, { rtol: 5e-5, source: 'published-checks.md (computed), inverted' });
  });

  it('returns λ = 0 when no growth is needed, Infinity for growth in no time, NaN for negative time', () => {
    expect(lambdaRequired(5, 5, 0.3, 0.1, 1)).toBe(0);
    expect(lambdaRequired(4, 5, 0, 0.1, 1)).toBe(0);
    expect(lambdaRequired(8, 5, 0, 0.1, 1)).toBe(Infinity);
    expect(lambdaRequired(8, 5, 0.3, 0.1, 0)).toBe(Infinity);
    expect(lambdaRequired(8, 5, -0.1, 0.1, 1)).toBeNaN();
    expect(lambdaRequired(NaN, 5, 0.3, 0.1, 1)).toBeNaN();
  });

  it('returns NaN e-folds (and so NaN seed mass) for a negative growth time', () => {
    expect(eFolds(-0.1, 0.1, 1, 1)).toBeNaN();
    expect(logSeedMassRequired(8, -0.1, 0.1, 1, 1)).toBeNaN();
  });

  it('rejects an efficiency outside (0, 1)', () => {
    expect(() => eFolds(0.5, 1, 1, 1)).toThrow(/radiative efficiency/);
    expect(() => salpeterTimeGyr(0, 1)).toThrow(RangeError);
  });
});

describe('Eddington-limited growth at the edges of its domain', () => {
  it('lengthens the e-folding time as 1/λ: 100.10 Myr at λ = 0.5', () => {
    // ε/(1−ε) t_Edd / λ with t_Edd = 0.45049 Gyr (published-checks.md, computed): 0.050054/0.5 Gyr; 2 decimals in Myr.
    expectClose(salpeterTimeGyr(0.1, 0.5) * 1e3, 100.1, { atol: 0.01, source: 'closed form with published-checks.md t_Edd' });
  });

  it('gives zero e-folds, and a seed equal to the mass, for zero growth time', () => {
    expect(eFolds(0, 0.1, 1, 1)).toBe(0);
    expect(logSeedMassRequired(8, 0, 0.1, 1, 1)).toBe(8);
  });

  it('needs λ = 0 for a mass equal to the seed even with no time to grow', () => {
    expect(lambdaRequired(5, 5, 0, 0.1, 1)).toBe(0);
  });

  it('returns NaN for a missing value in any argument, whatever the others say', () => {
    // Each case would otherwise reach a defined branch: M ≤ M_seed (0) or Δt = 0 (Infinity).
    expect(lambdaRequired(NaN, 5, 0, 0.1, 1)).toBeNaN();
    expect(lambdaRequired(8, NaN, 0, 0.1, 1)).toBeNaN();
    expect(lambdaRequired(4, 5, NaN, 0.1, 1)).toBeNaN();
    expect(lambdaRequired(4, 5, 0.3, 0.1, NaN)).toBeNaN();
  });
});
