/**
 * Seeded random numbers for the demo generator: a 32-bit generator, a per-row seed derived
 * from (global seed, row index) so that row k is the same whatever n is, and the few
 * distributions the population model needs.
 */

/** A source of uniform deviates in [0, 1). */
export type Rng = () => number;

/**
 * Mulberry32 generator (Tommy Ettinger, public domain).
 * @param seed any 32-bit integer
 */
export function mulberry32(seed: number): Rng {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** MurmurHash3 32-bit finaliser (Austin Appleby, public domain). */
function fmix32(h: number): number {
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return h >>> 0;
}

/**
 * Seed of one row, mixed from the catalog seed and the row index.
 * @param seed catalog seed (integer)
 * @param index row index (integer ≥ 0)
 */
export function rowSeed(seed: number, index: number): number {
  return fmix32(fmix32(seed >>> 0) ^ Math.imul(index + 1, 0x9e3779b1));
}

/** Uniform deviate in [lo, hi). */
export function uniform(rng: Rng, lo: number, hi: number): number {
  return lo + (hi - lo) * rng();
}

/** Deviate whose log10 is uniform in [log lo, log hi). */
export function logUniform(rng: Rng, lo: number, hi: number): number {
  return 10 ** uniform(rng, Math.log10(lo), Math.log10(hi));
}

/** Standard normal deviate (Box–Muller; one pair of uniforms per call, no cached twin). */
export function standardNormal(rng: Rng): number {
  const u = 1 - rng(); // (0, 1]: keeps log finite
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rng());
}

/**
 * Normal deviate truncated to [lo, hi], by rejection (the model's bounds keep the
 * acceptance high); after 1000 rejections the nearest bound is returned.
 */
export function truncatedNormal(rng: Rng, mean: number, sd: number, lo: number, hi: number): number {
  for (let i = 0; i < 1000; i++) {
    const x = mean + sd * standardNormal(rng);
    if (x >= lo && x <= hi) return x;
  }
  return Math.min(hi, Math.max(lo, mean));
}

/**
 * Exponential deviate truncated to [0, max] (inverse CDF).
 * @param scale e-folding length
 */
export function truncatedExponential(rng: Rng, scale: number, max: number): number {
  const cdfMax = 1 - Math.exp(-max / scale);
  return -scale * Math.log(1 - rng() * cdfMax);
}

/** Picks an index with probability proportional to its weight. */
export function pickWeighted(rng: Rng, weights: readonly number[]): number {
  const total = weights.reduce((a, b) => a + b, 0);
  let u = rng() * total;
  for (let i = 0; i < weights.length; i++) {
    u -= weights[i] ?? 0;
    if (u < 0) return i;
  }
  return weights.length - 1;
}
