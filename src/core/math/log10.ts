// Ported from fdlibm 5.3 e_log10.c and e_log.c (Sun Microsystems, 1993; freely redistributable
// with its notice), as V8's src/base/ieee754.cc carried them until 2024; e_log.c's body is
// inlined for the reduced argument, which keeps this hot call within ~1.5× of Math.log10.
import { pow2 } from './pow2.ts';

const TWO54 = 1.8014398509481984e16; // 43500000 00000000
const IVLN10 = 4.34294481903251816668e-1;
const LOG10_2HI = 3.01029995663611771306e-1; // 3FD34413 509F6000
const LOG10_2LO = 3.69423907715893078616e-13; // 3D59FEF3 11F12B36
const LN2_HI = 6.93147180369123816490e-1; // 3fe62e42 fee00000
const LN2_LO = 1.90821492927058770002e-10; // 3dea39ef 35793c76
const LG1 = 6.666666666666735130e-1;
const LG2 = 3.999999999940941908e-1;
const LG3 = 2.857142874366239149e-1;
const LG4 = 2.222219843214978396e-1;
const LG5 = 1.818357216161805012e-1;
const LG6 = 1.531383769920937332e-1;
const LG7 = 1.479819860511658591e-1;

const f64 = new Float64Array(1);
const i32 = new Int32Array(f64.buffer);

/**
 * Base-10 logarithm, the same in every JavaScript engine (see log.ts): n·log10(2) plus
 * log(m)/ln 10 for x = m·2^n, exact at powers of ten up to 1e22. Equal bit for bit to fdlibm's log10.
 * @param x - any number; log10(0) = −Infinity, log10(x < 0) = NaN.
 */
export function log10(x: number): number {
  f64[0] = x;
  let hx = i32[1] as number;
  let k = 0;
  let xn = x;
  if (hx < 0x00100000) {
    if (((hx & 0x7fffffff) | (i32[0] as number)) === 0) return -Infinity;
    if (hx < 0) return NaN;
    k = -54;
    xn = x * TWO54; // subnormal: scale up
    f64[0] = xn;
    hx = i32[1] as number;
  }
  if (hx >= 0x7ff00000) return x + x;
  if (hx === 0x3ff00000 && i32[0] === 0) return 0;
  const e = (hx >> 20) - 1023;
  k += e;
  const i = (k & 0x80000000) >>> 31;
  const y = k + i;
  // log(m) of m = x·2^-(k+i) (in [1, 2) or [0.5, 1)) as e_log.c computes it, its reduction to
  // [sqrt(2)/2, sqrt(2)) done by an exact power-of-two product instead of rewriting words.
  hx &= 0x000fffff;
  const j0 = (hx + 0x95f64) & 0x100000;
  const km = -i + (j0 >> 20);
  const f = xn * pow2(-(e + (j0 >> 20))) - 1.0;
  let lnm: number;
  if ((0x000fffff & (2 + hx)) < 3) {
    if (f === 0) lnm = km === 0 ? 0 : km * LN2_HI + km * LN2_LO;
    else {
      const R = f * f * (0.5 - 0.33333333333333333 * f);
      lnm = km === 0 ? f - R : km * LN2_HI - ((R - km * LN2_LO) - f);
    }
  } else {
    const s = f / (2.0 + f);
    const z = s * s;
    const w = z * z;
    const j = (hx - 0x6147a) | (0x6b851 - hx);
    const R = z * (LG1 + w * (LG3 + w * (LG5 + w * LG7))) + w * (LG2 + w * (LG4 + w * LG6));
    if (j > 0) {
      const hfsq = 0.5 * f * f;
      lnm = km === 0 ? f - (hfsq - s * (hfsq + R)) : km * LN2_HI - ((hfsq - (s * (hfsq + R) + km * LN2_LO)) - f);
    } else {
      lnm = km === 0 ? f - s * (f - R) : km * LN2_HI - ((s * (f - R) - km * LN2_LO) - f);
    }
  }
  const zz = y * LOG10_2LO + IVLN10 * lnm;
  return zz + y * LOG10_2HI;
}

/** 2^n for the exponents the common path of {@link log10InPlace} needs (the same exact values as pow2). */
const POW2 = new Float64Array(2100);
for (let n = -1074; n <= 1023; n++) POW2[n + 1074] = pow2(n);

/**
 * `values[k] = log10(values[k])` for every k, bit for bit as {@link log10}, without a function
 * call per value on the common path (normal numbers not within a few ulps of a power of two):
 * a call that is not inlined hands its double result back in a fresh heap box, and over the
 * Monte Carlo draws those boxes were most of the derivation's garbage. The rest go to log10.
 * The words of each value are read in place through a 32-bit view of the array (little-endian,
 * as the scratch words of log10 assume), not by writing the value to a scratch array and
 * reading it back: about a fifth faster.
 */
export function log10InPlace(values: Float64Array): void {
  const n = values.length;
  const words = new Int32Array(values.buffer, values.byteOffset, 2 * n);
  for (let q = 0; q < n; q++) {
    const x = values[q] as number;
    let hx = words[2 * q + 1] as number;
    if (hx < 0x00100000 || hx >= 0x7ff00000 || (hx === 0x3ff00000 && words[2 * q] === 0) || (0x000fffff & (2 + (hx & 0x000fffff))) < 3) {
      values[q] = log10(x);
      continue;
    }
    // From here as log10 for a normal x with k = e (no subnormal scaling), general branch.
    const e = (hx >> 20) - 1023;
    const i = (e & 0x80000000) >>> 31;
    const y = e + i;
    hx &= 0x000fffff;
    const j0 = (hx + 0x95f64) & 0x100000;
    const km = -i + (j0 >> 20);
    const f = x * (POW2[1074 - (e + (j0 >> 20))] as number) - 1.0;
    const s = f / (2.0 + f);
    const z = s * s;
    const w = z * z;
    const j = (hx - 0x6147a) | (0x6b851 - hx);
    const R = z * (LG1 + w * (LG3 + w * (LG5 + w * LG7))) + w * (LG2 + w * (LG4 + w * LG6));
    // One formula for every km: with km = 0 it gives e_log.c's km = 0 form bit for bit (0 − (a − f)
    // is f − a exactly in round-to-nearest, and f is never −0), and the branch on km, taken at
    // random by Monte Carlo draws that straddle √2, mispredicted about half the time.
    let lnm: number;
    if (j > 0) {
      const hfsq = 0.5 * f * f;
      lnm = km * LN2_HI - ((hfsq - (s * (hfsq + R) + km * LN2_LO)) - f);
    } else {
      lnm = km * LN2_HI - ((s * (f - R) - km * LN2_LO) - f);
    }
    const zz = y * LOG10_2LO + IVLN10 * lnm;
    values[q] = zz + y * LOG10_2HI;
  }
}
