// Ziggurat method (Marsaglia & Tsang 2000, J. Stat. Softw. 5(8)) with 128 layers, in the
// "ZIGNOR" arrangement of Doornik 2005 (layer index and abscissa from disjoint random bits),
// written from the published descriptions.
import type { Rng } from './rng.ts';
import { exp, expInPlace, log } from '../math/index.ts';

/** Layers, right edge of the base layer's curve part, and the common area of every layer (Marsaglia & Tsang 2000). */
export const ZIGGURAT_128 = { layers: 128, r: 3.442619855899, v: 9.91256303526217e-3 } as const;

const N = ZIGGURAT_128.layers;
const R = ZIGGURAT_128.r;
/** X[i]: right edge of layer i (X[0] is the base strip's equivalent width V/f(R)); X[N] = 0. */
const X = new Float64Array(N + 1);
/** RATIO[i] = X[i+1]/X[i]: below it, a point of layer i is under the curve for sure. */
const RATIO = new Float64Array(N);
{
  let f = exp(-0.5 * R * R);
  X[0] = ZIGGURAT_128.v / f;
  X[1] = R;
  for (let i = 2; i < N; i++) {
    X[i] = Math.sqrt(-2 * log(ZIGGURAT_128.v / (X[i - 1] as number) + f));
    f = exp(-0.5 * (X[i] as number) ** 2);
  }
  X[N] = 0;
  for (let i = 0; i < N; i++) RATIO[i] = (X[i + 1] as number) / (X[i] as number);
}

/** Beyond R: Marsaglia's exponential-rejection tail (1964). */
function tail(rng: Rng, negative: boolean): number {
  let x: number;
  let y: number;
  do {
    // 1 − next() lies in (0, 1]: no log(0).
    x = log(1 - rng.next()) / R;
    y = log(1 - rng.next());
  } while (-2 * y < x * x);
  return negative ? x - R : R - x;
}

/**
 * A standard normal deviate (mean 0, σ 1). About 99 % of calls use one uniform, one multiply and
 * one compare; the rest take the wedge or tail test. Abscissae have 24-bit resolution (ample
 * for Monte Carlo errors); the tail beyond 3.44σ is exact. Works with any {@link Rng}.
 */
export function standardNormal(rng: Rng): number {
  // One 32-bit draw: low 7 bits pick the layer, the upper 25 give a signed abscissa in (−1, 1).
  const j = rng.nextUint32();
  const i = j & (N - 1);
  const u = ((j >>> 7) + 0.5) * (2 / 33554432) - 1;
  if (Math.abs(u) < (RATIO[i] as number)) return u * (X[i] as number);
  return edge(rng, i, u);
}

/** Words taken from the generator at a time by {@link fillStandardNormals}. */
const CHUNK = 512;

/** Stands in for a generator between fills. */
const NO_SOURCE: Rng = { next: () => 0, nextUint32: () => 0 };

/** Words a refill asks for when it is not told how many are wanted (the edge path reading on). */
const EDGE_REFILL = 16;

/**
 * Serves a generator's words from a buffer filled in bulk: the same sequence as the generator's
 * own. Each refill takes only as many words as asked for (at most CHUNK), so that a short fill
 * does not make a generator produce hundreds of words nobody reads.
 */
class BufferedWords implements Rng {
  readonly buf = new Uint32Array(CHUNK);
  /** Words of `buf` filled by the last refill, and the next one to serve. */
  len = 0;
  pos = 0;
  source: Rng = NO_SOURCE;

  /** Replaces the buffer's words by the next `count` words of the source (1 ≤ count ≤ CHUNK). */
  refill(count: number): void {
    const src = this.source;
    if (src.fillUint32) src.fillUint32(this.buf, count);
    else for (let k = 0; k < count; k++) this.buf[k] = src.nextUint32();
    this.len = count;
    this.pos = 0;
  }

  nextUint32(): number {
    if (this.pos === this.len) this.refill(EDGE_REFILL);
    return this.buf[this.pos++] as number;
  }

  next(): number {
    return this.nextUint32() * (1 / 4294967296);
  }
}

/**
 * Words to take for `left` more deviates: one each, one in 32 over for the edge path (about one
 * deviate in eighty goes there and takes one word or a few more), and two to spare; at most CHUNK.
 * Too few costs one more short refill, never a different deviate.
 */
function wordsFor(left: number): number {
  return Math.min(CHUNK, left + (left >>> 5) + 2);
}

const words = new BufferedWords();

