import type { Cosmology } from '../cosmology/cosmology.ts';
import { comovingVolumeMpc3Sr } from './comovingVolume.ts';
import { detectableIntervals, type DetectionLine } from './detectableIntervals.ts';
import { fluxLimitAt } from './fluxLimitAt.ts';
import { lineRedshiftWindow } from './lineRedshiftWindow.ts';
import { lineWavelengthAngstrom } from '../dust/lineWavelengths.ts';
import { fieldSolidAngleSr, type SurveySpec } from './surveySpec.ts';

/** An object's maximum volume, and whether it passes its own field's threshold. */
export interface VmaxResult {
  /** V_max, comoving Mpc³ (null when the object is below its own field's threshold). */
  readonly vmaxCmpc3: number | null;
  /** Comoving volume from the window's start to the object's own redshift over the same fields, Mpc³ (for V/V_max). */
  readonly vCmpc3: number | null;
  /** The object would not have been selected by the survey as described. */
  readonly belowLimit: boolean;
}

/**
 * The maximum comoving volume in which an object would have entered the sample (Schmidt 1968,
 * ApJ 151, 393), summed over the survey's fields (each with its own area and limit, the
 * coherent combination of Avni & Bahcall 1980, ApJ 235, 694): V_max = Σ_f Ω_f ∫_{D_f} dV/dz dΩ dz,
 * with D_f the redshifts inside the line's spectrograph window where the object's observed flux
 * would pass the field's limit and the S/N criterion. The width criterion does not depend on
 * redshift, so it does not enter V_max; it decides only whether the object counts at all.
 * @param cosmo - the cosmology.
 * @param survey - the survey description.
 * @param obj - the object's detection line (observed flux before any correction).
 * @param ownField - index of the object's field in `survey.fields`.
 */
export function vmax(cosmo: Cosmology, survey: SurveySpec, obj: DetectionLine, ownField: number): VmaxResult {
  const window = lineRedshiftWindow(obj.line, survey.lamObsRangeAngstrom);
  const own = survey.fields[ownField];
  const ownLimit = own?.limits[obj.line];
  const none: VmaxResult = { vmaxCmpc3: null, vCmpc3: null, belowLimit: true };
  if (!window || !ownLimit || obj.z < window.zMin || obj.z > window.zMax) return none;
  const ownThreshold = Math.max(
    fluxLimitAt(ownLimit, lineWavelengthAngstrom(obj.line) * (1 + obj.z)),
    survey.minSnr * (obj.fluxErrCgs ?? 0),
  );
  if (!(obj.fluxObsCgs >= ownThreshold)) return none;
  let vmaxSum = 0;
  let vSum = 0;
  for (const field of survey.fields) {
    const limit = field.limits[obj.line];
    if (!limit) continue;
    const omega = fieldSolidAngleSr(field);
    for (const [a, b] of detectableIntervals(cosmo, obj, limit, window, survey.minSnr)) {
      vmaxSum += omega * comovingVolumeMpc3Sr(cosmo, a, b);
      if (a < obj.z) vSum += omega * comovingVolumeMpc3Sr(cosmo, a, Math.min(b, obj.z));
    }
  }
  return { vmaxCmpc3: vmaxSum, vCmpc3: vSum, belowLimit: false };
}
