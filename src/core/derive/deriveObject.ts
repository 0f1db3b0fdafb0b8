import type { DeriveSettings, DerivedObject, LimitMarks, LineId, ObjectInputs, Percentiles } from './types.ts';
import { PLAUSIBLE } from './plausibleRanges.ts';
import { drawCount } from './drawCount.ts';
import type { Rng } from '../random/rng.ts';
import { isDrawBank, ReusableDrawBank, type DrawBank } from '../random/drawBank.ts';
import { PercentileMemo } from '../random/percentileMemo.ts';
import { logL5100FromLogLHalpha, logL5100FromLogLHbeta, inCalibrationRange } from '../virial/index.ts';
import { inLocalRelationRange } from '../local/localRelation.ts';
import { lambdaRequired, logSeedMassRequired } from '../growth/salpeterGrowth.ts';
import { planObject, type LumSource } from './objectPlan.ts';
import { createBuffers, evaluateChain, sampleInputs, OUT, type ChainBuffers } from './evaluateChain.ts';
import { log10 } from '../math/index.ts';
import { countPositive } from './countPositive.ts';

/** Working arrays, reused across objects: one sample for the nominal values, `draws` for the Monte Carlo. */
const nominalBuffers = createBuffers(1);
let drawBuffers: ChainBuffers = createBuffers(0);
/** The deviates of the object being derived, when the caller passes its random stream. */
const ownBank = new ReusableDrawBank();
/** Percentiles per output slot, shared by the readings of one object (the bank and its generation). */
const memos = Array.from({ length: 5 }, () => new PercentileMemo());
let memoBank: DrawBank | null = null;
let memoGeneration = -1;

/** Slack, dex, when testing that a nominal value lies in its interval (rounding of the linear L_bol form). */
const INTERVAL_TOL = 1e-9;
/** Fewest draws at which a nominal value outside its 16–84 % interval is taken as implausible. */
export const MIN_DRAWS_INTERVAL_CHECK = 100;

const finiteOrNull = (x: number): number | null => (Number.isFinite(x) ? x : null);

/**
 * Derives one object's physical quantities with Monte Carlo uncertainties.
 *
 * The plain values are nominal: the chain evaluated at the central inputs with no noise.
 * The percentiles come from `settings.draws` draws of every measurement (split normals for
 * asymmetric errors, positive quantities truncated at zero) plus each virial calibration's
 * intrinsic scatter; upper-limit fluxes stay at their limit, and a quantity resting on one is
 * a bound (`isLimit`, with no percentiles and no probability). P(λ_Edd > 1) is a fraction of the
 * draws. "Above the local relation" means above a local black hole of the same host quantity:
 * `local_offset_sigma` divides the nominal offset by the relation's intrinsic scatter and the
 * draws' half 16–84 width in quadrature, and P(above) counts draws of offset + N(0, intrinsic
 * scatter) above zero, so the two agree. A value outside physical bounds (see plausibleRanges.ts)
 * or outside its own 16–84 % interval (with at least 100 draws) is null and flagged `implausible`,
 * with what rests on it.
 *
 * The randomness is the caller's: the catalog build seeds the object's stream from (global
 * seed, object id) so results do not depend on row order or thread count. Given a stream, the
 * object's deviates are drawn from it role by role (see DrawBank); given a DrawBank (the
 * readings pass one per object), its deviates are used, so derivations of one object under
 * several readings share them and give exactly what each would give alone from the same stream.
 * @param inputs - validated inputs in canonical units (see types.ts).
 * @param settings - calibrations, cosmology, constants and Monte Carlo settings.
 * @param random - the object's random stream, or its bank of deviates with `settings.draws` per role.
 */
