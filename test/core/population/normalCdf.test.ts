import { describe, expect, it } from 'vitest';
import { logNormalCdf, normalCdf } from '../../../src/core/population/normalCdf.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// Reference values computed with scipy 1.10.1 (Debian python3-scipy) scipy.stats.norm.cdf / logcdf,
// printed with 17 significant digits.
const SCIPY = [
  { x: 0, cdf: 0.5 },
  { x: 1, cdf: 0.8413447460685429 },
  { x: -1, cdf: 0.15865525393145707 },
  { x: 1.96, cdf: 0.9750021048517795 },
  { x: -3, cdf: 0.0013498980316300933 },
  { x: -8, cdf: 6.22096057427174e-16 },
];

// Computed with scipy 1.10.1 (Debian python3-scipy) scipy.stats.norm.cdf / norm.logcdf, printed by repr, at points
// where erfc's argument |x|/√2 is above 2, i.e. on the continued-fraction path.
const SCIPY_CONTINUED_FRACTION = [
  { x: -2.875, cdf: 0.0020201374899460017 },
  { x: -3.125, cdf: 0.0008890252991084321 },
  { x: -3.875, cdf: 5.331234975109624e-05 },
  { x: -5.625, cdf: 9.275398734560802e-09 },
  { x: -5.875, cdf: 2.1142167424408314e-09 },
  { x: -6.125, cdf: 4.534180326695269e-10 },
  { x: -6.625, cdf: 1.7362408953520502e-11 },
  { x: -6.875, cdf: 3.0994929517572154e-12 },
];
const SCIPY_LOG_UPPER = [
  { x: 2.875, logcdf: -0.00202218071988582 },
  { x: 3.125, logcdf: -0.0008894207164743915 },
  { x: 3.875, logcdf: -5.3313770904924494e-05 },
  { x: 5.625, logcdf: -9.275398777577317e-09 },
  { x: 5.875, logcdf: -2.1142167446757874e-09 },
  { x: 6.125, logcdf: -4.534180327723208e-10 },
  { x: 6.625, logcdf: -1.7362408953671233e-11 },
  { x: 6.875, logcdf: -3.099492951762019e-12 },
];

describe('normalCdf', () => {
  it('matches scipy 1.10.1 norm.cdf to 1e-14 relative', () => {
    for (const r of SCIPY) expectClose(normalCdf(r.x), r.cdf, { rtol: 1e-13, source: `computed with scipy 1.10.1 norm.cdf(${r.x})` });
  });

  it('stops the continued fraction once it has converged, keeping Φ and ln Φ to 3e-15 relative beyond |x| = 2√2', () => {
    // Tolerance: about twice the largest difference seen on this path (1.4e-15, the two codes' rounding together);
    // running the fraction on after convergence multiplies in factors that differ from 1 in the last bit and drifts
    // by about 1e-14 at these points.
    for (const r of SCIPY_CONTINUED_FRACTION) expectClose(normalCdf(r.x), r.cdf, { rtol: 3e-15, source: `computed with scipy 1.10.1 norm.cdf(${r.x})` });
    for (const r of SCIPY_LOG_UPPER) expectClose(logNormalCdf(r.x), r.logcdf, { rtol: 3e-15, source: `computed with scipy 1.10.1 norm.logcdf(${r.x})` });
  });

  it('keeps ln Φ finite far in the lower tail, where Φ underflows', () => {
    // scipy 1.10.1 norm.logcdf(-40) = -804.6084420137539
    expectClose(logNormalCdf(-40), -804.6084420137539, { rtol: 1e-13, source: 'computed with scipy 1.10.1 norm.logcdf(-40)' });
    expect(normalCdf(-40)).toBeLessThan(1e-300);
  });

  it('agrees with ln of normalCdf where both are representable', () => {
    for (const x of [-5, -2.5, -1.9, -0.3, 0.7, 3]) {
      expectClose(logNormalCdf(x), Math.log(normalCdf(x)), { rtol: 1e-13, source: 'identity ln Φ = ln(Φ), internal consistency' });
    }
  });
});
