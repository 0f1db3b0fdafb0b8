import type { Cosmology } from '../cosmology/cosmology.ts';
import { MPC_CM } from '../constants/physical.ts';
import { lineWavelengthAngstrom } from '../dust/lineWavelengths.ts';
import type { LineId } from '../derive/types.ts';
import { logLHalphaFromLogL5100, logLHbetaFromLogL5100 } from '../virial/lineContinuumRelations.ts';
import type { VirialCalibration } from '../virial/virialCalibration.ts';
import type { EddingtonRatioDistribution } from './eddingtonRatioDistribution.ts';
import { fluxLimitAt } from './fluxLimitAt.ts';
import { bivariateNormalCdf } from './bivariateNormalCdf.ts';
import { lineRedshiftWindow } from './lineRedshiftWindow.ts';
import { normalCdf } from './normalCdf.ts';
import type { FluxLimit } from './surveySpec.ts';

/** The derivation's recipe run backwards: what the forward model needs to turn (M_BH, λ_Edd) into a line flux and width. */
export interface ForwardRecipe {
  readonly line: LineId;
  /** The virial calibration of that line (luminosity 'line' or 'l5100'). */
  readonly calibration: VirialCalibration;
  /** Fixed bolometric correction at 5100 Å. */
  readonly bc5100: number;
  /** Eddington luminosity per solar mass, erg s⁻¹. */
  readonly eddingtonPerMsun: number;
}

/** The selection a detection passes: the line inside the spectrograph, the flux limit, the width cut. */
export interface DetectionCriteria {
  readonly limit: FluxLimit;
  readonly lamObsRangeAngstrom: readonly [number, number];
  readonly minFwhmKms: number;
}

/**
 * The forward chain at one (log M_BH, log λ_Edd, z): log L_bol = log λ + log(L_Edd/M_sun) + log M;
 * λL5100 = L_bol / BC5100; the line from Greene & Ho 2005 eqs. 1–2; the flux at the luminosity
 * distance; the FWHM from the calibration inverted at the virial mass `logMvir`.
 * @returns log10 flux (erg s⁻¹ cm⁻²) and log10 FWHM (km s⁻¹).
 */
export function forwardObservables(r: ForwardRecipe, logMbh: number, logMvir: number, logLambda: number, z: number, dlMpc: number): { logFlux: number; logFwhm: number } {
  const logLbol = logLambda + Math.log10(r.eddingtonPerMsun) + logMbh;
  const logL5100 = logLbol - Math.log10(r.bc5100);
  let logLine: number;
  if (r.line === 'halpha') logLine = logLHalphaFromLogL5100(logL5100);
  else if (r.line === 'hbeta') logLine = logLHbetaFromLogL5100(logL5100);
  else throw new RangeError(`the selection model covers Hα and Hβ detections, not ${r.line}`);
  const cal = r.calibration;
  let logLcal: number;
  if (cal.luminosity === 'line') logLcal = logLine;
  else if (cal.luminosity === 'l5100') logLcal = logL5100;
  else throw new RangeError(`the selection model needs a calibration on the line or λL5100, not ${cal.id}`);
  const dlCm = dlMpc * MPC_CM;
  const logFlux = logLine - Math.log10(4 * Math.PI * dlCm * dlCm);
  const logFwhm = 3 + (logMvir - cal.logEps - cal.a - cal.b * (logLcal - cal.logLpivot)) / cal.c;
  void z;
  return { logFlux, logFwhm };
}

/**
 * The survey's criteria at one redshift as linear conditions on (log M_BH, log M_vir, log λ_Edd): the flux
 * criterion A = a0 + aM·M + aL·ℓ ≥ 0 and the width criterion B = b0 + bM·M + bU·u + bL·ℓ ≥ 0, with M the true
 * mass, u the virial mass (true mass plus the calibration's scatter) and ℓ = log λ_Edd. The chain is linear in
 * these logs, so the coefficients come from evaluations at unit steps. `possible` is false where the line
 * falls outside the spectrograph or the limit table.
 */
export interface DetectionLinear {
  readonly possible: boolean;
  readonly a0: number; readonly aM: number; readonly aL: number;
  readonly b0: number; readonly bM: number; readonly bU: number; readonly bL: number;
  /** No width criterion (minimum FWHM 0): B is ignored. */
  readonly noWidthCut: boolean;
}