export function deriveObject(inputs: ObjectInputs, settings: DeriveSettings, random: Rng | DrawBank): DerivedObject {
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

  const draws = drawCount(settings);
  const bank = isDrawBank(random) ? random : ownBank.reset(random, draws);
  if (bank.n !== draws) throw new RangeError(`the bank holds ${bank.n} draws per role, the settings ask for ${draws}`);
  if (bank !== memoBank || bank.generation !== memoGeneration) {
    for (const m of memos) m.clear();
    memoBank = bank;
    memoGeneration = bank.generation;
  }
  if (drawBuffers.n !== draws) drawBuffers = createBuffers(draws);
  const db = drawBuffers;
  sampleInputs(plan, settings, bank, db);
  evaluateChain(plan, settings, db, false);
  const [dMbh, dLbol, dEdd, , dDelta] = db.out as [Float64Array, Float64Array, Float64Array, Float64Array, Float64Array];
  const localScatter = db.localScatter;
  // Above a local black hole of the same host quantity: the relation's intrinsic scatter is
  // part of the comparison, as in local_offset_sigma.
  const superEdd = countPositive(dEdd, null);
  const above = countPositive(dDelta, localScatter);

  // Bounds: a quantity resting on an upper-limit flux is a limit; its Monte Carlo spread
  // (the limit held fixed) is not an interval, and a probability of it is not defined.
  const eddUnconstrained = flags.has('edd_ratio_unconstrained');
  const isLimit: LimitMarks = {
    logMbh: flags.has('mbh_upper_limit'),
    logLbol: flags.has('lbol_upper_limit'),
    logEddRatio: flags.has('edd_ratio_upper_limit') || flags.has('edd_ratio_lower_limit'),
    logMseed: flags.has('mbh_upper_limit'),
    lambdaReq: flags.has('mbh_upper_limit'),
    deltaLogMbhLocal: flags.has('mbh_upper_limit'),
  };
  const pct = (slot: number, values: Float64Array, limit: boolean): Percentiles | null =>
    !limit && Number.isFinite(nominal(slot)) ? (memos[slot] as PercentileMemo).percentiles(values) : null;

  let logMbh = finiteOrNull(nominal(OUT.logMbh));
  let pMbh = pct(OUT.logMbh, dMbh, isLimit.logMbh);
  let logLbol = finiteOrNull(nominal(OUT.logLbol));
  let pLbol = pct(OUT.logLbol, dLbol, isLimit.logLbol);
  let logEddRatio = eddUnconstrained ? null : finiteOrNull(nominal(OUT.logEddRatio));
  let pEdd = eddUnconstrained ? null : pct(OUT.logEddRatio, dEdd, isLimit.logEddRatio);
  let delta = finiteOrNull(nominal(OUT.deltaLocal));
  let pDelta = pct(OUT.deltaLocal, dDelta, isLimit.deltaLogMbhLocal);

  // Physical plausibility: a value outside physical bounds, or outside its own 16–84 % interval,
  // is not written; the values built on it go with it.
  // The interval test needs enough draws for the interval itself to be sure: with 16 draws the
  // sample 16th percentile lies above the true median 0.2 % of the time; with 100, 1e-13.
  const checkInterval = draws >= MIN_DRAWS_INTERVAL_CHECK;
  const outside = (v: number | null, p: Percentiles | null, lo: number, hi: number): boolean =>
    v !== null && (v < lo || v > hi || (checkInterval && p !== null && (v < p.p16 - INTERVAL_TOL || v > p.p84 + INTERVAL_TOL)));
  if (outside(logMbh, pMbh, PLAUSIBLE.logMbh[0], PLAUSIBLE.logMbh[1])) {
    flags.add('implausible');
    logMbh = null;
    pMbh = null;
  }
  if (outside(logLbol, pLbol, PLAUSIBLE.logLbol[0], PLAUSIBLE.logLbol[1])) {
    flags.add('implausible');
    logLbol = null;
    pLbol = null;
  }
  if (logMbh === null || logLbol === null || outside(logEddRatio, pEdd, -Infinity, Infinity)) {
    if (logEddRatio !== null && logMbh !== null && logLbol !== null) flags.add('implausible');
    logEddRatio = null;
    pEdd = null;
  }
  if (logMbh === null || outside(delta, pDelta, -Infinity, Infinity)) {
    if (delta !== null && logMbh !== null) flags.add('implausible');
    delta = null;
    pDelta = null;
  }

  // The required seed mass is log M minus a constant for the object (its e-folds), a monotone
  // map, so its percentiles are the mass percentiles mapped through it: no second selection.
  const toSeed = (logM: number): number =>
    logSeedMassRequired(logM, plan.dtSeedGyr, settings.efficiency, settings.lambdaSeed, settings.dutyCycle);
  const logMseed = logMbh !== null ? finiteOrNull(nominal(OUT.logMseed)) : null;
  const pMseed = pMbh && logMseed !== null ? { p16: toSeed(pMbh.p16), p50: toSeed(pMbh.p50), p84: toSeed(pMbh.p84) } : null;

  const seedOk = logMbh !== null && !Number.isNaN(plan.dtSeedGyr);
  const lamReq = (seedMsun: number): number | null =>
    seedOk ? finiteOrNull(lambdaRequired(logMbh as number, log10(seedMsun), plan.dtSeedGyr, settings.efficiency, settings.dutyCycle)) : null;
  let localOffsetSigma: number | null = null;
  if (delta !== null && plan.local) {
    // Measurement half-width of the offset: from the draws, or for a bound (no interval) none.
    const half = pDelta ? (pDelta.p84 - pDelta.p16) / 2 : 0;
    localOffsetSigma = delta / Math.hypot(plan.local.rel.scatterDex, half);
  }

  return {
    ageGyr: plan.ageGyr,
    dlMpc: plan.dlMpc,
    logLum,
    logL5100: logL5100 !== null ? finiteOrNull(logL5100) : null,
    logMbh,
    mbhMethod: plan.mass ? plan.mass.cal.id : null,
    logLbol,
    lbolMethod: plan.lbol ? plan.lbol.label : null,
    logEddRatio,
    pSuperEddington: logEddRatio !== null && !isLimit.logEddRatio ? superEdd / draws : null,
    logMseed,
    lambdaReqLight: lamReq(settings.lightSeedMsun),
    lambdaReqHeavy: lamReq(settings.heavySeedMsun),
    deltaLogMbhLocal: delta,
    localOffsetSigma,
    pAboveLocal: delta !== null && !isLimit.deltaLogMbhLocal ? above / draws : null,
    pct: {
      logMbh: pMbh,
      logLbol: pLbol,
      logEddRatio: pEdd,
      logMseed: pMseed,
      deltaLogMbhLocal: pDelta,
    },
    isLimit: {
      logMbh: isLimit.logMbh && logMbh !== null,
      logLbol: isLimit.logLbol && logLbol !== null,
      logEddRatio: isLimit.logEddRatio && logEddRatio !== null,
      logMseed: isLimit.logMseed && logMseed !== null,
      lambdaReq: isLimit.lambdaReq && seedOk,
      deltaLogMbhLocal: isLimit.deltaLogMbhLocal && delta !== null,
    },
    flags: [...flags].sort(),
  };
}

