import { describe, expect, it } from 'vitest';
import { drawFromBank, drawPositive, snr } from '../../../src/core/derive/drawPositive.ts';
import type { Measured } from '../../../src/core/derive/types.ts';
import { createDrawBank } from '../../../src/core/random/drawBank.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// Closed forms of the normal truncated at zero, N(1, 1) restricted to x > 0: with α = −1,
// φ(α) = 0.2419707 and 1 − Φ(α) = 0.8413447 (normal tables), the mean is 1 + φ(α)/(1 − Φ(α)) = 1.287600
// and the variance 1 + αφ/(1−Φ) − (φ/(1−Φ))² = 0.629686, so the standard deviation is 0.793515
// (e.g. Johnson, Kotz & Balakrishnan 1994, Continuous Univariate Distributions vol. 1, §10.1).
const TRUNC_MEAN = 1.2876;
const TRUNC_SD = 0.793515;
const N = 20000;
/** Four standard errors of a mean of N draws. */
const meanTol = (sd: number) => (4 * sd) / Math.sqrt(N);

function mean(a: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i] as number;
  return s / a.length;
}

/** A bank of N deviates per role, from a seeded stream. */
const bankOf = (seed: number) => createDrawBank(createRng(seed), N);
const drawn = (seed: number, m: Measured, positive: boolean, role = 'x') => {
  const out = new Float64Array(N);
  drawFromBank(bankOf(seed), role, m, out, positive);
  return out;
};

/** Index of the first difference of two arrays, −1 when equal element by element. */
const firstDifference = (a: Float64Array, b: Float64Array): number => {
  if (a.length !== b.length) return 0;
  for (let k = 0; k < a.length; k++) if (!Object.is(a[k], b[k])) return k;
  return -1;
};

describe('drawPositive', () => {
  it('returns the value itself for an exact measurement', () => {
    expect(drawPositive(createRng(1), { value: 3 })).toBe(3);
  });

  it('draws only above the value when the lower error is zero (a one-sided error, not an exact value)', () => {
    const rng = createRng(21);
    const draws = Array.from({ length: 200 }, () => drawPositive(rng, { value: 1, errLo: 0, errHi: 1 }));
    expect(Math.min(...draws)).toBeGreaterThanOrEqual(1);
    expect(new Set(draws).size).toBe(200);
  });

  it('draws N(1, 1) truncated at zero: every draw positive, mean 1.2876', () => {
    const rng = createRng(2);
    const one = Array.from({ length: N }, () => drawPositive(rng, { value: 1, errLo: 1, errHi: 1 }));
    expect(Math.min(...one)).toBeGreaterThan(0);
    expectClose(mean(one), TRUNC_MEAN, { atol: meanTol(TRUNC_SD), source: 'truncated normal mean, closed form, 4 standard errors' });
  });
});

