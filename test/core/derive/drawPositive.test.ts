import { describe, expect, it } from 'vitest';
import { drawMeasured, drawMeasuredInto, drawPositive, drawPositiveInto, snr } from '../../../src/core/derive/drawPositive.ts';
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

describe('drawPositive and drawPositiveInto', () => {
  it('return the value itself for an exact measurement', () => {
    const rng = createRng(1);
    expect(drawPositive(rng, { value: 3 })).toBe(3);
    const out = new Float64Array(4);
    drawPositiveInto(rng, { value: 3, errLo: 0, errHi: 0 }, out);
    expect([...out]).toEqual([3, 3, 3, 3]);
  });

  it('draw N(1, 1) truncated at zero: every draw positive, mean 1.2876', () => {
    const rng = createRng(2);
    const one = Array.from({ length: N }, () => drawPositive(rng, { value: 1, errLo: 1, errHi: 1 }));
    expect(Math.min(...one)).toBeGreaterThan(0);
    expectClose(mean(one), TRUNC_MEAN, { atol: meanTol(TRUNC_SD), source: 'truncated normal mean, closed form, 4 standard errors' });
    const many = new Float64Array(N);
    drawPositiveInto(rng, { value: 1, errLo: 1, errHi: 1 }, many);
    expect(Math.min(...many)).toBeGreaterThan(0);
    expectClose(mean(many), TRUNC_MEAN, { atol: meanTol(TRUNC_SD), source: 'truncated normal mean, closed form, 4 standard errors' });
  });

  it('take an error given on one side only as symmetric', () => {
    const a = new Float64Array(N);
    const b = new Float64Array(N);
    drawPositiveInto(createRng(3), { value: 1, errHi: 1 }, a);
    drawPositiveInto(createRng(3), { value: 1, errLo: 1, errHi: 1 }, b);
    expect(a).toEqual(b);
    expectClose(mean(a), TRUNC_MEAN, { atol: meanTol(TRUNC_SD), source: 'truncated normal mean, closed form, 4 standard errors' });
  });

  it('draw asymmetric errors as a split normal, a fraction σlo/(σlo+σhi) below the value', () => {
    const out = new Float64Array(N);
    drawPositiveInto(createRng(4), { value: 10, errLo: 1, errHi: 3 }, out);
    let below = 0;
    for (const x of out) if (x < 10) below++;
    // split normal (John 1982): P(x < mode) = 1/4; binomial standard error sqrt(p(1−p)/N), 4 of them
    expectClose(below / N, 0.25, { atol: 4 * Math.sqrt((0.25 * 0.75) / N), source: 'split normal, closed form' });
    // mean = mode + √(2/π)(σhi − σlo) = 10 + 1.595769 (closed form); sd² = (1 − 2/π)(σhi − σlo)² + σlo σhi = 4.4535
    expectClose(mean(out), 10 + Math.sqrt(2 / Math.PI) * 2, { atol: meanTol(Math.sqrt(4.4535)), source: 'split normal mean, closed form' });
  });
});

describe('drawMeasured and drawMeasuredInto', () => {
  it('return the value for an exact measurement and keep negative draws', () => {
    const rng = createRng(5);
    expect(drawMeasured(rng, { value: -2 })).toBe(-2);
    const out = new Float64Array(N);
    drawMeasuredInto(rng, { value: 0, errLo: 1, errHi: 1 }, out);
    let below = 0;
    for (const x of out) if (x < 0) below++;
    // N(0, 1): half below zero, none clipped; binomial, 4 standard errors
    expectClose(below / N, 0.5, { atol: 4 * Math.sqrt(0.25 / N), source: 'normal, closed form' });
    expectClose(mean(out), 0, { atol: meanTol(1), source: 'normal mean, closed form' });
  });

  it('draw a split normal for asymmetric errors, one by one and into an array alike', () => {
    const rng = createRng(6);
    const one = Array.from({ length: N }, () => drawMeasured(rng, { value: 0, errLo: 3, errHi: 1 }));
    const many = new Float64Array(N);
    drawMeasuredInto(rng, { value: 0, errLo: 3, errHi: 1 }, many);
    for (const draws of [one, many]) {
      let below = 0;
      for (const x of draws) if (x < 0) below++;
      expectClose(below / N, 0.75, { atol: 4 * Math.sqrt((0.25 * 0.75) / N), source: 'split normal, closed form' });
      expectClose(mean(draws), -Math.sqrt(2 / Math.PI) * 2, { atol: meanTol(Math.sqrt(4.4535)), source: 'split normal mean, closed form' });
    }
    const exact = new Float64Array(3);
    drawMeasuredInto(rng, { value: 7 }, exact);
    expect([...exact]).toEqual([7, 7, 7]);
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
