// xoshiro128** 1.1 (Blackman & Vigna 2018, "Scrambled linear pseudorandom number generators",
// ACM TOMS 47, 36, 2021; reference C code public domain, CC0).
import type { Rng } from './rng.ts';
import { mix32, seedWords, splitmix32 } from './splitmix32.ts';

const INV_2_32 = 1 / 4294967296;

/** xoshiro128** state: four 32-bit words; 2^128 − 1 period; passes BigCrush. */
class Xoshiro128ss implements Rng {
  private s0: number;
  private s1: number;
  private s2: number;
  private s3: number;
  constructor(s0: number, s1: number, s2: number, s3: number) {
    this.s0 = s0;
    this.s1 = s1;
    this.s2 = s2;
    this.s3 = s3;
  }

  next(): number {
    return this.nextUint32() * INV_2_32;
  }

  fillUint32(out: Uint32Array, count: number = out.length): void {
    // The same steps as nextUint32, with the state in locals for the whole run.
    let s0 = this.s0;
    let s1 = this.s1;
    let s2 = this.s2;
    let s3 = this.s3;
    const n = Math.min(count, out.length);
    for (let k = 0; k < n; k++) {
      const m = Math.imul(s1, 5);
      out[k] = Math.imul((m << 7) | (m >>> 25), 9);
      const t = s1 << 9;
      s2 ^= s0;
      s3 ^= s1;
      s1 ^= s2;
      s0 ^= s3;
      s2 ^= t;
      s3 = (s3 << 11) | (s3 >>> 21);
    }
    this.s0 = s0;
    this.s1 = s1;
    this.s2 = s2;
    this.s3 = s3;
  }

  nextUint32(): number {
    const s1 = this.s1;
    const m = Math.imul(s1, 5);
    const result = Math.imul((m << 7) | (m >>> 25), 9);
    const t = s1 << 9;
    this.s2 ^= this.s0;
    this.s3 ^= s1;
    this.s1 = s1 ^ this.s2;
    this.s0 ^= this.s3;
    this.s2 ^= t;
    this.s3 = (this.s3 << 11) | (this.s3 >>> 21);
    return result >>> 0;
  }
}

/**
 * A seeded xoshiro128** generator: uniform deviates k/2^32 in [0, 1) (32-bit resolution).
 * The state is filled by splitmix32 from the seed (both 32-bit words of integers up to 2^53),
 * so nearby seeds give unrelated streams. Same seed, same stream, on every platform.
 */
export function createRng(seed: number): Rng {
  const [lo, hi] = seedWords(seed);
  const next = splitmix32(lo ^ mix32(hi ^ 0x6a09e667));
  let s0 = next() | 0;
  const s1 = next() | 0;
  const s2 = next() | 0;
  const s3 = next() | 0;
  // The all-zero state is the one fixed point of xoshiro; splitmix32 cannot give four zeros in a row, but be explicit.
  if ((s0 | s1 | s2 | s3) === 0) s0 = 1;
  return xoshiro128ss(s0, s1, s2, s3);
}

/**
 * xoshiro128** from a given state (four 32-bit words, not all zero), without seeding: for checking
 * the generator against the reference code's published outputs.
 */
export function xoshiro128ss(s0: number, s1: number, s2: number, s3: number): Rng {
  return new Xoshiro128ss(s0 | 0, s1 | 0, s2 | 0, s3 | 0);
}
