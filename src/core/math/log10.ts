// Ported from fdlibm 5.3 e_log10.c and e_log.c (Sun Microsystems, 1993; freely redistributable
// with its notice), as V8's src/base/ieee754.cc carried them until 2024; e_log.c's body is
// inlined for the reduced argument, which keeps this hot call within ~1.5× of Math.log10.
import { pow2 } from './pow2.ts';
import { LOG10_TABLE_CENTRE, LOG10_TABLE_HI, LOG10_TABLE_LO, LOG10_TABLE_SPLIT } from './log10Table.ts';

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

/** 2^n for every exponent of a normal double's reduction (the same exact values as pow2). */
const POW2 = new Float64Array(2100);
for (let n = -1074; n <= 1023; n++) POW2[n + 1074] = pow2(n);

/**
 * Per interval of the significand (log10Table.ts), four doubles side by side: its centre c, 1/c
 * rounded (IEEE division: the same double in every engine), and log10(c) as hi and lo.
 */
const TABLE = new Float64Array(4 * 128);
for (let i = 0; i < 128; i++) {
  const c = LOG10_TABLE_CENTRE[i] as number;
  TABLE[4 * i] = c;
  TABLE[4 * i + 1] = 1 / c;
  TABLE[4 * i + 2] = LOG10_TABLE_HI[i] as number;
  TABLE[4 * i + 3] = LOG10_TABLE_LO[i] as number;
}
/** Added to an interval's index, carries into bit 7 (value 1) exactly for the intervals whose significand is halved. */
const HALVED_CARRY = 128 - LOG10_TABLE_SPLIT;
/** Taylor coefficients of log1p(r) = r − r²/2 + r³/3 − … from r³ on; |r| ≤ 2^-7, so the first term left out, r⁹/9, is below 2^-56·|r|. */
const C3 = 1 / 3;
const C4 = -1 / 4;
const C5 = 1 / 5;
const C6 = -1 / 6;
const C7 = 1 / 7;
const C8 = -1 / 8;

/**
 * `values[k] = log10(values[k])` for every k: the base-10 logarithms of Monte Carlo draws, within
 * 1.55 ulp of the true value as {@link log10} is (on the correctly rounded references of
 * test/core/math/correctlyRounded.test.ts: 0.88 and 1.52 ulp at worst, the latter next to 1 from
 * below; log10 1.46 and 1.57), by a table instead of fdlibm's division and longer polynomial:
 * about a quarter faster (7.4–7.9 against 9.7–10.8 ns per value). It need not equal log10 bit for bit (the nominal values use log10, the draws
 * this); it is the same in every engine, as it uses only IEEE arithmetic.
 *
 * For x = 2^k·m, with m in [0.707, 1.414) (the significand, halved above √2): the top 7 bits of
 * the significand pick an interval with centre c (log10Table.ts, from a correctly rounded
 * reference), r = (m − c)/c is formed as (m − c)·(1/c) (m − c is exact: m and c are close doubles
 * of one binade), and log10(x) = k·log10(2) + log10(c) + log1p(r)/ln 10, with log1p by its series
 * to r⁸. k·log10(2)'s high part (fdlibm's, 40 bits) times k is exact, and the rounding error of
 * adding log10(c) to it is kept (Fast2Sum) and added back with the low parts. Near x = 1 the
 * centre is 1 itself, so the result there is the small series term alone, with no cancellation.
 * Zero, subnormal, negative, infinite and NaN values go to log10.
 */
export function log10InPlace(values: Float64Array): void {
  const n = values.length;
  const words = new Int32Array(values.buffer, values.byteOffset, 2 * n);
  for (let q = 0; q < n; q++) {
    const x = values[q] as number;
    const hx = words[2 * q + 1] as number;
    // Normal and positive: 0x00100000 ≤ hx < 0x7ff00000 (a negative x has a negative hx).
    if ((hx - 0x00100000) >>> 0 >= 0x7fe00000) {
      values[q] = log10(x);
      continue;
    }
    const i = (hx >> 13) & 127;
    const k = (hx >> 20) - 1023 + ((i + HALVED_CARRY) >> 7);
    const m = x * (POW2[1074 - k] as number);
    const r = (m - (TABLE[4 * i] as number)) * (TABLE[4 * i + 1] as number);
    const p = r * r * (-0.5 + r * (C3 + r * (C4 + r * (C5 + r * (C6 + r * (C7 + r * C8))))));
    const t = k * LOG10_2HI;
    const hi = TABLE[4 * i + 2] as number;
    const s = t + hi;
    // |t| ≥ log10 2 > |hi| unless k = 0 (then t = 0 and s = hi): (t − s) + hi is s's rounding error.
    const e = t - s + hi;
    values[q] = s + (k * LOG10_2LO + (TABLE[4 * i + 3] as number) + e + (r + p) * IVLN10);
  }
}
