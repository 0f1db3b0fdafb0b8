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

  describe('derived arrays (a transform of a measurement\'s draws, shared by the readings of one object)', () => {
    const key = (value: number, kind = 1) => ({ value, errLo: 0.1, errHi: 0.1, kind });
    const fillFrom = (b: ReusableDrawBank, calls: number[], tag: number) => (out: Float64Array) => {
      calls.push(tag);
      const z = b.normals('width_halpha');
      for (let k = 0; k < out.length; k++) out[k] = tag + (z[k] as number);
    };

    it('fills once per object and key, and gives the same array to every later request with an equal key', () => {
      const b = new ReusableDrawBank().reset(createRng(31), 8);
      const calls: number[] = [];
      const first = b.derived('width_halpha', key(2000), fillFrom(b, calls, 1));
      const again = b.derived('width_halpha', key(2000), fillFrom(b, calls, 2));
      expect(again).toBe(first);
      expect(calls).toEqual([1]);
      expect(first[0]).toBe(1 + (b.normals('width_halpha')[0] as number));
    });

    it('makes a separate array for another value, error or kind, and for another role', () => {
      const b = new ReusableDrawBank().reset(createRng(32), 8);
      const calls: number[] = [];
      b.derived('width_halpha', key(2000), fillFrom(b, calls, 1));
      b.derived('width_halpha', key(1500), fillFrom(b, calls, 2));
      b.derived('width_halpha', { value: 2000, errLo: 0.2, errHi: 0.1, kind: 1 }, fillFrom(b, calls, 3));
      b.derived('width_halpha', { value: 2000, errLo: 0.1, errHi: 0.2, kind: 1 }, fillFrom(b, calls, 4));
      b.derived('width_halpha', key(2000, 2), fillFrom(b, calls, 5));
      b.derived('lum_halpha', key(2000), fillFrom(b, calls, 6));
      expect(calls).toEqual([1, 2, 3, 4, 5, 6]);
    });

    it('fills again for the next object, with that object\'s deviates', () => {
      const b = new ReusableDrawBank().reset(createRng(33), 8);
      const calls: number[] = [];
      const first = Float64Array.from(b.derived('width_halpha', key(2000), fillFrom(b, calls, 1)));
      b.reset(createRng(34), 8);
      const next = b.derived('width_halpha', key(2000), fillFrom(b, calls, 1));
      expect(calls).toEqual([1, 1]);
      expect(same(next, first)).toBe(false);
      expect(next[3]).toBe(1 + (b.normals('width_halpha')[3] as number));
    });

    it('keeps the four latest keys of a role when more are asked for, and stays exact', () => {
      const b = new ReusableDrawBank().reset(createRng(35), 8);
      const calls: number[] = [];
      for (const v of [1, 2, 3, 4, 5]) b.derived('width_halpha', key(v), fillFrom(b, calls, v));
      // 1 was replaced by 5; 2–5 are kept.
      for (const v of [2, 3, 4, 5]) b.derived('width_halpha', key(v), fillFrom(b, calls, v));
      expect(calls).toEqual([1, 2, 3, 4, 5]);
      const one = b.derived('width_halpha', key(1), fillFrom(b, calls, 1));
      expect(calls).toEqual([1, 2, 3, 4, 5, 1]);
      expect(one[0]).toBe(1 + (b.normals('width_halpha')[0] as number));
    });

    it('keeps nothing from a fill that throws: the next request fills again', () => {
      const b = new ReusableDrawBank().reset(createRng(36), 8);
      const calls: number[] = [];
      expect(() => b.derived('width_halpha', key(2000), () => { throw new Error('bad'); })).toThrow('bad');
      b.derived('width_halpha', key(2000), fillFrom(b, calls, 1));
      expect(calls).toEqual([1]);
    });

    it('keeps nothing from a fill that throws part-way over a kept key\'s array, on the first object too', () => {
      // The first object of a new bank is generation 1: a half-made entry must not pass for current there.
      // Source of truth: the fill's own definition, key v gives v + z[k] (z the role's deviates).
      const b = new ReusableDrawBank().reset(createRng(38), 8);
      const calls: number[] = [];
      for (const v of [1, 2, 3, 4]) b.derived('width_halpha', key(v), fillFrom(b, calls, v));
      // A fifth key takes the place of key 1 (the memory holds four), writes over its array and throws.
      const broken = (out: Float64Array) => {
        out.fill(NaN);
        throw new Error('bad');
      };
      expect(() => b.derived('width_halpha', key(5), broken)).toThrow('bad');
      const one = b.derived('width_halpha', key(1), fillFrom(b, calls, 1));
      expect(calls).toEqual([1, 2, 3, 4, 1]);
      const z = b.normals('width_halpha');
      for (let k = 0; k < one.length; k++) expect(one[k]).toBe(1 + (z[k] as number));
    });

    it('moves to a new generation with every object', () => {
      const b = new ReusableDrawBank().reset(createRng(37), 8);
      const g = b.generation;
      b.reset(createRng(37), 8);
      expect(b.generation).not.toBe(g);
    });
  });
});

describe('DrawBank.derived after a reset', () => {
  it('lets the oldest of this object\'s arrays go first, as the contract says ("valid until four other keys")', () => {
    const bank = new ReusableDrawBank();
    const key = (value: number) => ({ value, errLo: 0.1, errHi: 0.1, kind: 1 });
    let fills = 0;
    const fill = (out: Float64Array): void => {
      fills++;
      out.fill(fills);
    };
    // The first object asks for five keys: the fifth takes the first one's place.
    bank.reset(createRng(1), 8);
    for (const v of [1, 2, 3, 4, 5]) bank.derived('width_halpha', key(v), fill);
    // The second object refills the earlier object's entries with k1…k4, then asks for k5.
    bank.reset(createRng(2), 8);
    for (const v of [1, 2, 3, 4]) bank.derived('width_halpha', key(v), fill);
    bank.derived('width_halpha', key(5), fill);
    const before = fills;
    // k2…k5 are still kept: asking again fills nothing.
    for (const v of [2, 3, 4, 5]) bank.derived('width_halpha', key(v), fill);
    expect(fills).toBe(before);
    // k1, the oldest of this object's, gave way to k5.
    bank.derived('width_halpha', key(1), fill);
    expect(fills).toBe(before + 1);
  });
});
