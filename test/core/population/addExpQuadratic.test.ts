import { describe, expect, it } from 'vitest';
import { addExpQuadratic } from '../../../src/core/population/addExpQuadratic.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const direct = (count: number, a: number, b: number, c: number, w: number): number[] =>
  Array.from({ length: count }, (_, q) => w * Math.exp(a * q * q + b * q + c));

describe('addExpQuadratic', () => {
  it('adds weight · exp(a q² + b q + c) at every point to 1e-12, whether the peak is inside, at an end or beyond it', () => {
    // Internal check against one Math.exp per point.
    const cases: [number, number, number, number, number][] = [
      [25, -0.3, 4.1, -20, 0.7], // peak inside the window
      [25, -0.02, -0.5, 1, 1.3], // peak before q = 0
      [25, -0.02, 2, -30, 0.2], // peak after the last point
      [40, -3.5, 70, -360, 1], // a sharp peak: most points underflow towards 0
      [12, 0, 0.3, -2, 1], // linear exponent, rising
      [12, 0, -0.3, -2, 1], // linear exponent, falling
      [1, -1, 1, 0.5, 2], // one point
    ];
    for (const [count, a, b, c, w] of cases) {
      const out = new Float64Array(count).fill(0.25);
      addExpQuadratic(out, count, a, b, c, w);
      direct(count, a, b, c, w).forEach((v, q) => {
        expectClose(out[q] as number, 0.25 + v, { rtol: 1e-12, atol: 1e-300, source: `internal: one exponential per point, (count, a, b, c) = (${count}, ${a}, ${b}, ${c}), q = ${q}` });
      });
    }
  });

  it('writes zeros, not infinities or NaN, where the exponent is far below the double range', () => {
    const out = new Float64Array(30);
    addExpQuadratic(out, 30, -50, 1500, -12000, 1);
    for (const v of out) expect(Number.isFinite(v)).toBe(true);
    expectClose(out[15] as number, Math.exp(-50 * 225 + 1500 * 15 - 12000), { rtol: 1e-12, source: 'internal: the peak, one exponential' });
    expect(out[0]).toBe(0);
  });

  it('leaves the accumulator alone for an empty window', () => {
    const out = new Float64Array(3).fill(2);
    addExpQuadratic(out, 0, -1, 0, 0, 1);
    expect([...out]).toEqual([2, 2, 2]);
  });
});
