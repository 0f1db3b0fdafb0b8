import type { DeriveSettings } from './types.ts';
import type { LumSource, ObjectPlan } from './objectPlan.ts';
import type { Rng } from '../random/rng.ts';
import { standardNormal } from '../random/standardNormal.ts';
import { ebvFromBalmerDecrement } from '../dust/balmerDecrement.ts';
import { virialLogMass } from '../virial/virialCalibration.ts';
import { logL5100FromLogLHbeta } from '../virial/lineContinuumRelations.ts';
import { logLbolFromHalpha } from '../bolometric/logLbolFromHalpha.ts';
import { logLbolFromContinuum } from '../bolometric/logLbolFromContinuum.ts';
import { logSeedMassRequired } from '../growth/salpeterGrowth.ts';
import { localLogMbh } from '../local/localRelation.ts';
import { drawMeasured, drawPositive } from './drawPositive.ts';

/** Slots of the chain's output vector. */
export const OUT = { logMbh: 0, logLbol: 1, logEddRatio: 2, logMseed: 3, deltaLocal: 4 } as const;
export const OUT_SIZE = 5;

/**
 * Scratch state of one evaluation, reused across draws so the Monte Carlo loop allocates
 * nothing: the corrected log luminosity of each source (NaN where not evaluated).
 */
export interface ChainScratch {
  logL: Float64Array;
  /** log10 of the Eddington luminosity per solar mass. */
  logEddPerMsun: number;
  /**
   * The L_bol route as log L_bol = lbolA + lbolB · log L. Every bolometric method here is a
   * power law in L (fixed corrections, Netzer 2019's c·L^d, Greene & Ho 2005 eq. 1 inverted
   * times BC5100), hence linear in log L; the draws use this form and skip three log10 calls.
   * NaN when the route is not linear (checked at a third point), so the draws call the route.
   */
  lbolA: number;
  lbolB: number;
}

export function createScratch(plan: ObjectPlan, settings: DeriveSettings): ChainScratch {
  let lbolA = NaN;
  let lbolB = NaN;
  if (plan.lbol) {
    const f0 = lbolRoute(plan, settings, 40);
    const f1 = lbolRoute(plan, settings, 41);
    if (Math.abs(f0 + 5 * (f1 - f0) - lbolRoute(plan, settings, 45)) < 1e-9) {
      lbolB = f1 - f0;
      lbolA = f0 - 40 * lbolB;
    }
  }
  return { logL: new Float64Array(plan.sources.length).fill(NaN), logEddPerMsun: Math.log10(settings.eddingtonPerMsun), lbolA, lbolB };
}

/** log10 L_bol from the corrected log10 luminosity of the plan's bolometric source. */
function lbolRoute(plan: ObjectPlan, settings: DeriveSettings, logL: number): number {
  const lbol = plan.lbol;
  if (!lbol) return NaN;
  return lbol.route === 'halpha'
    ? logLbolFromHalpha(logL, settings.bc5100)
    : logLbolFromContinuum(lbol.route, logL, { band: lbol.band, bc5100: settings.bc5100 });
}

/**
 * One pass through the derivation chain: magnification and dust corrections, virial mass,
 * bolometric luminosity, Eddington ratio, required seed mass and offset from the local
 * relation. With `rng = null` it uses the central inputs and no scatter (the nominal value);
 * with an rng it is one Monte Carlo draw, including the calibration's intrinsic scatter.
 * Upper-limit fluxes are held at their limit. Writes log10 values into `out` (slots in OUT;
 * NaN where the quantity has no route) and the corrected luminosities into `scratch.logL`.
 */
export function evaluateChain(
  plan: ObjectPlan,
  settings: DeriveSettings,
  rng: Rng | null,
  scratch: ChainScratch,
  out: Float64Array,
  onlyUsed = true,
): void {
  const logMu = plan.mu ? Math.log10(rng ? drawPositive(rng, plan.mu) : plan.mu.value) : 0;
  let ebv = 0;
  const dust = plan.dust;
  if (dust.mode === 'av') ebv = Math.max(0, rng ? drawMeasured(rng, dust.m) : dust.m.value) / dust.rv;
  else if (dust.mode === 'decrement') {
    const ratio = rng ? drawPositive(rng, dust.m) : dust.m.value;
    ebv = ebvFromBalmerDecrement(ratio, settings.dustCurve, settings.intrinsicBalmer);
  }

  const logL = scratch.logL;
  const n = onlyUsed ? plan.used.length : plan.sources.length;
  for (let j = 0; j < n; j++) {
    const i = onlyUsed ? (plan.used[j] as number) : j;
    const s = plan.sources[i] as LumSource;
    const obs = rng && !s.isLimit ? drawPositive(rng, s.m) : s.m.value;
    logL[i] = Math.log10(obs) + (s.isFlux ? plan.logFourPiDl2 : 0) - logMu + 0.4 * s.dustK * ebv;
  }

  let logM = NaN;
  const mass = plan.mass;
  if (mass) {
    const logFwhm = Math.log10(rng ? drawPositive(rng, mass.fwhm) : mass.fwhm.value);
    const l = logL[mass.source] as number;
    logM = virialLogMass(mass.cal, mass.l5100FromHbeta ? logL5100FromLogLHbeta(l) : l, logFwhm);
    if (rng) logM += mass.cal.scatterDex * standardNormal(rng);
  }

  let logLbol = NaN;
  if (plan.lbol) {
    const l = logL[plan.lbol.source] as number;
    logLbol = rng && !Number.isNaN(scratch.lbolB) ? scratch.lbolA + scratch.lbolB * l : lbolRoute(plan, settings, l);
  }

  out[OUT.logMbh] = logM;
  out[OUT.logLbol] = logLbol;
  out[OUT.logEddRatio] = logLbol - scratch.logEddPerMsun - logM;
  // The seed mass is a monotone map of log M: the draws need only the nominal value (deriveObject maps the percentiles).
  out[OUT.logMseed] =
    rng || Number.isNaN(plan.dtSeedGyr)
      ? NaN
      : logSeedMassRequired(logM, plan.dtSeedGyr, settings.efficiency, settings.lambdaSeed, settings.dutyCycle);

  let delta = NaN;
  const local = plan.local;
  if (local) {
    const x = local.xIsSigma
      ? Math.log10(rng ? drawPositive(rng, local.x) : local.x.value)
      : rng
        ? drawMeasured(rng, local.x)
        : local.x.value;
    delta = logM - localLogMbh(local.rel, x);
  }
  out[OUT.deltaLocal] = delta;
}
