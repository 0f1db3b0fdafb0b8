import { describe, expect, it } from 'vitest';
import { expectClose } from '../../helpers/expectClose.ts';
import { integrateAdaptive, kronrod15 } from '../../../src/core/cosmology/index.ts';
import { KRONROD15_POINTS, kronrod15Abscissae, kronrod15FromValues } from '../../../src/core/cosmology/gaussKronrod.ts';

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

  it('gives kronrod15\'s bits from values taken at its abscissae, which it evaluates in that order', () => {
    const seen: number[] = [];
    const f = (x: number): number => {
      seen.push(x);
      return Math.sin(3 * x) + x * x * Math.exp(-x);
    };
    const x = new Float64Array(KRONROD15_POINTS);
    const fx = new Float64Array(KRONROD15_POINTS);
    for (const [a, b] of [[0, 1], [-2.5, 0.75], [3, 3 + 1 / 128], [1e-3, 7]] as const) {
      seen.length = 0;
      const direct = kronrod15(f, a, b);
      kronrod15Abscissae(a, b, x);
      expect([...x]).toEqual(seen);
      for (let k = 0; k < KRONROD15_POINTS; k++) fx[k] = Math.sin(3 * x[k]!) + x[k]! * x[k]! * Math.exp(-x[k]!);
      const split = kronrod15FromValues(fx, a, b);
      expect(Object.is(split.value, direct.value)).toBe(true);
      expect(Object.is(split.error, direct.error)).toBe(true);
    }
  });

  it('places the abscissae symmetrically about the centre, inside the interval', () => {
    const x = new Float64Array(KRONROD15_POINTS);
    kronrod15Abscissae(2, 4, x);
    expect(x[0]).toBe(3);
    for (let j = 0; j < 7; j++) {
      expect(x[1 + 2 * j]! + x[2 + 2 * j]!).toBeCloseTo(6, 14);
      expect(x[1 + 2 * j]!).toBeGreaterThan(2);
      expect(x[2 + 2 * j]!).toBeLessThan(4);
    }
    // The outermost node, 0.99145537112081263921 of the half-width (QUADPACK qk15 xgk(1)).
    expect(x[2]! - 3).toBeCloseTo(0.991455371120812639, 15);
  });
});

