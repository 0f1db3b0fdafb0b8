import { assertInCurveRange, type DustCurveInfo } from './dustCurve.ts';

/** The Calzetti et al. 2000 starburst attenuation curve as data. */
export interface Calzetti00Curve extends DustCurveInfo {
  /** Overall factor of both pieces (2.659). */
  readonly scale: number;
  /** Polynomial in 1/λ (λ in µm), lowest order first, for 0.12 ≤ λ < `breakMicron`. */
  readonly shortPoly: readonly number[];
  /** Polynomial in 1/λ (λ in µm), lowest order first, for `breakMicron` ≤ λ ≤ 2.20. */
  readonly longPoly: readonly number[];
  /** Wavelength where the two pieces join, µm. */
  readonly breakMicron: number;
}

/**
 * Calzetti et al. 2000 (ApJ 533, 682), eq. 4, R'_V = 4.05:
 * k'(λ) = 2.659(−2.156 + 1.509/λ − 0.198/λ² + 0.011/λ³) + R'_V for 0.12–0.63 µm and
 * 2.659(−1.857 + 1.040/λ) + R'_V for 0.63–2.20 µm.
 */
export const CALZETTI00: Calzetti00Curve = {
  id: 'calzetti00',
  label: 'Calzetti et al. 2000 starburst, R_V = 4.05',
  rv: 4.05,
  validityAngstrom: [1200, 22000],
  reference: 'Calzetti et al. 2000, ApJ 533, 682, eq. 4 (R\'_V = 4.05, eq. 5)',
  notes:
    'Derived for the stellar continuum of starbursts; applied here to broad-line gas as is common practice. ' +
    'The two pieces differ by ~0.025 at 0.63 µm; λ < 0.63 µm uses the short-wavelength piece.',
  scale: 2.659,
  shortPoly: [-2.156, 1.509, -0.198, 0.011],
  longPoly: [-1.857, 1.04],
  breakMicron: 0.63,
};

/** Σ c_i u^i by Horner's rule. */
function poly(coefs: readonly number[], u: number): number {
  let s = 0;
  for (let i = coefs.length - 1; i >= 0; i--) s = s * u + (coefs[i] as number);
  return s;
}

/**
 * Calzetti et al. 2000 k(λ) = A_λ / E(B−V) (dimensionless).
 * @param lambdaAngstrom - rest wavelength, Å, within 1200–22000 Å (throws RangeError outside).
 */
export function calzetti00K(lambdaAngstrom: number): number {
  const c = CALZETTI00;
  assertInCurveRange(c, lambdaAngstrom);
  const micron = lambdaAngstrom / 1e4;
  const coefs = micron < c.breakMicron ? c.shortPoly : c.longPoly;
  return c.scale * poly(coefs, 1 / micron) + c.rv;
}
