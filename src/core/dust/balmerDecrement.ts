import type { DustCurveId } from '../derive/types.ts';
import { getDustCurve, kLambda } from './kLambda.ts';
import { LINE_WAVELENGTHS } from './lineWavelengths.ts';
import { log10 } from '../math/index.ts';

/** An intrinsic Hα/Hβ ratio as a cited record. */
export interface IntrinsicBalmerRatio {
  /** Intrinsic F(Hα)/F(Hβ) (dimensionless). */
  readonly ratio: number;
  readonly conditions: string;
  readonly reference: string;
}

/** Case B recombination, T = 1e4 K, n_e = 100 cm⁻³: Hα/Hβ = 2.86. */
export const INTRINSIC_BALMER_CASE_B: IntrinsicBalmerRatio = {
  ratio: 2.86,
  conditions: 'case B, T_e = 1e4 K, n_e = 1e2 cm^-3',
  reference: 'Osterbrock & Ferland 2006, Astrophysics of Gaseous Nebulae and Active Galactic Nuclei, 2nd ed., Table 4.4',
};

/**
 * Colour excess from the broad Balmer decrement:
 * E(B−V) = 2.5 / (k(Hβ) − k(Hα)) · log10(observed / intrinsic), mag, with k evaluated at the
 * vacuum wavelengths of LINE_WAVELENGTHS.
 *
 * A decrement at or below the intrinsic value (including ≤ 0, which a Monte Carlo draw can
 * produce) returns exactly 0: no negative reddening. The caller decides whether to flag it
 * (test `observedRatio < intrinsic`). NaN in gives NaN out.
 * @param observedRatio - observed F(Hα)/F(Hβ) (dimensionless).
 * @param curve - dust curve id.
 * @param intrinsic - intrinsic ratio, > 0 (default 2.86, case B); throws RangeError otherwise.
 */
export function ebvFromBalmerDecrement(
  observedRatio: number,
  curve: DustCurveId,
  intrinsic: number = INTRINSIC_BALMER_CASE_B.ratio,
): number {
  if (!(intrinsic > 0)) throw new RangeError(`intrinsic Balmer decrement must be > 0, got ${intrinsic}`);
  if (Number.isNaN(observedRatio)) return NaN;
  if (observedRatio <= intrinsic) return 0;
  const dk = kLambda(curve, LINE_WAVELENGTHS.hbeta.vacuumAngstrom) - kLambda(curve, LINE_WAVELENGTHS.halpha.vacuumAngstrom);
  return (2.5 / dk) * log10(observedRatio / intrinsic);
}

/**
 * V-band attenuation from the broad Balmer decrement: A_V = R_V · E(B−V), mag, with the
 * curve's own R_V. Same clipping at 0 as ebvFromBalmerDecrement.
 * @param observedRatio - observed F(Hα)/F(Hβ).
 * @param curve - dust curve id.
 * @param intrinsic - intrinsic ratio (default 2.86).
 */
export function avFromBalmerDecrement(
  observedRatio: number,
  curve: DustCurveId,
  intrinsic: number = INTRINSIC_BALMER_CASE_B.ratio,
): number {
  return getDustCurve(curve).rv * ebvFromBalmerDecrement(observedRatio, curve, intrinsic);
}
