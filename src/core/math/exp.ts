// Ported from fdlibm 5.3 e_exp.c (Sun Microsystems, 1993; freely redistributable with its notice),
// as V8's src/base/ieee754.cc carries it.
import { pow2 } from './pow2.ts';
import { highWord, lowWord } from './words.ts';

const HALF = [0.5, -0.5];
const O_THRESHOLD = 7.09782712893383973096e2; // 40862E42 FEFA39EF
const U_THRESHOLD = -7.45133219101941108420e2; // c0874910 D52D3051
const LN2_HI = [6.93147180369123816490e-1, -6.93147180369123816490e-1]; // ±3fe62e42 fee00000
const LN2_LO = [1.90821492927058770002e-10, -1.90821492927058770002e-10]; // ±3dea39ef 35793c76
const INVLN2 = 1.44269504088896338700; // 3ff71547 652b82fe
const P1 = 1.66666666666666019037e-1; // 3FC55555 5555553E
const P2 = -2.77777777770155933842e-3; // BF66C16C 16BEBD93
const P3 = 6.61375632143793436117e-5; // 3F11566A AF25DE2C
const P4 = -1.65339022054652515390e-6; // BEBBBD41 C5D26BF1
const P5 = 4.13813679705723846039e-8; // 3E663769 72BEA4D0
const E = 2.718281828459045; // 4005bf0a 8b145769
const TWOM1000 = 9.33263618503218878990e-302; // 2^-1000
const TWO1023 = 8.988465674311579539e307; // 2^1023

/**
 * e^x, the same in every JavaScript engine (see log.ts): argument reduction by ln 2 and a
 * rational approximation, built from +, −, ×, ÷ only. Error below 1 ulp; equal bit for bit to fdlibm's exp.
 * @param x - any number.
 */
export function exp(x: number): number {
  let hx = highWord(x);
  const xsb = (hx >>> 31) & 1;
  hx &= 0x7fffffff;
  let hi = 0;
  let lo = 0;
  let k = 0;
  if (hx >= 0x40862e42) {
    // |x| >= 709.78…
    if (hx >= 0x7ff00000) {
      if (((hx & 0xfffff) | lowWord(x)) !== 0) return x + x; // NaN
      return xsb === 0 ? x : 0;
    }
    if (x > O_THRESHOLD) return Infinity;
    if (x < U_THRESHOLD) return 0;
  }
  if (hx > 0x3fd62e42) {
    // |x| > 0.5 ln 2
    if (hx < 0x3ff0a2b2) {
      // and |x| < 1.5 ln 2
      if (x === 1.0) return E;
      hi = x - (LN2_HI[xsb] as number);
      lo = LN2_LO[xsb] as number;
      k = 1 - xsb - xsb;
    } else {
      k = Math.trunc(INVLN2 * x + (HALF[xsb] as number));
      hi = x - k * (LN2_HI[0] as number); // exact here
      lo = k * (LN2_LO[0] as number);
    }
    x = hi - lo;
  } else if (hx < 0x3e300000) {
    // |x| < 2^-28
    return 1 + x;
  }
  const t = x * x;
  const twopk = k >= -1021 ? (k < 1024 ? pow2(k) : Infinity) : pow2(k + 1000); // fdlibm builds 2^k from its words; the table gives the same double
  const c = x - t * (P1 + t * (P2 + t * (P3 + t * (P4 + t * P5))));
  if (k === 0) return 1 - ((x * c) / (c - 2.0) - x);
  const y = 1 - ((lo - (x * c) / (2.0 - c)) - hi);
  if (k >= -1021) {
    if (k === 1024) return y * 2.0 * TWO1023;
    return y * twopk;
  }
  return y * twopk * TWOM1000;
}

const f64 = new Float64Array(1);
const i32 = new Int32Array(f64.buffer);

/**
 * `values[q] = exp(values[q])` for q in [from, to), bit for bit as {@link exp}, without a call per
 * value on the common path (|x| between 2^-28 and 709, results in the normal range): a call that
 * is not inlined takes and returns its doubles in fresh heap boxes, which made most of the garbage
 * of the normal deviates' wedge test. The rest go to exp.
 */
export function expInPlace(values: Float64Array, from: number, to: number): void {
  for (let q = from; q < to; q++) {
    const x0 = values[q] as number;
    f64[0] = x0;
    const hw = i32[1] as number;
    const xsb = (hw >>> 31) & 1;
    const hx = hw & 0x7fffffff;
    // Beyond ±709.78 or not finite, below 2^-28, and exactly 1: as exp.
    if (hx >= 0x40862e42 || hx < 0x3e300000 || x0 === 1.0) {
      values[q] = exp(x0);
      continue;
    }
    let x = x0;
    let hi = 0;
    let lo = 0;
    let k = 0;
    if (hx > 0x3fd62e42) {
      if (hx < 0x3ff0a2b2) {
        hi = x - (LN2_HI[xsb] as number);
        lo = LN2_LO[xsb] as number;
        k = 1 - xsb - xsb;
      } else {
        k = Math.trunc(INVLN2 * x + (HALF[xsb] as number));
        hi = x - k * (LN2_HI[0] as number);
        lo = k * (LN2_LO[0] as number);
      }
      x = hi - lo;
    }
    // Here |k| ≤ 1025; results below 2^-1021 (k < -1021) take exp's scaled path.
    if (k < -1021 || k === 1024) {
      values[q] = exp(x0);
      continue;
    }
    const t = x * x;
    const c = x - t * (P1 + t * (P2 + t * (P3 + t * (P4 + t * P5))));
    if (k === 0) values[q] = 1 - ((x * c) / (c - 2.0) - x);
    else values[q] = (1 - ((lo - (x * c) / (2.0 - c)) - hi)) * pow2(k);
  }
}
