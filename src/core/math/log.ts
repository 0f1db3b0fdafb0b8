// Ported from fdlibm 5.3 e_log.c (Sun Microsystems, 1993; freely redistributable with its notice),
// as V8's src/base/ieee754.cc carried it until 2024.
import { highWord, lowWord, withHighWord } from './words.ts';

const LN2_HI = 6.93147180369123816490e-1; // 3fe62e42 fee00000
const LN2_LO = 1.90821492927058770002e-10; // 3dea39ef 35793c76
const TWO54 = 1.8014398509481984e16; // 43500000 00000000
const LG1 = 6.666666666666735130e-1; // 3FE55555 55555593
const LG2 = 3.999999999940941908e-1; // 3FD99999 9997FA04
const LG3 = 2.857142874366239149e-1; // 3FD24924 94229359
const LG4 = 2.222219843214978396e-1; // 3FCC71C5 1D8E78AF
const LG5 = 1.818357216161805012e-1; // 3FC74664 96CB03DE
const LG6 = 1.531383769920937332e-1; // 3FC39A09 D078C69F
const LG7 = 1.479819860511658591e-1; // 3FC2F112 DF3E5244

/**
 * Natural logarithm, the same in every JavaScript engine: built from +, −, ×, ÷ only (an
 * engine's Math.log may differ in the last bit: Node 20's V8 uses fdlibm, recent Chromium a
 * correctly rounded one). Error below 1 ulp; equal bit for bit to fdlibm's log.
 * @param x - any number; log(0) = −Infinity, log(x < 0) = NaN.
 */
export function log(x: number): number {
  let hx = highWord(x);
  const lx = lowWord(x);
  let k = 0;
  if (hx < 0x00100000) {
    // x < 2^-1022: zero, negative or subnormal
    if (((hx & 0x7fffffff) | lx) === 0) return -Infinity;
    if (hx < 0) return NaN;
    k -= 54;
    x *= TWO54;
    hx = highWord(x);
  }
  if (hx >= 0x7ff00000) return x + x;
  k += (hx >> 20) - 1023;
  hx &= 0x000fffff;
  let i = (hx + 0x95f64) & 0x100000;
  x = withHighWord(x, hx | (i ^ 0x3ff00000)); // normalise x or x/2
  k += i >> 20;
  const f = x - 1.0;
  if ((0x000fffff & (2 + hx)) < 3) {
    // -2^-20 <= f < 2^-20
    if (f === 0) {
      if (k === 0) return 0;
      return k * LN2_HI + k * LN2_LO;
    }
    const R = f * f * (0.5 - 0.33333333333333333 * f);
    if (k === 0) return f - R;
    return k * LN2_HI - ((R - k * LN2_LO) - f);
  }
  const s = f / (2.0 + f);
  const dk = k;
  const z = s * s;
  i = hx - 0x6147a;
  const w = z * z;
  const j = 0x6b851 - hx;
  const t1 = w * (LG2 + w * (LG4 + w * LG6));
  const t2 = z * (LG1 + w * (LG3 + w * (LG5 + w * LG7)));
  i |= j;
  const R = t2 + t1;
  if (i > 0) {
    const hfsq = 0.5 * f * f;
    if (k === 0) return f - (hfsq - s * (hfsq + R));
    return dk * LN2_HI - ((hfsq - (s * (hfsq + R) + dk * LN2_LO)) - f);
  }
  if (k === 0) return f - s * (f - R);
  return dk * LN2_HI - ((s * (f - R) - dk * LN2_LO) - f);
}