/**
 * Fills `out` with standard normal deviates: exactly `out[k] = standardNormal(rng)` for k = 0, 1, …,
 * but with the generator's words taken in bulk. It takes a few words more than it uses (about one
 * in 32 over, see wordsFor), so `rng` must not be used afterwards (the draw bank gives each role a
 * generator of its own).
 */
export function fillStandardNormals(rng: Rng, out: Float64Array): void {
  const w = words;
  w.source = rng;
  w.len = 0;
  w.pos = 0;
  const buf = w.buf;
  const n = out.length;
  // The read position and the words filled in locals, handed to `w` only around the rare edge
  // path (which reads on, and may refill).
  let pos = 0;
  let len = 0;
  let k = 0;
  // Two deviates per step while two words are at hand and both take the common path (about 97 %
  // of pairs): the arrays are checked once per pair. A word that needs the edge path ends the
  // step at that word, so the words are taken exactly as one by one.
  while (k < n) {
    if (pos === len) {
      w.refill(wordsFor(n - k));
      pos = 0;
      len = w.len;
    }
    const j0 = buf[pos] as number;
    const i0 = j0 & (N - 1);
    const u0 = ((j0 >>> 7) + 0.5) * (2 / 33554432) - 1;
    if (!(Math.abs(u0) < (RATIO[i0] as number))) {
      w.pos = pos + 1;
      edgeInto(w, i0, j0 >>> 7, out, k);
      pos = w.pos;
      len = w.len;
      k++;
      continue;
    }
    out[k] = u0 * (X[i0] as number);
    pos++;
    k++;
    // The second of the pair, when it is in this buffer and wanted.
    if (k === n || pos === len) continue;
    const j1 = buf[pos] as number;
    const i1 = j1 & (N - 1);
    const u1 = ((j1 >>> 7) + 0.5) * (2 / 33554432) - 1;
    if (Math.abs(u1) < (RATIO[i1] as number)) out[k] = u1 * (X[i1] as number);
    else {
      w.pos = pos + 1;
      edgeInto(w, i1, j1 >>> 7, out, k);
      pos = w.pos - 1;
      len = w.len;
    }
    pos++;
    k++;
  }
  // Let go of the caller's generator (no new object per call: this runs once per role and object).
  w.source = NO_SOURCE;
}

/** The two exponentials of a wedge test. */
const wedge = new Float64Array(2);

/**
 * `out[k] = edge(w, i, u)` for the abscissa u made from the 25 bits `a` as in standardNormal,
 * without boxing: a call that is not inlined takes and returns doubles in fresh heap boxes, and
 * about one deviate in eighty comes here (with two exponentials), so edge's boxes were a third of
 * the derivation's garbage. Only integers and objects go in, the result goes into `out`; a
 * rejected point starts afresh in the loop, with the words standardNormal would take.
 */
function edgeInto(w: BufferedWords, i: number, a: number, out: Float64Array, k: number): void {
  for (;;) {
    const u = (a + 0.5) * (2 / 33554432) - 1;
    if (i === 0) {
      out[k] = tail(w, u < 0);
      return;
    }
    const x = u * (X[i] as number);
    const x2 = x * x;
    const xi = X[i] as number;
    const xi1 = X[i + 1] as number;
    wedge[0] = -0.5 * (xi * xi - x2);
    wedge[1] = -0.5 * (xi1 * xi1 - x2);
    expInPlace(wedge, 0, 2);
    const f0 = wedge[0] as number;
    const f1 = wedge[1] as number;
    if (f1 + w.next() * (f0 - f1) < 1) {
      out[k] = x;
      return;
    }
    // Rejected: standardNormal(w) afresh.
    const j = w.nextUint32();
    i = j & (N - 1);
    a = j >>> 7;
    const v = (a + 0.5) * (2 / 33554432) - 1;
    if (Math.abs(v) < (RATIO[i] as number)) {
      out[k] = v * (X[i] as number);
      return;
    }
  }
}

/** The wedge and tail tests for a first word of layer `i` and abscissa `u` already drawn; a rejected point starts afresh. */
function edge(rng: Rng, i: number, u: number): number {
  if (i === 0) return tail(rng, u < 0);
  const x = u * (X[i] as number);
  const x2 = x * x;
  const xi = X[i] as number;
  const xi1 = X[i + 1] as number;
  const f0 = exp(-0.5 * (xi * xi - x2));
  const f1 = exp(-0.5 * (xi1 * xi1 - x2));
  if (f1 + rng.next() * (f0 - f1) < 1) return x;
  return standardNormal(rng);
}
