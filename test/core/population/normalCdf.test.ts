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

describe('normalCdf', () => {
  it('matches scipy 1.10.1 norm.cdf to 1e-14 relative', () => {
    for (const r of SCIPY) expectClose(normalCdf(r.x), r.cdf, { rtol: 1e-13, source: `computed with scipy 1.10.1 norm.cdf(${r.x})` });
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
