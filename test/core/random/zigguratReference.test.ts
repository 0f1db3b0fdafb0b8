import { describe, expect, it } from 'vitest';
import { fillStandardNormals, standardNormal } from '../../../src/core/random/standardNormal.ts';
import type { Rng } from '../../../src/core/random/rng.ts';
import reference from './zigguratReference.json' with { type: 'json' };

// Computed with scripts/reference/zigguratNormals.py (/usr/bin/python3 3.11, its math module): an
// independent transcription of the 128-layer ziggurat of Marsaglia & Tsang 2000 (J. Stat. Softw. 5(8)),
// with the wedge test and tail of Doornik 2005 (ZIGNOR) and Marsaglia 1964. Its word stream is built so
// that two first words in three fall in a wedge or the base strip's edge: of the 3000 deviates, 391 are
// wedge points accepted, 312 points are rejected in a wedge, 435 deviates come from the tail, 28 of them
// after a rejected pair (in a random stream ~1 % of draws take these paths, too few for a density test
// to resolve a change in them).
const { words, wordsUsed, normals, paths } = reference as { words: number[]; wordsUsed: number; normals: number[]; paths: string };

/** A generator that serves the reference's words in order (next() = word / 2^32, as Rng says). */
function wordSource(): Rng & { used: () => number } {
  let pos = 0;
  const take = (): number => {
    if (pos >= words.length) throw new Error('the reference stream ran out of words');
    return words[pos++] as number;
  };
  return { nextUint32: take, next: () => take() / 4294967296, used: () => pos };
}

/** Relative tolerance: libm's exp and log against the project's fdlibm ports differ by an ulp or so in the layer edges. */
const RTOL = 1e-12;

function expectSameDeviates(got: ArrayLike<number>): void {
  let worst = 0;
  let first = -1;
  for (let k = 0; k < normals.length; k++) {
    const want = normals[k] as number;
    const d = Math.abs((got[k] as number) - want) / Math.max(1e-300, Math.abs(want));
    // Written so that a NaN deviate counts as a mismatch (every comparison with NaN is false).
    if (!(d <= worst)) worst = d;
    if (!(d <= RTOL) && first < 0) first = k;
  }
  expect(first, `first deviate off the reference: #${first} (path ${paths[first]})`).toBe(-1);
  expect(worst <= RTOL, `largest relative difference ${worst}`).toBe(true);
}

describe('the ziggurat against an independent transcription of Marsaglia & Tsang 2000', () => {
  it('exercises the wedges, rejections and the tail (the reference stream is what it says)', () => {
    const count = (c: string) => [...paths].filter((p) => p === c).length;
    expect(count('w')).toBeGreaterThan(300);
    expect(count('r')).toBeGreaterThan(300);
    expect(count('t')).toBeGreaterThan(300);
    expect(count('T')).toBeGreaterThan(20);
  });

  it('gives the reference deviates, wedge and tail draws included, one call at a time, taking the same words', () => {
    const src = wordSource();
    const got = Array.from({ length: normals.length }, () => standardNormal(src));
    expectSameDeviates(got);
    expect(src.used()).toBe(wordsUsed);
  });

  it('gives the same reference deviates through the bulk fill', () => {
    const got = new Float64Array(normals.length);
    fillStandardNormals(wordSource(), got);
    expectSameDeviates(got);
  });
});