describe('drawFromBank', () => {
  it('fills the value itself for an exact measurement, without touching the bank', () => {
    const out = new Float64Array(4);
    const bank = { n: 4, generation: 0, normals: () => { throw new Error('drew'); }, uniforms: () => { throw new Error('drew'); }, redraws: () => { throw new Error('drew'); }, derived: () => { throw new Error('drew'); } };
    drawFromBank(bank, 'x', { value: 3, errLo: 0, errHi: 0 }, out, true);
    expect([...out]).toEqual([3, 3, 3, 3]);
  });

  it('draws value + σ·z from the role\'s normal deviates for a symmetric error', () => {
    const bank = bankOf(7);
    const out = new Float64Array(N);
    drawFromBank(bank, 'width_halpha', { value: 2000, errLo: 150, errHi: 150 }, out, false);
    const z = bank.normals('width_halpha');
    for (let k = 0; k < N; k += 997) expect(out[k]).toBe(2000 + 150 * (z[k] as number));
  });

  it('keeps value + σ·z for every draw of a positive quantity far from zero (nothing redrawn)', () => {
    const bank = bankOf(22);
    const out = new Float64Array(N);
    drawFromBank(bank, 'lum_halpha', { value: 100, errLo: 5, errHi: 5 }, out, true);
    const z = bank.normals('lum_halpha');
    let differ = 0;
    for (let k = 0; k < N; k++) if (out[k] !== 100 + 5 * (z[k] as number)) differ++;
    expect(differ).toBe(0);
  });

  it('draws value + σ·z for every draw of any count, the one to three left over by its steps of four included, and redraws a non-positive one there', () => {
    for (const n of [1, 2, 3, 5, 6, 7, 1001, 1002, 1003]) {
      const bank = createDrawBank(createRng(40 + n), n);
      const out = new Float64Array(n);
      drawFromBank(bank, 'lum_halpha', { value: 100, errLo: 5, errHi: 5 }, out, true);
      const z = bank.normals('lum_halpha');
      for (let k = 0; k < n; k++) expect(out[k], `n = ${n}, k = ${k}`).toBe(100 + 5 * (z[k] as number));
    }
    // A single draw ≤ 0, in any place of a step of four or among those left over, must still be
    // found and redrawn (a bank whose deviates are all 0 but one).
    for (const n of [5, 6, 7, 1003]) {
      for (const bad of [0, 1, 2, 3, n - 1]) {
        const z = new Float64Array(n);
        z[bad] = -10;
        const redraw = createRng(3);
        const bank = { n, generation: 0, normals: () => z, uniforms: () => { throw new Error('uniforms'); }, redraws: () => redraw, derived: () => { throw new Error('derived'); } };
        const out = new Float64Array(n);
        drawFromBank(bank, 'lum_halpha', { value: 1, errLo: 0.5, errHi: 0.5 }, out, true);
        for (let k = 0; k < n; k++) if (k !== bad) expect(out[k]).toBe(1);
        expect(out[bad], `n = ${n}, draw ${bad}`).toBeGreaterThan(0);
      }
    }
  });

  it('draws a one-sided error (lower error zero) only above the value', () => {
    const out = drawn(23, { value: 10, errLo: 0, errHi: 2 }, true);
    expect(Math.min(...out)).toBeGreaterThanOrEqual(10);
    expect(new Set(out).size).toBeGreaterThan(N / 2);
  });

  it('draws a one-sided error (upper error zero) only below the value', () => {
    // Split normal (John 1982) with σhi = 0: a fraction σlo/(σlo + σhi) = 1 of the draws lies below the mode.
    const out = drawn(24, { value: 10, errLo: 2, errHi: 0 }, false);
    expect(Math.max(...out)).toBeLessThanOrEqual(10);
    expect(new Set(out).size).toBeGreaterThan(N / 2);
  });

  it('redraws a draw of exactly zero: a positive quantity is strictly positive', () => {
    // The bank's deviates put one draw of 1 + 1·z exactly at 0 and the rest above it (the smallest draw is 0, not
    // below it); the contract of drawPositive (a value > 0) applies to it as to any draw ≤ 0.
    const z = Float64Array.from([0.5, -1, 0.25, 2, 1]);
    const redraw = createRng(11);
    const bank = { n: 5, generation: 0, normals: () => z, uniforms: () => { throw new Error('uniforms'); }, redraws: () => redraw, derived: () => { throw new Error('derived'); } };
    const out = new Float64Array(5);
    drawFromBank(bank, 'lum_halpha', { value: 1, errLo: 1, errHi: 1 }, out, true);
    expect([out[0], out[2], out[3], out[4]]).toEqual([1.5, 1.25, 3, 2]);
    expect(out[1]).toBeGreaterThan(0);
  });

  it('draws a positive quantity as N(1, 1) truncated at zero: every draw positive, mean 1.2876', () => {
    const out = drawn(2, { value: 1, errLo: 1, errHi: 1 }, true);
    expect(Math.min(...out)).toBeGreaterThan(0);
    expectClose(mean(out), TRUNC_MEAN, { atol: meanTol(TRUNC_SD), source: 'truncated normal mean, closed form, 4 standard errors' });
  });

  it('keeps negative draws of a quantity of any sign: N(0, 1), half below zero', () => {
    const out = drawn(5, { value: 0, errLo: 1, errHi: 1 }, false);
    let below = 0;
    for (const x of out) if (x < 0) below++;
    // N(0, 1): half below zero, none clipped; binomial, 4 standard errors
    expectClose(below / N, 0.5, { atol: 4 * Math.sqrt(0.25 / N), source: 'normal, closed form' });
    expectClose(mean(out), 0, { atol: meanTol(1), source: 'normal mean, closed form' });
  });

  it('takes an error given on one side only as symmetric', () => {
    const both = drawn(3, { value: 1, errLo: 1, errHi: 1 }, true);
    expect(firstDifference(drawn(3, { value: 1, errHi: 1 }, true), both)).toBe(-1);
    expect(firstDifference(drawn(3, { value: 1, errLo: 1 }, true), both)).toBe(-1);
    expect(firstDifference(drawn(3, { value: 1, errLo: 1, errHi: 1.5 }, true), both)).not.toBe(-1);
  });

  it('draws asymmetric errors as a split normal, a fraction σlo/(σlo+σhi) below the value', () => {
    for (const [lo, hi, p] of [[1, 3, 0.25], [3, 1, 0.75]] as const) {
      const out = drawn(4, { value: 10, errLo: lo, errHi: hi }, true);
      let below = 0;
      for (const x of out) if (x < 10) below++;
      // split normal (John 1982): P(x < mode) = σlo/(σlo+σhi); binomial standard error sqrt(p(1−p)/N), 4 of them
      expectClose(below / N, p, { atol: 4 * Math.sqrt((p * (1 - p)) / N), source: 'split normal, closed form' });
      // mean = mode + √(2/π)(σhi − σlo) (closed form); sd² = (1 − 2/π)(σhi − σlo)² + σlo σhi = 4.4535
      expectClose(mean(out), 10 + Math.sqrt(2 / Math.PI) * (hi - lo), { atol: meanTol(Math.sqrt(4.4535)), source: 'split normal mean, closed form' });
    }
  });

  it('redraws the non-positive draws of an asymmetric error (split normal) and keeps the others', () => {
    // value 1, σlo = 1, σhi = 3: a draw falls below the value with probability 1/4 and then ≤ 0 when |z| ≥ 1, so about
    // 0.25 × 0.3173 ≈ 8 % of the first draws are ≤ 0 (split normal, John 1982; 2(1 − Φ(1)) = 0.3173, normal tables).
    const m = { value: 1, errLo: 1, errHi: 3 };
    const plain = drawn(31, m, false);
    const out = drawn(31, m, true);
    let redrawn = 0;
    for (let k = 0; k < N; k++) {
      if ((plain[k] as number) > 0) expect(out[k]).toBe(plain[k]);
      else redrawn++;
    }
    expect(Math.min(...out)).toBeGreaterThan(0);
    // binomial, 4 standard errors
    expectClose(redrawn / N, 0.25 * 0.3173, { atol: 4 * Math.sqrt((0.08 * 0.92) / N), source: 'split normal (John 1982) below-zero fraction, closed form' });
  });

  it('draws a measurement scaled by d as the draws of the measurement divided by d: a deflated width is paired with the measured one', () => {
    const d = 3.7;
    const measured = drawn(8, { value: 1200, errLo: 500, errHi: 900 }, true);
    const deflated = drawn(8, { value: 1200 / d, errLo: 500 / d, errHi: 900 / d }, true);
    let worst = 0;
    // Rounding only: both are value + σ·z in floating point, relative to the value's scale.
    for (let k = 0; k < N; k++) worst = Math.max(worst, Math.abs((deflated[k] as number) * d - (measured[k] as number)) / 1200);
    expect(worst).toBeLessThan(1e-14);
  });

  it('redraws a non-positive draw from the role\'s own redraw stream, the same for every reading', () => {
    // S/N 0.5: about 16 % of the first draws are ≤ 0 and are redrawn.
    const a = drawn(9, { value: 1, errLo: 2, errHi: 2 }, true);
    const b = drawn(9, { value: 1, errLo: 2, errHi: 2 }, true);
    expect(Math.min(...a)).toBeGreaterThan(0);
    expect(firstDifference(a, b)).toBe(-1);
    const z = bankOf(9).normals('x');
    let redrawn = 0;
    for (let k = 0; k < N; k++) if (1 + 2 * (z[k] as number) <= 0) redrawn++;
    expect(redrawn).toBeGreaterThan(0.1 * N);
  });
});

describe('snr', () => {
  it('divides the value by the larger error, and is infinite for an exact value', () => {
    expect(snr({ value: 10, errLo: 2, errHi: 5 })).toBe(2);
    expect(snr({ value: 10, errLo: 5, errHi: 2 })).toBe(2);
    expect(snr({ value: 10, errHi: 4 })).toBe(2.5);
    expect(snr({ value: 10, errLo: 4 })).toBe(2.5);
    expect(snr({ value: 10 })).toBe(Infinity);
  });
});
