import { assertInCurveRange, type DustCurveInfo } from './dustCurve.ts';
import { pow } from '../math/index.ts';

/**
 * The Cardelli, Clayton & Mathis 1989 Milky Way extinction law as data:
 * ⟨A(λ)/A(V)⟩ = a(x) + b(x)/R_V with x = 1/λ in µm⁻¹ (eq. 1), so k(λ) = a(x)·R_V + b(x).
 */
export interface Ccm89Curve extends DustCurveInfo {
  /** Infrared, 0.3 ≤ x < 1.1 µm⁻¹ (eq. 2): a = aScale·x^power, b = bScale·x^power. */
  readonly ir: { readonly xRange: readonly [number, number]; readonly aScale: number; readonly bScale: number; readonly power: number };
  /** Optical/NIR, 1.1 ≤ x < 3.3 µm⁻¹ (eq. 3): polynomials in y = x − yOffset, lowest order first. */
  readonly optical: {
    readonly xRange: readonly [number, number];
    readonly yOffset: number;
    readonly a: readonly number[];
    readonly b: readonly number[];
  };
  /**
   * Ultraviolet, 3.3 ≤ x ≤ 8 µm⁻¹ (eq. 4): a = a0 + a1·x + aBump/((x − aX0)² + aW) + Fa(x),
   * b likewise; Fa, Fb are cubic in (x − fX0) for x ≥ fX0 and zero below.
   */
  readonly uv: {
    readonly xRange: readonly [number, number];
    readonly a: { readonly c0: number; readonly c1: number; readonly bump: number; readonly x0: number; readonly w: number };
    readonly b: { readonly c0: number; readonly c1: number; readonly bump: number; readonly x0: number; readonly w: number };
    readonly fX0: number;
    /** [coefficient of (x−fX0)², coefficient of (x−fX0)³] */
    readonly fa: readonly [number, number];
    readonly fb: readonly [number, number];
  };
  /** Far-UV, 8 < x ≤ 10 µm⁻¹ (eq. 5): cubics in (x − x0), lowest order first. */
  readonly farUv: { readonly xRange: readonly [number, number]; readonly x0: number; readonly a: readonly number[]; readonly b: readonly number[] };
}

/** Cardelli, Clayton & Mathis 1989 (ApJ 345, 245), eqs. 1–5, with R_V = 3.1. */
export const CCM89: Ccm89Curve = {
  id: 'ccm89',
  label: 'Cardelli, Clayton & Mathis 1989 Milky Way, R_V = 3.1',
  rv: 3.1,
  validityAngstrom: [1000, 1e4 / 0.3],
  reference: 'Cardelli, Clayton & Mathis 1989, ApJ 345, 245, eqs. 1–5 (IR eq. 2, optical/NIR eq. 3, UV eq. 4, far-UV eq. 5)',
  notes: 'R_V = 3.1, the diffuse-ISM value. Coefficients as printed in eqs. 2–5 (the optical piece is the original CCM89 one, not O\'Donnell 1994).',
  ir: { xRange: [0.3, 1.1], aScale: 0.574, bScale: -0.527, power: 1.61 },
  optical: {
    xRange: [1.1, 3.3],
    yOffset: 1.82,
    a: [1, 0.17699, -0.50447, -0.02427, 0.72085, 0.01979, -0.7753, 0.32999],
    b: [0, 1.41338, 2.28305, 1.07233, -5.38434, -0.62251, 5.3026, -2.09002],
  },
  uv: {
    xRange: [3.3, 8],
    a: { c0: 1.752, c1: -0.316, bump: -0.104, x0: 4.67, w: 0.341 },
    b: { c0: -3.09, c1: 1.825, bump: 1.206, x0: 4.62, w: 0.263 },
    fX0: 5.9,
    fa: [-0.04473, -0.009779],
    fb: [0.213, 0.1207],
  },
  farUv: { xRange: [8, 10], x0: 8, a: [-1.073, -0.628, 0.137, -0.07], b: [13.67, 4.257, -0.42, 0.374] },
};

function poly(coefs: readonly number[], u: number): number {
  let s = 0;
  for (let i = coefs.length - 1; i >= 0; i--) s = s * u + (coefs[i] as number);
  return s;
}

/** a(x) and b(x) of CCM89 eq. 1 at wavenumber x, µm⁻¹ (0.3 ≤ x ≤ 10). */
export function ccm89AB(x: number): { a: number; b: number } {
  const c = CCM89;
  if (x < c.ir.xRange[1]) {
    const p = pow(x, c.ir.power);
    return { a: c.ir.aScale * p, b: c.ir.bScale * p };
  }
  if (x < c.optical.xRange[1]) {
    const y = x - c.optical.yOffset;
    return { a: poly(c.optical.a, y), b: poly(c.optical.b, y) };
  }
  if (x <= c.uv.xRange[1]) {
    const { a, b, fX0, fa, fb } = c.uv;
    const d = x - fX0;
    const fA = d > 0 ? fa[0] * d * d + fa[1] * d * d * d : 0;
    const fB = d > 0 ? fb[0] * d * d + fb[1] * d * d * d : 0;
    return {
      a: a.c0 + a.c1 * x + a.bump / ((x - a.x0) ** 2 + a.w) + fA,
      b: b.c0 + b.c1 * x + b.bump / ((x - b.x0) ** 2 + b.w) + fB,
    };
  }
  const u = x - c.farUv.x0;
  return { a: poly(c.farUv.a, u), b: poly(c.farUv.b, u) };
}

/**
 * CCM89 k(λ) = A_λ / E(B−V) = a(x)·R_V + b(x), R_V = 3.1 (dimensionless).
 * @param lambdaAngstrom - rest wavelength, Å, within 1000–33333 Å (throws RangeError outside).
 */
export function ccm89K(lambdaAngstrom: number): number {
  assertInCurveRange(CCM89, lambdaAngstrom);
  const { a, b } = ccm89AB(1e4 / lambdaAngstrom);
  return a * CCM89.rv + b;
}
