/**
 * A source of uniform random numbers in [0, 1). Functions that need randomness take one, so
 * tests and the catalog build control the stream (see {@link createRng} and {@link seedFor}).
 */
export interface Rng {
  /** The next uniform deviate in [0, 1). */
  next(): number;
}
