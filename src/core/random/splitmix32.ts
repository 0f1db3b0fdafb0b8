// SplitMix increment (Steele, Lea & Flood 2014, OOPSLA) with the 32-bit "lowbias32" finalizer
// of C. Wellons' hash-prospector (public domain / Unlicense).

/** The 32-bit avalanche finalizer: every input bit affects every output bit. Returns a uint32. */
export function mix32(x: number): number {
  x ^= x >>> 16;
  x = Math.imul(x, 0x21f0aaad);
  x ^= x >>> 15;
  x = Math.imul(x, 0x735a2d97);
  x ^= x >>> 15;
  return x >>> 0;
}

/** A splitmix32 sequence from a 32-bit state: each call adds the golden-ratio increment and mixes. */
export function splitmix32(state: number): () => number {
  let s = state | 0;
  return () => {
    s = (s + 0x9e3779b9) | 0;
    return mix32(s);
  };
}

/**
 * Splits a seed (any finite number; integers up to 2^53 keep all their bits) into its low and
 * high 32-bit words, so seeds that differ only above bit 32 still give different streams.
 */
export function seedWords(seed: number): [lo: number, hi: number] {
  if (!Number.isFinite(seed)) throw new RangeError(`random seed must be a finite number, got ${seed}`);
  const int = Math.trunc(seed);
  // A fractional part is folded in rather than silently dropped.
  const frac = seed - int === 0 ? 0 : Math.floor((seed - int) * 4294967296);
  const lo = (int % 4294967296) >>> 0;
  const hi = Math.floor(int / 4294967296) >>> 0;
  return [(lo ^ mix32(frac)) >>> 0, hi];
}
