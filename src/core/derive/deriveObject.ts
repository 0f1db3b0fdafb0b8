import type { DeriveSettings, DerivedObject, LineId, ObjectInputs, Percentiles } from './types.ts';
import type { Rng } from '../random/rng.ts';
import { percentiles16_50_84 } from '../random/percentiles.ts';
import { logL5100FromLogLHalpha, logL5100FromLogLHbeta, inCalibrationRange } from '../virial/index.ts';
import { inLocalRelationRange } from '../local/localRelation.ts';
import { lambdaRequired, logSeedMassRequired } from '../growth/salpeterGrowth.ts';
import { planObject, type LumSource } from './objectPlan.ts';
import { createBuffers, evaluateChain, sampleInputs, OUT, type ChainBuffers } from './evaluateChain.ts';

/** Working arrays, reused across objects: one sample for the nominal values, `draws` for the Monte Carlo. */
const nominalBuffers = createBuffers(1);
let drawBuffers: ChainBuffers = createBuffers(0);

const finiteOrNull = (x: number): number | null => (Number.isFinite(x) ? x : null);

/**
 * Derives one object's physical quantities with Monte Carlo uncertainties.
 *
 * The plain values are nominal: the chain evaluated at the central inputs with no noise.
 * The percentiles come from `settings.draws` draws of every measurement (split normals for
 * asymmetric errors, positive quantities truncated at zero) plus each virial calibration's
 * intrinsic scatter; upper-limit fluxes stay at their limit and the results are flagged as
 * limits. P(λ_Edd > 1) and P(above the local relation) are fractions of the draws.
 * `local_offset_sigma` divides the nominal offset by the local relation's intrinsic scatter
 * and the draws' half 16–84 width added in quadrature.
 *
 * The random stream is the caller's: the catalog build seeds it from (global seed, object
 * id) so results do not depend on row order or thread count.
 * @param inputs - validated inputs in canonical units (see types.ts).
 * @param settings - calibrations, cosmology, constants and Monte Carlo settings.
 * @param rng - the object's random source.
 */
export function deriveObject(inputs: ObjectInputs, settings: DeriveSettings, rng: Rng): DerivedObject {
  const plan = planObject(inputs, settings);
  const nb = nominalBuffers;
  sampleInputs(plan, settings, null, nb);
  evaluateChain(plan, settings, nb, true);
  const nominal = (slot: number): number => (nb.out[slot] as Float64Array)[0] as number;
  const corrected = (i: number): number => (nb.logL[i] as Float64Array)[0] as number;

  const logLum: Partial<Record<LineId, number>> = {};
  for (let i = 0; i < plan.sources.length; i++) {
    const s = plan.sources[i] as LumSource;
    if (s.key === 'halpha' || s.key === 'hbeta' || s.key === 'mgii' || s.key === 'civ') logLum[s.key] = corrected(i);
  }
  const cont5100 = plan.sources.findIndex((s) => s.key === 'l5100');
  const logL5100 =
    cont5100 >= 0
      ? corrected(cont5100)
      : logLum.halpha !== undefined
        ? logL5100FromLogLHalpha(logLum.halpha)
        : logLum.hbeta !== undefined
          ? logL5100FromLogLHbeta(logLum.hbeta)
          : null;

  const flags = plan.flags;
  if (plan.mass) {
    const l = corrected(plan.mass.source);
    const calL = plan.mass.l5100FromHbeta ? logL5100FromLogLHbeta(l) : l;
    if (!inCalibrationRange(plan.mass.cal, calL, plan.mass.fwhm.value)) flags.add('calibration_out_of_range');
  }
  if (plan.local) {
    if (!inLocalRelationRange(plan.local.rel, nb.x[0] as number)) flags.add('local_relation_extrapolated');
  }

  const draws = Math.max(1, Math.floor(settings.draws));
  if (drawBuffers.n !== draws) drawBuffers = createBuffers(draws);
  const db = drawBuffers;
  sampleInputs(plan, settings, rng, db);
  evaluateChain(plan, settings, db, false);
  const [dMbh, dLbol, dEdd, , dDelta] = db.out as [Float64Array, Float64Array, Float64Array, Float64Array, Float64Array];
  let superEdd = 0;
  let above = 0;
  for (let k = 0; k < draws; k++) {
    if ((dEdd[k] as number) > 0) superEdd++;
    if ((dDelta[k] as number) > 0) above++;
  }
  const pct = (slot: number, values: Float64Array): Percentiles | null =>
    Number.isFinite(nominal(slot)) ? percentiles16_50_84(values) : null;
  const pMbh = pct(OUT.logMbh, dMbh);
  // The required seed mass is log M minus a constant for the object (its e-folds), a monotone
  // map, so its percentiles are the mass percentiles mapped through it: no second selection.
  const toSeed = (logM: number): number =>
    logSeedMassRequired(logM, plan.dtSeedGyr, settings.efficiency, settings.lambdaSeed, settings.dutyCycle);
  const pMseed =
    pMbh && Number.isFinite(nominal(OUT.logMseed)) ? { p16: toSeed(pMbh.p16), p50: toSeed(pMbh.p50), p84: toSeed(pMbh.p84) } : null;

  const logMbh = finiteOrNull(nominal(OUT.logMbh));
  const logEddRatio = finiteOrNull(nominal(OUT.logEddRatio));
  const delta = finiteOrNull(nominal(OUT.deltaLocal));
  const pDelta = pct(OUT.deltaLocal, dDelta);
  const seedOk = logMbh !== null && !Number.isNaN(plan.dtSeedGyr);
  const lamReq = (seedMsun: number): number | null =>
    seedOk ? finiteOrNull(lambdaRequired(logMbh, Math.log10(seedMsun), plan.dtSeedGyr, settings.efficiency, settings.dutyCycle)) : null;
  let localOffsetSigma: number | null = null;
  if (delta !== null && pDelta && plan.local) {
    const half = (pDelta.p84 - pDelta.p16) / 2;
    localOffsetSigma = delta / Math.hypot(plan.local.rel.scatterDex, half);
  }

  return {
    ageGyr: plan.ageGyr,
    dlMpc: plan.dlMpc,
    logLum,
    logL5100: logL5100 !== null ? finiteOrNull(logL5100) : null,
    logMbh,
    mbhMethod: plan.mass ? plan.mass.cal.id : null,
    logLbol: finiteOrNull(nominal(OUT.logLbol)),
    lbolMethod: plan.lbol ? plan.lbol.label : null,
    logEddRatio,
    pSuperEddington: logEddRatio !== null ? superEdd / draws : null,
    logMseed: finiteOrNull(nominal(OUT.logMseed)),
    lambdaReqLight: lamReq(settings.lightSeedMsun),
    lambdaReqHeavy: lamReq(settings.heavySeedMsun),
    deltaLogMbhLocal: delta,
    localOffsetSigma,
    pAboveLocal: delta !== null ? above / draws : null,
    pct: {
      logMbh: pMbh,
      logLbol: pct(OUT.logLbol, dLbol),
      logEddRatio: pct(OUT.logEddRatio, dEdd),
      logMseed: pMseed,
      deltaLogMbhLocal: pDelta,
    },
    flags: [...flags].sort(),
  };
}
