// Ported from fdlibm 5.3 s_log1p.c (Sun Microsystems, 1993; freely redistributable with its notice),
// as V8's src/base/ieee754.cc carried it until 2024.
import { highWord, withHighWord } from './words.ts';

const LN2_HI = 6.93147180369123816490e-1; // 3fe62e42 fee00000
const LN2_LO = 1.90821492927058770002e-10; // 3dea39ef 35793c76
const LP1 = 6.666666666666735130e-1;
const LP2 = 3.999999999940941908e-1;
const LP3 = 2.857142874366239149e-1;
const LP4 = 2.222219843214978396e-1;
const LP5 = 1.818357216161805012e-1;
const LP6 = 1.531383769920937332e-1;
const LP7 = 1.479819860511658591e-1;

/**
 * ln(1 + x), accurate near 0 and the same in every JavaScript engine (see log.ts). Error below
 * 1 ulp; equal bit for bit to fdlibm's log1p.
 * @param x - any number; log1p(−1) = −Infinity, log1p(x < −1) = NaN.
 */
export function log1p(x: number): number {
  const hx = highWord(x);
  const ax = hx & 0x7fffffff;
  let k = 1;
  let f = 0;
  let hu = 0;
  let c = 0;
  if (hx < 0x3fda827a) {
    // 1 + x < sqrt(2)+
    if (ax >= 0x3ff00000) return x === -1.0 ? -Infinity : NaN; // x <= -1
    if (ax < 0x3e200000) {
      // |x| < 2^-29
      if (ax < 0x3c900000) return x; // |x| < 2^-54
      return x - x * x * 0.5;
    }
    if (hx > 0 || hx <= (0xbfd2bec4 | 0)) {
      // sqrt(2)/2- <= 1 + x < sqrt(2)+
      k = 0;
      f = x;
      hu = 1;
    }
  }
  if (hx >= 0x7ff00000) return x + x;
  if (k !== 0) {
    let u: number;
    if (hx < 0x43400000) {
      u = 1.0 + x;
      hu = highWord(u);
      k = (hu >> 20) - 1023;
      c = k > 0 ? 1.0 - (u - x) : x - (u - 1.0); // correction term
      c /= u;
    } else {
      u = x;
      hu = highWord(u);
      k = (hu >> 20) - 1023;
      c = 0;
    }
    hu &= 0x000fffff;
    if (hu < 0x6a09e) {
      u = withHighWord(u, hu | 0x3ff00000); // normalise u
    } else {
      k += 1;
      u = withHighWord(u, hu | 0x3fe00000); // normalise u/2
      hu = (0x00100000 - hu) >> 2;
    }
    f = u - 1.0;
  }
  const hfsq = 0.5 * f * f;
  if (hu === 0) {
    // |f| < 2^-20
    if (f === 0) {
      if (k === 0) return 0;
      c += k * LN2_LO;
      return k * LN2_HI + c;
    }
    const R = hfsq * (1.0 - 0.66666666666666666 * f);
    if (k === 0) return f - R;
    return k * LN2_HI - ((R - (k * LN2_LO + c)) - f);
  }
  const s = f / (2.0 + f);
  const z = s * s;
  const R = z * (LP1 + z * (LP2 + z * (LP3 + z * (LP4 + z * (LP5 + z * (LP6 + z * LP7))))));
  if (k === 0) return f - (hfsq - s * (hfsq + R));
  return k * LN2_HI - ((hfsq - (s * (hfsq + R) + (k * LN2_LO + c))) - f);
}
