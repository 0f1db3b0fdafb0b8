import { describe, expect, it } from 'vitest';
import { poissonInterval } from '../../../src/core/population/poissonInterval.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// Gehrels 1986, ApJ 303, 336, Table 1 (upper limits) and Table 2 (lower limits), column S = 1
// (CL 0.8413), printed to three decimals (two for 14.27): tolerance half a unit in the last printed digit.
// The same numbers computed with astropy 5.2.1 `poisson_conf_interval(n, 'frequentist-confidence')`:
// n = 0: 0, 1.84102165; n = 1: 0.17275378, 3.29952656; n = 2: 0.70818544, 4.63785962;
// n = 10: 6.89130556, 14.26694976 — checked below to 1e-7 relative.
const GEHRELS = [
  { n: 0, lower: 0, upper: 1.841, half: 5e-4 },
  { n: 1, lower: 0.173, upper: 3.3, half: 5e-4 },
  { n: 2, lower: 0.708, upper: 4.638, half: 5e-4 },
  { n: 10, lower: 6.891, upper: 14.27, half: 5e-3 },
];
const ASTROPY = [
  { n: 0, lower: 0, upper: 1.84102165 },
  { n: 1, lower: 0.17275378, upper: 3.29952656 },
  { n: 2, lower: 0.70818544, upper: 4.63785962 },
  { n: 10, lower: 6.89130556, upper: 14.26694976 },
];

// The same limits to 50 digits: λ_u solves Q(n + 1, λ) = Φ(−S) and λ_l solves P(n, λ) = Φ(−S) (the regularized
// incomplete gamma functions: P(N ≤ n | λ) = Q(n + 1, λ), P(N ≥ n | λ) = P(n, λ)), Φ(−S) = ncdf(−S), each root by
// 400 bisections; computed with mpmath 1.2.1 (Debian python3-mpmath) at mp.dps = 50, printed by repr(float(·))
// (scripts/reference/poissonLimits.py prints them).
// (scipy's chi2.ppf(norm.cdf(S), ·) is no reference here: Φ(S) rounded to a double leaves Φ(−S) only 1e-16 / Φ(−S)
// relative, and its upper limit for n = 0, S = 6 is 2.7e-9 off.) Tolerance 1e-13 relative: the bisection stops at
// 1e-14 of its bracket, and the largest difference seen is 4.3e-14 (lower limits).
const MPMATH = [
  { n: 1, sigmas: 1, lower: 0.17275377902344988, upper: 3.299526559115855 },
  { n: 3, sigmas: 1, lower: 1.367295313890434, upper: 5.918185832883397 },
  { n: 5, sigmas: 2, lower: 1.5828728006821131, upper: 11.820598955701573 },
  { n: 20, sigmas: 1, lower: 15.565552017785876, upper: 25.546519229511457 },
  { n: 50, sigmas: 3, lower: 31.422131081755957, upper: 75.10778740187482 },
  { n: 100, sigmas: 1, lower: 90.0167451771134, upper: 111.03336094114967 },
  { n: 400, sigmas: 2, lower: 361.0081432536744, upper: 442.04146567994786 },
  { n: 0, sigmas: 0.5, lower: 0, upper: 1.1759117615936185 },
  { n: 7, sigmas: 0.5, lower: 5.465406521313556, upper: 9.133129975849048 },
  { n: 0, sigmas: 3, lower: 0, upper: 6.607726221510349 },
  { n: 0, sigmas: 6, lower: 0, upper: 20.736768949974707 },
  { n: 1, sigmas: 3, lower: 0.0013508099647481938, upper: 8.900290301616586 },
  { n: 2, sigmas: 4, lower: 0.007979990636705988, upper: 15.24648947213367 },
  { n: 1, sigmas: 5, lower: 2.866516129637636e-07, upper: 18.00996152663843 },
  { n: 10, sigmas: 5, lower: 1.1100562372607947, upper: 36.14721929368541 },
];

