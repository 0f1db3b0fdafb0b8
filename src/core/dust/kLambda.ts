import type { DustCurveId } from '../derive/types.ts';
import { CALZETTI00, calzetti00K } from './calzetti00.ts';
import { CCM89, ccm89K } from './ccm89.ts';
import type { DustCurveInfo } from './dustCurve.ts';
import { SMC_GORDON03, smcGordon03K } from './smcGordon03.ts';

/** The dust curves by id, each with its R_V, range and reference. */
export const DUST_CURVES: Readonly<Record<DustCurveId, DustCurveInfo>> = {
  calzetti00: CALZETTI00,
  ccm89: CCM89,
  smc: SMC_GORDON03,
};

const K_FUNCTIONS: Readonly<Record<DustCurveId, (lambdaAngstrom: number) => number>> = {
  calzetti00: calzetti00K,
  ccm89: ccm89K,
  smc: smcGordon03K,
};

/**
 * The curve record for an id; throws a one-line error naming the unknown id.
 * @param curve - 'calzetti00' | 'ccm89' | 'smc'.
 */
export function getDustCurve(curve: DustCurveId): DustCurveInfo {
  const c = DUST_CURVES[curve];
  if (!c) throw new Error(`unknown dust curve '${String(curve)}' (known: ${Object.keys(DUST_CURVES).join(', ')})`);
  return c;
}

/**
 * k(λ) = A_λ / E(B−V) of a curve (dimensionless).
 * @param curve - 'calzetti00' (R_V 4.05) | 'ccm89' (R_V 3.1) | 'smc' (R_V 2.74).
 * @param lambdaAngstrom - rest wavelength, Å, inside the curve's range (RangeError outside).
 */
export function kLambda(curve: DustCurveId, lambdaAngstrom: number): number {
  getDustCurve(curve);
  return K_FUNCTIONS[curve](lambdaAngstrom);
}

/**
 * Attenuation at λ for a given V-band attenuation: A_λ = A_V · k(λ) / R_V, mag.
 * @param curve - dust curve id.
 * @param lambdaAngstrom - rest wavelength, Å.
 * @param av - A_V, mag (0 gives 0).
 */
export function attenuationMag(curve: DustCurveId, lambdaAngstrom: number, av: number): number {
  return (av * kLambda(curve, lambdaAngstrom)) / getDustCurve(curve).rv;
}
