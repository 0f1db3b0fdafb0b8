import { describe, it } from 'vitest';
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
});