/**
 * The linear detection conditions of a site (see {@link DetectionLinear}).
 * @param cosmo - the cosmology.
 * @param recipe - the recipe run backwards.
 * @param crit - the field's criteria for the line.
 * @param z - redshift.
 */
export function detectionLinear(cosmo: Cosmology, recipe: ForwardRecipe, crit: DetectionCriteria, z: number): DetectionLinear {
  const w = lineRedshiftWindow(recipe.line, crit.lamObsRangeAngstrom);
  const lim = fluxLimitAt(crit.limit, lineWavelengthAngstrom(recipe.line) * (1 + z));
  const possible = !!w && z >= w.zMin && z <= w.zMax && Number.isFinite(lim) && lim > 0;
  const dl = cosmo.luminosityDistanceMpc(z);
  const o = forwardObservables(recipe, 0, 0, 0, z, dl);
  const m = forwardObservables(recipe, 1, 0, 0, z, dl);
  const u = forwardObservables(recipe, 0, 1, 0, z, dl);
  const l = forwardObservables(recipe, 0, 0, 1, z, dl);
  const logLim = possible ? Math.log10(lim) : 0;
  const logFmin = crit.minFwhmKms > 0 ? Math.log10(crit.minFwhmKms) : -Infinity;
  return {
    possible,
    a0: o.logFlux - logLim, aM: m.logFlux - o.logFlux, aL: l.logFlux - o.logFlux,
    b0: o.logFwhm - logFmin, bM: m.logFwhm - o.logFwhm, bU: u.logFwhm - o.logFwhm, bL: l.logFwhm - o.logFwhm,
    noWidthCut: !(crit.minFwhmKms > 0),
  };
}

/** A Gaussian belief about (true mass M, virial mass u): means, variances and covariance (dex, dex²). */
export interface MassBelief {
  readonly mM: number; readonly mU: number;
  readonly vM: number; readonly vU: number; readonly cMU: number;
}

/** Means, standard deviations and correlation of the two criteria under a mass belief and the Eddington-ratio distribution. */
export function criteriaMoments(lin: DetectionLinear, erdf: EddingtonRatioDistribution, b: MassBelief): { hA: number; hB: number; rho: number } {
  const sl2 = erdf.sigmaLog * erdf.sigmaLog;
  const mA = lin.a0 + lin.aM * b.mM + lin.aL * erdf.meanLog;
  const vA = lin.aM * lin.aM * b.vM + lin.aL * lin.aL * sl2;
  const mB = lin.b0 + lin.bM * b.mM + lin.bU * b.mU + lin.bL * erdf.meanLog;
  const vB = lin.bM * lin.bM * b.vM + lin.bU * lin.bU * b.vU + 2 * lin.bM * lin.bU * b.cMU + lin.bL * lin.bL * sl2;
  const cAB = lin.aM * (lin.bM * b.vM + lin.bU * b.cMU) + lin.aL * lin.bL * sl2;
  const sA = Math.sqrt(vA);
  const sB = Math.sqrt(vB);
  return { hA: mA / sA, hB: mB / sB, rho: cAB / (sA * sB) };
}

/**
 * Probability that an object whose (true, virial) masses follow a Gaussian belief, with λ_Edd from the assumed
 * distribution, passes both criteria: P(A ≥ 0, B ≥ 0) = Φ₂(E[A]/sd A, E[B]/sd B; corr(A, B)), exact for the
 * linear chain.
 * @param cosmo - the cosmology.
 * @param recipe - the recipe run backwards.
 * @param crit - the field's criteria for the line.
 * @param erdf - the Eddington-ratio distribution.
 * @param logMbh - log10 true M_BH, M_sun (a point: the virial mass scatters about it by the calibration's scatter).
 * @param z - redshift.
 */
export function detectionProbability(
  cosmo: Cosmology, recipe: ForwardRecipe, crit: DetectionCriteria, erdf: EddingtonRatioDistribution, logMbh: number, z: number,
): number {
  const lin = detectionLinear(cosmo, recipe, crit, z);
  if (!lin.possible) return 0;
  const sc2 = recipe.calibration.scatterDex ** 2;
  const mo = criteriaMoments(lin, erdf, { mM: logMbh, mU: logMbh, vM: 0, vU: sc2, cMU: 0 });
  if (lin.noWidthCut) return normalCdf(mo.hA);
  return bivariateNormalCdf(mo.hA, mo.hB, mo.rho);
}
