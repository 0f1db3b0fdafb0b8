import { describe, expect, it } from 'vitest';
import { createRng, fillNormal, standardNormal } from '../../../src/core/random/index.ts';
import { fillStandardNormals } from '../../../src/core/random/standardNormal.ts';
import type { Rng } from '../../../src/core/random/rng.ts';
import { normalCdf } from './normalCdf.ts';

describe('standardNormal', () => {
  const n = 1_000_000;
  const rng = createRng(31415);
  const x = new Float64Array(n);
  for (let i = 0; i < n; i++) x[i] = standardNormal(rng);

  it('has mean 0 and variance 1 within 5σ for N = 1e6', () => {
    let s = 0;
    let s2 = 0;
    for (const v of x) {
      s += v;
      s2 += v * v;
    }
    const mean = s / n;
    const variance = s2 / n - mean * mean;
    expect(Math.abs(mean)).toBeLessThan(5 / Math.sqrt(n)); // σ(mean) = 1/√N
    expect(Math.abs(variance - 1)).toBeLessThan(5 * Math.sqrt(2 / n)); // σ(var) = √(2/N)
  });

  it('follows the normal CDF (Kolmogorov–Smirnov, N = 1e6, critical distance at α = 0.001)', () => {
    const sorted = Float64Array.from(x).sort();
    let d = 0;
    for (let i = 0; i < n; i += 1) {
      const f = normalCdf(sorted[i] as number);
      d = Math.max(d, Math.abs(f - i / n), Math.abs(f - (i + 1) / n));
    }
    expect(d).toBeLessThan(1.95 / Math.sqrt(n)); // KS α = 0.001 critical value 1.95/√N
  });

  it('matches the normal density in 200 narrow bins over [−4, 4] (χ², N = 1e6)', () => {
    // Narrow bins see the ziggurat's wedge and layer edges, which the KS distance averages out.
    const nb = 200;
    const w = 8 / nb;
    const counts = new Array<number>(nb + 2).fill(0);
    for (const v of x) {
      const b = v < -4 ? 0 : v >= 4 ? nb + 1 : 1 + Math.floor((v + 4) / w);
      counts[b] = (counts[b] as number) + 1;
    }
    let chi2 = 0;
    for (let b = 0; b < nb + 2; b++) {
      const lo = b === 0 ? -Infinity : -4 + (b - 1) * w;
      const hi = b === nb + 1 ? Infinity : -4 + b * w;
      const e = n * ((hi === Infinity ? 1 : normalCdf(hi)) - (lo === -Infinity ? 0 : normalCdf(lo)));
      chi2 += ((counts[b] as number) - e) ** 2 / e;
    }
    // 201 degrees of freedom: mean 201, σ √402 ≈ 20; 5σ above the mean ≈ 301.
    expect(chi2).toBeLessThan(301);
  });

  it('puts the right fraction in the tails beyond 1σ and beyond the ziggurat base (3.44σ)', () => {
    let beyond1 = 0;
    let beyond35 = 0;
    for (const v of x) {
      if (Math.abs(v) > 1) beyond1++;
      if (Math.abs(v) > 3.5) beyond35++;
    }
    // 2(1 − Φ(1)) = 0.31731 and 2(1 − Φ(3.5)) = 4.6526e-4 (computed with scipy 1.10 norm.sf); binomial 5σ.
    const p1 = 2 * 0.15865525393145707;
    const p35 = 0.00046525815807105003;
    expect(Math.abs(beyond1 - n * p1)).toBeLessThan(5 * Math.sqrt(n * p1 * (1 - p1)));
    expect(Math.abs(beyond35 - n * p35)).toBeLessThan(5 * Math.sqrt(n * p35 * (1 - p35)));
  });

  it('is symmetric: as many negative as positive deviates within 5σ', () => {
    let neg = 0;
    for (const v of x) if (v < 0) neg++;
    expect(Math.abs(neg - n / 2)).toBeLessThan(5 * Math.sqrt(n / 4));
  });
});

describe('fillNormal', () => {
  it('fills with the given mean and sigma (N = 2e5, 5σ)', () => {
    const n = 200_000;
    const out = fillNormal(createRng(3), new Float64Array(n), 10, 2.5);
    let s = 0;
    let s2 = 0;
    for (const v of out) {
      s += v;
      s2 += v * v;
    }
    const mean = s / n;
    const sd = Math.sqrt(s2 / n - mean * mean);
    expect(Math.abs(mean - 10)).toBeLessThan((5 * 2.5) / Math.sqrt(n));
    expect(Math.abs(sd - 2.5)).toBeLessThan((5 * 2.5) / Math.sqrt(2 * n)); // σ(s) ≈ σ/√(2N)
  });
});

