import { describe, expect, it } from 'vitest';
import { expectClose } from '../../helpers/expectClose.ts';
import { integrateAdaptive, kronrod15 } from '../../../src/core/cosmology/index.ts';

describe('Gauss–Kronrod quadrature', () => {
  it('integrates polynomials up to degree 22 exactly with one 15-point rule', () => {
    for (let k = 0; k <= 22; k++) {
      const { value } = kronrod15((x) => x ** k, 0, 2);
      expectClose(value, 2 ** (k + 1) / (k + 1), { rtol: 1e-14, source: `∫_0^2 x^${k} dx = 2^${k + 1}/${k + 1} (exact)` });
    }
  });

  it('reports the Gauss–Kronrod difference as zero for degree ≤ 13 and nonzero beyond', () => {
    expect(kronrod15((x) => x ** 13, 0, 1).error).toBeLessThan(1e-15);
    expect(kronrod15((x) => x ** 20, 0, 1).error).toBeGreaterThan(1e-8);
  });

  it('integrates a peaked smooth function adaptively to 1e-12', () => {
    // ∫_-1^1 dx/(1e-4 + x²) = 2 atan(100)/0.01 (exact).
    expectClose(integrateAdaptive((x) => 1 / (1e-4 + x * x), -1, 1), 200 * Math.atan(100), { rtol: 1e-12, source: 'exact antiderivative' });
  });

  it('returns 0 on an empty interval without evaluating the integrand', () => {
    expect(integrateAdaptive(() => Number.NaN, 0, 0)).toBe(0);
  });
});
