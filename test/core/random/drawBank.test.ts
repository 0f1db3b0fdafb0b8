import { describe, expect, it } from 'vitest';
import { createDrawBank, isDrawBank, ReusableDrawBank } from '../../../src/core/random/drawBank.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const N = 20000;
const bank = (seed: number, n = N) => createDrawBank(createRng(seed), n);
const mean = (a: Float64Array) => a.reduce((s, x) => s + x, 0) / a.length;
const sd = (a: Float64Array) => {
  const m = mean(a);
  return Math.sqrt(a.reduce((s, x) => s + (x - m) ** 2, 0) / (a.length - 1));
};
const correlation = (a: Float64Array, b: Float64Array) => {
  const ma = mean(a);
  const mb = mean(b);
  let s = 0;
  for (let k = 0; k < a.length; k++) s += ((a[k] as number) - ma) * ((b[k] as number) - mb);
  return s / (a.length - 1) / (sd(a) * sd(b));
};
const same = (a: Float64Array, b: Float64Array) => a.length === b.length && a.every((x, k) => x === b[k]);

describe('the draw bank', () => {
  it('gives a role the same deviates whatever other roles were drawn, and in whatever order', () => {
    const first = bank(11);
    const width = Float64Array.from(first.normals('width_halpha'));
    const second = bank(11);
    second.normals('dust_av');
    second.uniforms('lum_halpha');
    second.normals('lum_halpha');
    expect(same(second.normals('width_halpha'), width)).toBe(true);
  });

  it('draws standard normal deviates: mean 0 and standard deviation 1 within 4 standard errors', () => {
    const z = bank(12).normals('lum_halpha');
    expectClose(mean(z), 0, { atol: 4 / Math.sqrt(N), source: 'standard normal, closed form' });
    // standard error of a normal sample's SD ≈ 1/√(2N)
    expectClose(sd(z), 1, { atol: 4 / Math.sqrt(2 * N), source: 'standard normal, closed form' });
  });

  it('draws uniforms in [0, 1) with mean 1/2, independent of the role\'s normals', () => {
    const b = bank(13);
    const u = b.uniforms('width_hbeta');
    expect(Math.min(...u)).toBeGreaterThanOrEqual(0);
    expect(Math.max(...u)).toBeLessThan(1);
    // uniform: SD 1/√12
    expectClose(mean(u), 0.5, { atol: 4 / Math.sqrt(12 * N), source: 'uniform, closed form' });
    expectClose(correlation(u, b.normals('width_hbeta')), 0, { atol: 4 / Math.sqrt(N), source: 'independent samples: r has SE 1/√N' });
  });

  it('gives different roles independent deviates', () => {
    const b = bank(14);
    expectClose(correlation(b.normals('lum_halpha'), b.normals('width_halpha')), 0, { atol: 4 / Math.sqrt(N), source: 'independent samples: r has SE 1/√N' });
    expect(same(b.normals('lum_halpha'), b.normals('lum_hbeta'))).toBe(false);
    // … and independent sides for their split normals.
    expectClose(correlation(b.uniforms('lum_halpha'), b.uniforms('width_halpha')), 0, { atol: 4 / Math.sqrt(N), source: 'independent samples: r has SE 1/√N' });
  });

  it('follows the object\'s stream: the same stream gives the same deviates, another stream others', () => {
    expect(same(bank(15, 100).normals('mu'), bank(15, 100).normals('mu'))).toBe(true);
    expect(same(bank(15, 100).normals('mu'), bank(16, 100).normals('mu'))).toBe(false);
  });

  it('gives fresh deviates for the next object after a reset, and a redraw stream that restarts on every call', () => {
    const b = new ReusableDrawBank();
    const rng = createRng(17);
    b.reset(rng, 100);
    const a = Float64Array.from(b.normals('mu'));
    const r1 = b.redraws('mu').next();
    expect(b.redraws('mu').next()).toBe(r1);
    b.reset(rng, 100);
    expect(same(b.normals('mu'), a)).toBe(false);
    expect(b.redraws('mu').next()).not.toBe(r1);
  });

  it('tells a bank from a random stream', () => {
    expect(isDrawBank(bank(18, 10))).toBe(true);
    expect(isDrawBank(createRng(18))).toBe(false);
  });
});
