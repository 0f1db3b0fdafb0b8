/**
 * A source of uniform random numbers in [0, 1). Functions that need randomness take one, so
 * tests and the catalog build control the stream (see {@link createRng} and {@link seedFor}).
 */
export interface Rng {
  /** The next uniform deviate in [0, 1): `nextUint32() / 2^32`. */
  next(): number;
  /**
   * The next 32 random bits as an unsigned integer in [0, 2^32). The same step of the stream as
   * `next()`; the normal sampler takes its bits from here without a round trip through a float.
   */
  nextUint32(): number;
  /**
   * Optional: fills `out[0..count)` (count defaults to `out.length`) with the next `count` words of
   * the stream, exactly as that many `nextUint32()` calls would (a bulk path for generators that
   * have one).
   */
  fillUint32?(out: Uint32Array, count?: number): void;
}
