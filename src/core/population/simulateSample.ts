import type { Cosmology } from '../cosmology/cosmology.ts';
import type { Rng } from '../random/rng.ts';
import { standardNormal } from '../random/standardNormal.ts';
import { forwardObservables, type ForwardRecipe } from './detectionModel.ts';
import type { EddingtonRatioDistribution } from './eddingtonRatioDistribution.ts';
import { fluxLimitAt } from './fluxLimitAt.ts';
import { lineRedshiftWindow } from './lineRedshiftWindow.ts';
import { comovingVolumeMpc3Sr } from './comovingVolume.ts';
import { lineWavelengthAngstrom } from '../dust/lineWavelengths.ts';
import { RELATION_PIVOT } from './relationLikelihood.ts';
import { schechterPerDex, stellarMassFunctionAt, type StellarMassFunction } from './stellarMassFunctions.ts';
import type { SurveySpec } from './surveySpec.ts';

/** The intrinsic population of the forward model. */
export interface IntrinsicPopulation {
  /** log M_BH = alpha + beta (log M* − 10) + N(0, sigma). */
  readonly alpha: number;
  readonly beta: number;
  readonly sigma: number;
  readonly erdf: EddingtonRatioDistribution;
  /** Stellar-mass range drawn, log M_sun. */
  readonly mStarRange: readonly [number, number];
}

/** One simulated detection, as a catalog would list it. */
export interface SimulatedObject {
  readonly z: number;
  readonly x: number;
  readonly ex: number;
  readonly y: number;
  readonly ey: number;
  /** The true values behind it. */
  readonly mTrue: number;
  readonly mbhTrue: number;
}

/**
 * Draws an intrinsic population in one field (hosts from the stellar mass function's shape, black holes about
 * the relation, Eddington ratios from the distribution, redshifts uniform in comoving volume across the line's
 * window), makes each object's line flux and width with the recipe run backwards (the calibration's scatter between
 * true and virial mass included), keeps those the survey would detect, and adds measurement errors.
 * @param n - intrinsic objects drawn.
 * @returns the detections and the fraction detected.
 */
export function simulateSample(
  cosmo: Cosmology, survey: SurveySpec, recipe: ForwardRecipe, pop: IntrinsicPopulation, n: number,
  errors: { ex: number; eyMeas: number }, rng: Rng, smfs?: readonly StellarMassFunction[],
): { objects: SimulatedObject[]; detectedFraction: number } {
  const field = survey.fields[0];
  const limit = field?.limits[recipe.line];
  const w = lineRedshiftWindow(recipe.line, survey.lamObsRangeAngstrom);
  if (!limit || !w) throw new RangeError('simulateSample: the first field must search the recipe\'s line inside the spectrograph range');
  const vLo = comovingVolumeMpc3Sr(cosmo, 0, w.zMin);
  const vHi = comovingVolumeMpc3Sr(cosmo, 0, w.zMax);
  const zOfU = (u: number): number => {
    const target = vLo + u * (vHi - vLo);
    let a = w.zMin;
    let b = w.zMax;
    for (let i = 0; i < 50; i++) {
      const m = 0.5 * (a + b);
      if (comovingVolumeMpc3Sr(cosmo, 0, m) < target) a = m; else b = m;
    }
    return 0.5 * (a + b);
  };
  const [m0, m1] = pop.mStarRange;
  const objects: SimulatedObject[] = [];
  const sigmaCal = recipe.calibration.scatterDex;
  const ey = Math.hypot(sigmaCal, errors.eyMeas);
  for (let i = 0; i < n; i++) {
    const z = zOfU(rng.next());
    const smf = stellarMassFunctionAt(z, smfs);
    const peak = schechterPerDex(smf, m0);
    let m: number;
    // Rejection sampling under the (decreasing over the range) Schechter shape.
    do m = m0 + (m1 - m0) * rng.next(); while (rng.next() * peak > schechterPerDex(smf, m));
    const mbh = pop.alpha + pop.beta * (m - RELATION_PIVOT) + pop.sigma * standardNormal(rng);
    const logLambda = pop.erdf.meanLog + pop.erdf.sigmaLog * standardNormal(rng);
    const mvir = mbh + sigmaCal * standardNormal(rng);
    const obs = forwardObservables(recipe, mbh, mvir, logLambda, z, cosmo.luminosityDistanceMpc(z));
    const lim = fluxLimitAt(limit, lineWavelengthAngstrom(recipe.line) * (1 + z));
    if (obs.logFlux < Math.log10(lim) || obs.logFwhm < Math.log10(survey.minFwhmKms)) continue;
    objects.push({
      z, x: m + errors.ex * standardNormal(rng), ex: errors.ex, y: mvir + errors.eyMeas * standardNormal(rng), ey, mTrue: m, mbhTrue: mbh,
    });
  }
  return { objects, detectedFraction: objects.length / n };
}
