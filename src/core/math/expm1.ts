// Ported from fdlibm 5.3 s_expm1.c (Sun Microsystems, 1993; freely redistributable with its notice),
// as V8's src/base/ieee754.cc carries it.
import { pow2 } from './pow2.ts';
import { highWord, lowWord } from './words.ts';

const O_THRESHOLD = 7.09782712893383973096e2; // 40862E42 FEFA39EF
const LN2_HI = 6.93147180369123816490e-1; // 3fe62e42 fee00000
const LN2_LO = 1.90821492927058770002e-10; // 3dea39ef 35793c76
const INVLN2 = 1.44269504088896338700; // 3ff71547 652b82fe
// Scaled Q's: Qn here = 2^n · Qn of the method, for R(2z) with z = x²/2.
const Q1 = -3.33333333333331316428e-2; // BFA11111 111110F4
const Q2 = 1.58730158725481460165e-3; // 3F5A01A0 19FE5585
const Q3 = -7.93650757867487942473e-5; // BF14CE19 9EAADBB7
const Q4 = 4.00821782732936239552e-6; // 3ED0CFCA 86E65239
const Q5 = -2.01099218183624371326e-7; // BE8AFDB7 6E09C32D

/**
 * e^x − 1, accurate near 0 and the same in every JavaScript engine (see log.ts). Error below
 * 1 ulp; equal bit for bit to fdlibm's expm1.
 * @param x - any number.
 */
export function expm1(x: number): number {
  let hx = highWord(x);
  const xsb = hx & 0x80000000;
  hx &= 0x7fffffff;
  if (hx >= 0x4043687a) {
    // |x| >= 56 ln 2
    if (hx >= 0x40862e42) {
      if (hx >= 0x7ff00000) {
        if (((hx & 0xfffff) | lowWord(x)) !== 0) return x + x; // NaN
        return xsb === 0 ? x : -1.0;
      }
      if (x > O_THRESHOLD) return Infinity;
    }
    if (xsb !== 0) return -1.0; // x < -56 ln 2
  }
  let k = 0;
  let c = 0;
  if (hx > 0x3fd62e42) {
    // |x| > 0.5 ln 2
    let hi: number;
    let lo: number;
    if (hx < 0x3ff0a2b2) {
      if (xsb === 0) {
        hi = x - LN2_HI;
        lo = LN2_LO;
        k = 1;
      } else {
        hi = x + LN2_HI;
        lo = -LN2_LO;
        k = -1;
      }
    } else {
      k = Math.trunc(INVLN2 * x + (xsb === 0 ? 0.5 : -0.5));
      hi = x - k * LN2_HI; // exact here
      lo = k * LN2_LO;
    }
    x = hi - lo;
    c = (hi - x) - lo;
  } else if (hx < 0x3c900000) {
    return x; // |x| < 2^-54
  }
  const hfx = 0.5 * x;
  const hxs = x * hfx;
  const r1 = 1 + hxs * (Q1 + hxs * (Q2 + hxs * (Q3 + hxs * (Q4 + hxs * Q5))));
  let t = 3.0 - r1 * hfx;
  let e = hxs * ((r1 - t) / (6.0 - x * t));
  if (k === 0) return x - (x * e - hxs);
  const twopk = k < 1024 ? pow2(k) : Infinity; // k = 1024 scales in two steps below
  e = x * (e - c) - c;
  e -= hxs;
  if (k === -1) return 0.5 * (x - e) - 0.5;
  if (k === 1) {
    if (x < -0.25) return -2.0 * (e - (x + 0.5));
    return 1 + 2.0 * (x - e);
  }
  let y: number;
  if (k <= -2 || k > 56) {
    y = 1 - (e - x);
    y = k === 1024 ? y * 2.0 * 8.98846567431158e307 : y * twopk;
    return y - 1;
  }
  if (k < 20) {
    t = 1 - pow2(-k); // exact: fdlibm writes these words
    y = t - (e - x);
    return y * twopk;
  }
  t = pow2(-k);
  y = x - (e + t);
  y += 1;
  return y * twopk;
}
