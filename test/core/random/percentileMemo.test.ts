import { describe, expect, it } from 'vitest';
import { PercentileMemo } from '../../../src/core/random/percentileMemo.ts';
import { percentiles16_50_84 } from '../../../src/core/random/percentiles.ts';
import { createRng, standardNormal } from '../../../src/core/random/index.ts';

const rng = createRng(404);
const sample = (n = 1000, mean = 8) => Float64Array.from({ length: n }, () => mean + 0.4 * standardNormal(rng));
/** What the memo must reproduce exactly: the plain percentiles of a copy. */
const plain = (v: Float64Array) => percentiles16_50_84(Float64Array.from(v));

describe('PercentileMemo', () => {
  it('gives exactly the plain percentiles of each new sample', () => {
    const memo = new PercentileMemo();
    for (let t = 0; t < 6; t++) {
      const v = sample();
      expect(memo.percentiles(v)).toEqual(plain(v));
    }
  });

  it('gives a sample equal to one seen before the same percentiles', () => {
    const memo = new PercentileMemo();
    const a = sample();
    const want = plain(a);
    memo.percentiles(a);
    memo.percentiles(sample());
    expect(memo.percentiles(Float64Array.from(a))).toEqual(want);
  });

  it('tells apart samples that differ only in their last value', () => {
    const memo = new PercentileMemo();
    const a = Float64Array.from({ length: 101 }, (_, i) => i);
    memo.percentiles(a);
    // Moving the top value to the bottom moves every order statistic down by one.
    const b = Float64Array.from(a);
    b[100] = -1;
    expect(memo.percentiles(b)).toEqual(plain(b));
    expect(memo.percentiles(b).p50).toBe(49);
  });

  it('tells apart samples that differ in one value at any place of its steps of four, or among those left over', () => {
    // The comparison goes four values at a time; a difference in any one of the four, or after them, must count.
    for (const n of [1000, 1001, 1003]) {
      const a = Float64Array.from({ length: n }, (_, i) => i + 1); // no zero: the four-at-a-time comparison runs
      // 0 to 3: the first step of four (a step that misses a difference goes on to the next); 4 to 7: a later one.
      for (const at of [0, 1, 2, 3, 4, 5, 6, 7, n - 1]) {
        const memo = new PercentileMemo();
        memo.percentiles(a);
        const b = Float64Array.from(a);
        // One value moved past all others, so every order statistic moves: the first (the smallest)
        // to the top, any other below the bottom.
        b[at] = at === 0 ? 2 * n : -1;
        expect(memo.percentiles(b), `n = ${n}, value ${at}`).toEqual(plain(b));
        // NaN and a zero's sign there too.
        const c = Float64Array.from(a);
        c[at] = NaN;
        const d = Float64Array.from(a);
        d[at] = 0;
        const e = Float64Array.from(d);
        e[at] = -0;
        expect(memo.percentiles(c), `NaN, n = ${n}, value ${at}`).toEqual(plain(c));
        expect(memo.percentiles(Float64Array.from(c)), `NaN again, n = ${n}, value ${at}`).toEqual(plain(c));
        expect(memo.percentiles(d)).toEqual(plain(d));
        expect(memo.percentiles(e)).toEqual(plain(e));
      }
    }
    // A zero's sign decides the median itself, in the last place of a length leaving three over.
    const memo = new PercentileMemo();
    const plus = Float64Array.from([...Array(51).fill(-1), ...Array(51).fill(1), 0]);
    const minus = Float64Array.from(plus);
    minus[102] = -0;
    expect(Object.is(memo.percentiles(plus).p50, 0)).toBe(true);
    expect(Object.is(memo.percentiles(minus).p50, -0)).toBe(true);
  });

  it('tells apart samples whose zeros differ in sign at any place of a step of four, where the zero decides the median', () => {
    // Source of truth: the median of 50 × −1, one zero and 50 × +1 is that zero, with its sign
    // (numpy's linear rule, (n − 1)/2 = 50 exactly: no interpolation), and so are the plain percentiles.
    // The zero goes to places 0 to 7, inside the four-at-a-time comparison (101 values: the first 100).
    for (let at = 0; at < 8; at++) {
      const plus = Float64Array.from({ length: 101 }, (_, i) => (i === at ? 0 : i < 51 ? -1 : 1));
      const minus = Float64Array.from(plus);
      minus[at] = -0;
      const memo = new PercentileMemo();
      expect(Object.is(memo.percentiles(plus).p50, 0), `+0 at ${at}`).toBe(true);
      expect(Object.is(memo.percentiles(minus).p50, -0), `−0 at ${at} after +0`).toBe(true);
      expect(Object.is(memo.percentiles(plus).p50, 0), `+0 at ${at} after −0`).toBe(true);
      expect(Object.is(plain(minus).p50, -0)).toBe(true);
    }
  });

  it('tells apart a sample from a longer one that begins with it, both ways', () => {
    // Source of truth: the plain percentiles of each sample (numpy's linear rule, percentiles16_50_84).
    const short = Float64Array.from({ length: 100 }, (_, i) => i + 1);
    const long = Float64Array.from({ length: 200 }, (_, i) => i + 1); // its first 100 values are `short`
    const memo = new PercentileMemo();
    memo.percentiles(short);
    expect(memo.percentiles(long)).toEqual(plain(long));
    expect(memo.percentiles(long).p50).toBe(100.5); // (1 + 200) / 2, the median of 1..200
    const memo2 = new PercentileMemo();
    memo2.percentiles(long);
    expect(memo2.percentiles(short)).toEqual(plain(short));
    expect(memo2.percentiles(short).p50).toBe(50.5); // (1 + 100) / 2, the median of 1..100
  });

  it('stays exact when a kept place is reused by a sample of another length', () => {
    // Four samples of 300 fill the memo; the fifth (shorter, and below binnedPercentiles' 64 values,
    // so computed by selection on the kept copy) and sixth (longer) take the oldest places.
    // Source of truth: the plain percentiles of each sample.
    const own = createRng(405); // its own stream (see DEVELOPERS.md, Mutation testing)
    const draw = (n: number, mean: number) => Float64Array.from({ length: n }, () => mean + 0.4 * standardNormal(own));
    const memo = new PercentileMemo();
    for (let t = 0; t < 4; t++) memo.percentiles(draw(300, 8 + t));
    const short = draw(50, 20);
    const long = draw(500, -5);
    expect(memo.percentiles(short)).toEqual(plain(short));
    expect(memo.percentiles(long)).toEqual(plain(long));
    expect(memo.percentiles(Float64Array.from(short))).toEqual(plain(short));
  });

  it('tells apart samples that differ only in the sign of a zero', () => {
    const memo = new PercentileMemo();
    // 50 × −1, a zero, 50 × +1: the median is the zero itself, with its sign.
    const plus = Float64Array.from([...Array(50).fill(-1), 0, ...Array(50).fill(1)]);
    const minus = Float64Array.from(plus);
    minus[50] = -0;
    expect(Object.is(memo.percentiles(plus).p50, 0)).toBe(true);
    expect(Object.is(memo.percentiles(minus).p50, -0)).toBe(true);
  });

  it('treats NaN as equal to NaN, and leaves the caller\'s sample in its order', () => {
    const memo = new PercentileMemo();
    const a = sample(200);
    a[7] = NaN;
    const before = Float64Array.from(a);
    const first = memo.percentiles(a);
    expect(first).toEqual(plain(before));
    expect(Array.from(a)).toEqual(Array.from(before));
    expect(memo.percentiles(Float64Array.from(before))).toEqual(first);
  });

  it('stays exact when more samples come than it keeps, and after clear', () => {
    const memo = new PercentileMemo();
    const samples = Array.from({ length: 7 }, () => sample(300));
    for (let round = 0; round < 2; round++) for (const v of samples) expect(memo.percentiles(v)).toEqual(plain(v));
    memo.clear();
    expect(memo.percentiles(samples[0]!)).toEqual(plain(samples[0]!));
  });

  it('hands out copies: changing a result does not change what it gives next', () => {
    const memo = new PercentileMemo();
    const a = sample();
    const r = memo.percentiles(a);
    const p50 = r.p50;
    r.p50 = 0;
    expect(memo.percentiles(a).p50).toBe(p50);
  });
});