// Widths S far below 1, where Φ(−S) is near 1/2 and the roots lie within a unit of n: the bisection then evaluates the
// upper limit's P(N ≤ n | λ) at means below n (the terms above the largest one matter there) and the lower limit's
// P(N ≥ n | λ) at means above n, where a wrong tail can turn the bisection the wrong way. Computed with mpmath 1.2.1
// (Debian python3-mpmath) at mp.dps = 50 as above, by scripts/reference/poissonLimits.py.
const MPMATH_NARROW = [
  { n: 1, sigmas: 0.01, lower: 0.6852001295571155, upper: 1.6911126119265336 },
  { n: 2, sigmas: 0.01, lower: 1.6656468950877286, upper: 2.690271410931708 },
  { n: 5, sigmas: 0.01, lower: 4.649460457391498, upper: 5.693888137313612 },
  { n: 21, sigmas: 0.01, lower: 20.622256694018276, upper: 21.714101319342266 },
  { n: 30, sigmas: 0.05, lower: 29.39608221516218, upper: 30.944783488080063 },
  { n: 13, sigmas: 0.02, lower: 12.597334293284197, upper: 13.742037340262648 },
  { n: 40, sigmas: 0.01, lower: 39.60426064640067, upper: 40.73091321343584 },
];

describe('poissonInterval', () => {
  it('gives the 1σ limits of Gehrels 1986 Tables 1 and 2 for N = 0, 1, 2 and 10', () => {
    for (const g of GEHRELS) {
      const got = poissonInterval(g.n);
      const src = `Gehrels 1986, Tables 1–2, S = 1, n = ${g.n}, as printed`;
      expectClose(got.upper, g.upper, { atol: g.half, source: src });
      expectClose(got.lower, g.lower, { atol: 5e-4, source: src });
    }
  });

  it('agrees with astropy 5.2.1 frequentist-confidence limits to 1e-7', () => {
    for (const a of ASTROPY) {
      const got = poissonInterval(a.n);
      const src = `computed with astropy 5.2.1 poisson_conf_interval, n = ${a.n}, printed to 9 digits`;
      expectClose(got.upper, a.upper, { rtol: 1e-7, source: src });
      expectClose(got.lower, a.lower, { rtol: 1e-7, atol: 1e-12, source: src });
    }
  });

  it('agrees with the exact limits (mpmath, 50 digits) to 1e-13 for counts up to 400 and S from 0.5 to 6', () => {
    for (const c of MPMATH) {
      const got = poissonInterval(c.n, c.sigmas);
      const src = `mpmath 1.2.1 incomplete-gamma roots at 50 digits, n = ${c.n}, S = ${c.sigmas}`;
      expectClose(got.upper, c.upper, { rtol: 1e-13, source: src });
      if (c.n === 0) expect(got.lower).toBe(0);
      else expectClose(got.lower, c.lower, { rtol: 1e-13, source: src });
    }
  });

  it('agrees with the exact limits (mpmath, 50 digits) to 1e-13 for widths S of 0.01 to 0.05, where both roots lie within a unit of n', () => {
    for (const c of MPMATH_NARROW) {
      const got = poissonInterval(c.n, c.sigmas);
      const src = `mpmath 1.2.1 incomplete-gamma roots at 50 digits (scripts/reference/poissonLimits.py), n = ${c.n}, S = ${c.sigmas}`;
      expectClose(got.upper, c.upper, { rtol: 1e-13, source: src });
      expectClose(got.lower, c.lower, { rtol: 1e-13, source: src });
    }
  });

  it('approaches n ± √n for large counts', () => {
    // Closed form limit (central limit theorem): for n = 10⁴ the 1σ limits are n ± √n to O(1).
    const got = poissonInterval(10000);
    expectClose(got.upper, 10000 + 100 + 1, { atol: 1, source: 'normal approximation n + √n + O(1), closed form' });
    expectClose(got.lower, 10000 - 100, { atol: 1, source: 'normal approximation n − √n + O(1), closed form' });
  });

  it('rejects a negative or fractional count', () => {
    const bad = [-1, 1.5];
    for (const n of bad) {
      let msg = '';
      try { poissonInterval(n); } catch (e) { msg = (e as Error).message; }
      if (!msg.includes('non-negative integer')) throw new Error(`expected a message for ${n}, got '${msg}'`);
    }
  });

  it('rejects a width S that is zero, negative or not a number', () => {
    for (const sigmas of [0, -1, NaN]) expect(() => poissonInterval(3, sigmas)).toThrow(`poissonInterval: sigmas must be positive, got ${sigmas}`);
  });
});
