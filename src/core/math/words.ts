/**
 * The two 32-bit halves of a double, as fdlibm reads and writes them (EXTRACT_WORDS,
 * SET_HIGH_WORD, …), through one shared 8-byte buffer. Little-endian engines only (every
 * browser and Node platform in use); checked once at load.
 */
const f64 = new Float64Array(1);
const i32 = new Int32Array(f64.buffer);
f64[0] = 1;
if (i32[1] !== 0x3ff00000) throw new Error('src/core/math needs a little-endian engine');

/** High word of `x` (sign, exponent and top 20 bits of the significand), as a signed int32. */
export function highWord(x: number): number {
  f64[0] = x;
  return i32[1] as number;
}

/** Low word of `x` (bottom 32 bits of the significand), as a signed int32 (compare with `>>> 0` when unsigned). */
export function lowWord(x: number): number {
  f64[0] = x;
  return i32[0] as number;
}

/** `x` with its high word replaced by `hi` (fdlibm's SET_HIGH_WORD). */
export function withHighWord(x: number, hi: number): number {
  f64[0] = x;
  i32[1] = hi;
  return f64[0] as number;
}