describe('fillStandardNormals', () => {
  it('fills exactly what standardNormal gives call by call, across many bulk refills and through the wedge and tail', () => {
    for (const seed of [1, 2, 99]) {
      const n = 100_000; // ~1 % of draws take the wedge or tail path, and 512-word refills happen ~200 times
      const bulk = new Float64Array(n);
      fillStandardNormals(createRng(seed), bulk);
      const one = createRng(seed);
      for (let k = 0; k < n; k++) expect(bulk[k]).toBe(standardNormal(one));
    }
  });

  it('gives the same sequence from a generator without a bulk path', () => {
    const inner = createRng(5);
    const plain = { next: () => inner.next(), nextUint32: () => inner.nextUint32() };
    const got = new Float64Array(3000);
    fillStandardNormals(plain, got);
    const ref = createRng(5);
    expect(Array.from(got)).toEqual(Array.from({ length: 3000 }, () => standardNormal(ref)));
  });
});

describe('the generator\'s bulk words', () => {
  it('are the words nextUint32 gives one by one, and leave the stream where those calls would', () => {
    const a = createRng(8);
    const b = createRng(8);
    const bulk = new Uint32Array(1000);
    a.fillUint32!(bulk);
    for (let k = 0; k < 1000; k++) expect(bulk[k]).toBe(b.nextUint32());
    expect(a.nextUint32()).toBe(b.nextUint32());
  });
});

describe('the generator\'s bulk words, counted', () => {
  it('fill only the first `count` words and leave the stream right after them', () => {
    const a = createRng(9);
    const b = createRng(9);
    const bulk = new Uint32Array(8).fill(7);
    a.fillUint32!(bulk, 5);
    for (let k = 0; k < 5; k++) expect(bulk[k]).toBe(b.nextUint32());
    expect(Array.from(bulk.subarray(5))).toEqual([7, 7, 7]);
    expect(a.nextUint32()).toBe(b.nextUint32());
    // A count beyond the array fills the array, no more.
    const c = createRng(10);
    const d = createRng(10);
    const two = new Uint32Array(2);
    c.fillUint32!(two, 50);
    expect(Array.from(two)).toEqual([d.nextUint32(), d.nextUint32()]);
    expect(c.nextUint32()).toBe(d.nextUint32());
  });
});

/** A generator that counts the words taken from it, and records the size of each bulk request. */
function counted(seed: number): { rng: Required<Rng>; taken: () => number; requests: number[] } {
  const inner = createRng(seed);
  let taken = 0;
  const requests: number[] = [];
  const rng: Required<Rng> = {
    next: () => {
      taken++;
      return inner.next();
    },
    nextUint32: () => {
      taken++;
      return inner.nextUint32();
    },
    fillUint32: (out: Uint32Array, count: number = out.length) => {
      const m = Math.min(count, out.length);
      requests.push(m);
      taken += m;
      inner.fillUint32!(out, m);
    },
  };
  return { rng, taken: () => taken, requests };
}

describe('fillStandardNormals, words taken', () => {
  it('takes hardly more words than the deviates use, for short and long fills', () => {
    for (const n of [1, 2, 7, 31, 32, 33, 100, 200, 511, 512, 513, 1000, 1025, 5000]) {
      for (const seed of [1, 2, 3]) {
        // Words the deviates use: standardNormal call by call on a counting generator.
        const ref = counted(seed);
        const want = Array.from({ length: n }, () => standardNormal(ref.rng));
        const used = ref.taken();
        const bulk = counted(seed);
        const got = new Float64Array(n);
        fillStandardNormals(bulk.rng, got);
        expect(Array.from(got)).toEqual(want);
        expect(bulk.taken()).toBeGreaterThanOrEqual(used);
        // One in 32 over plus two, and one short refill of 16 for an edge path at a buffer's end:
        // a fill of one deviate took 512 words before refills were sized.
        expect(bulk.taken() - used).toBeLessThanOrEqual((n >>> 5) + 2 + 16);
      }
    }
  });

  it('reads on through a refill in the middle of the edge path, with the same deviates', () => {
    // Short fills over many seeds: the edge path (about one deviate in eighty) sometimes starts on
    // the last word of a refill and must take its next words from a refill of its own (16 words).
    let edgeRefills = 0;
    for (let seed = 0; seed < 400; seed++) {
      const ref = createRng(seed);
      const want = Array.from({ length: 40 }, () => standardNormal(ref));
      const bulk = counted(seed);
      const got = new Float64Array(40);
      fillStandardNormals(bulk.rng, got);
      expect(Array.from(got)).toEqual(want);
      edgeRefills += bulk.requests.filter((r, i) => i > 0 && r === 16).length;
    }
    expect(edgeRefills).toBeGreaterThan(0);
  });
});
