import { mix32, seedWords } from './splitmix32.ts';

const FNV_OFFSET = 0x811c9dc5;
const FNV_PRIME = 0x01000193;

/** FNV-1a over the id's UTF-16 code units (both bytes), from a keyed start, with the length folded in and a final mix. */
function keyedHash(start: number, id: string): number {
  let h = start >>> 0;
  for (let i = 0; i < id.length; i++) {
    const c = id.charCodeAt(i);
    h = Math.imul(h ^ (c & 0xff), FNV_PRIME);
    h = Math.imul(h ^ (c >>> 8), FNV_PRIME);
  }
  return mix32(h ^ id.length);
}

/**
 * The seed of one object's random stream: a hash of (global seed, object id), so each object's
 * draws depend only on those two and not on the order objects are processed. Two FNV-1a hashes
 * of the id, keyed by both words of the global seed and finished with a murmur3-style 32-bit
 * finalizer, make a 53-bit integer (0 ≤ seed < 2^53, exact in a double and in JSON): among a
 * million ids a collision has probability ~6e-5, where 32 bits would make one likely.
 * Pass it to {@link createRng}.
 */
export function seedFor(globalSeed: number, id: string): number {
  const [lo, hi] = seedWords(globalSeed);
  const key = mix32(lo) ^ mix32((hi + 0x9e3779b9) | 0);
  const low = keyedHash(FNV_OFFSET ^ key, id);
  const high = keyedHash(mix32(key ^ 0x85ebca6b) ^ FNV_OFFSET, id) & 0x1fffff;
  return high * 4294967296 + low;
}
