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

  it('walks a linear exponent from its larger end, so a value that does not underflow is kept', () => {
    // Closed form: one exponential per point. Rising: exp(−780) underflows at q = 0 but exp(−670) at q = 11 does not;
    // falling: the other way round (exp(−740) is subnormal, with 2 significant digits).
    for (const [a, b, c] of [[0, 10, -780], [0, -10, -630]] as const) {
      const out = new Float64Array(12);
      addExpQuadratic(out, 12, a, b, c, 1);
      direct(12, a, b, c, 1).forEach((v, q) => {
        expectClose(out[q] as number, v, { rtol: 1e-12, atol: 1e-300, source: `closed form exp(${b} q + ${c}), q = ${q}` });
      });
    }
  });

  it('steps down from a peak whose upward ratio underflows to 0, using the downward ratio directly', () => {
    // E(q) = −1000 q² + 9200 q − 21000: E(5) = 0 (the peak), E(4) = −200, E(6) − E(5) = −1800 (exp underflows, so the
    // downward ratio cannot be formed as exp(2a) / up). Closed form: out[4] = exp(−200), out[5] = 1, all others 0.
    const out = new Float64Array(10);
    addExpQuadratic(out, 10, -1000, 9200, -21000, 1);
    expectClose(out[4] as number, Math.exp(-200), { rtol: 1e-12, source: 'closed form exp(E(4)) = exp(−200)' });
    expectClose(out[5] as number, 1, { rtol: 1e-12, source: 'closed form exp(E(5)) = 1' });
    for (const q of [0, 1, 2, 3, 6, 7, 8, 9]) expect(out[q]).toBe(0);
  });

  it('writes only the first count entries of a longer accumulator', () => {
    // The contract: out is "at least count long"; entries from count on belong to the caller.
    for (const [a, b] of [[-0.3, 4.1], [0, 0.3], [0, -0.3]] as const) {
      const out = new Float64Array(9).fill(-7);
      addExpQuadratic(out, 6, a, b, -2, 1);
      for (let q = 6; q < 9; q++) expect(out[q], `entry ${q}, (a, b) = (${a}, ${b})`).toBe(-7);
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
    // A linear exponent (a = 0) would otherwise peak at index 0.
    addExpQuadratic(out, 0, 0, -1, 0, 1);
    expect([...out]).toEqual([2, 2, 2]);
  });
});
