import type { DeriveSettings, Measured } from './types.ts';
import type { LumSource, ObjectPlan } from './objectPlan.ts';
import type { DrawBank } from '../random/drawBank.ts';
import { DRAW_ROLES } from './drawRoles.ts';
import { ebvFromBalmerDecrement } from '../dust/balmerDecrement.ts';
import { virialLogMass, virialLogMassInto } from '../virial/virialCalibration.ts';
import { logL5100FromLogLHbeta } from '../virial/lineContinuumRelations.ts';
import { logLbolFromHalpha } from '../bolometric/logLbolFromHalpha.ts';
import { logLbolFromContinuum } from '../bolometric/logLbolFromContinuum.ts';
import { logLbolFixedBC } from '../bolometric/fixedCorrections.ts';
import { logSeedMassRequired } from '../growth/salpeterGrowth.ts';
import { localOffsetInto } from '../local/localRelation.ts';
import { drawFromBank } from './drawPositive.ts';
import { log10, log10InPlace } from '../math/index.ts';

/** DrawBank.derived kind of the log10 of a positive measurement's draws. */
const LOG10_OF_POSITIVE = 1;

/** Slots of the chain's outputs. */
export const OUT = { logMbh: 0, logLbol: 1, logEddRatio: 2, logMseed: 3, deltaLocal: 4 } as const;
export const OUT_SIZE = 5;
/** At most four lines and three continuum bands feed a chain. */
const MAX_SOURCES = 7;

/**
 * Working arrays of one evaluation over `n` samples (n = 1 for the nominal values, n = draws
 * for the Monte Carlo): the sampled inputs, then the outputs. Reused from object to object.
 */
export interface ChainBuffers {
  n: number;
  logMu: Float64Array;
  ebv: Float64Array;
  /** Per source of the plan: log10 of the sampled observed value, then (in place) the corrected log10 luminosity. */
  logL: Float64Array[];
  logFwhm: Float64Array;
  /** Host quantity of the local relation (log M*, or σ* then log σ*). */
  x: Float64Array;
  /** Intrinsic scatter of the virial calibration, dex (zeros for the nominal values). */
  scatter: Float64Array;
  /** Intrinsic scatter of the local relation, dex (zeros for the nominal values): a local black hole's place about the relation. */
  localScatter: Float64Array;
  /** Working space (the Hβ flux draws of a decrement formed from the line fluxes). */
  scratch: Float64Array;
  out: Float64Array[];
}

export function createBuffers(n: number): ChainBuffers {
  const a = () => new Float64Array(n);
  return {
    n,
    logMu: a(),
    ebv: a(),
    logL: Array.from({ length: MAX_SOURCES }, a),
    logFwhm: a(),
    x: a(),
    scatter: a(),
    localScatter: a(),
    scratch: a(),
    out: Array.from({ length: OUT_SIZE }, a),
  };
}

/**
 * Fills the input arrays: with draws of every measurement the chain uses (`bank` given; split
 * normals, positive quantities truncated at zero, upper-limit fluxes held at their limit, the
 * calibration's and the local relation's intrinsic scatter; a Balmer decrement formed from the
 * given Hα and Hβ fluxes is formed from each draw's fluxes), or with the central values and no
 * scatter (`bank` null: the nominal evaluation, which also fills every source, used or not, for
 * `log_lum_<line>`). Each measurement draws from the bank's deviates of its role (see
 * {@link DRAW_ROLES}), so the draws do not depend on which other inputs an object has, and every
 * reading of the object sees the same deviates.
 */
export function sampleInputs(plan: ObjectPlan, settings: DeriveSettings, bank: DrawBank | null, b: ChainBuffers): void {
  const draw = (role: string, m: Measured, out: Float64Array, positive: boolean) => {
    if (!bank) out.fill(m.value);
    else drawFromBank(bank, role, m, out, positive);
  };
  // log10 of a positive measurement's draws: made once per object and measurement, and shared
  // by every reading of the object that uses the same measurement (see DrawBank.derived).
  const drawLog = (role: string, m: Measured, out: Float64Array) => {
    if (!bank) {
      out.fill(log10(m.value));
      return;
    }
    const key = { value: m.value, errLo: m.errLo ?? -1, errHi: m.errHi ?? -1, kind: LOG10_OF_POSITIVE };
    out.set(
      bank.derived(role, key, (o) => {
        drawFromBank(bank, role, m, o, true);
        log10InPlace(o);
      }),
    );
  };
  if (plan.mu && !isExact(plan.mu)) drawLog(DRAW_ROLES.mu, plan.mu, b.logMu);
  else b.logMu.fill(plan.mu ? log10(plan.mu.value) : 0);

  const dust = plan.dust;
  if (dust.mode === 'av') {
    draw(DRAW_ROLES.av, dust.m, b.ebv, false);
    for (let k = 0; k < b.n; k++) b.ebv[k] = Math.max(0, b.ebv[k] as number) / dust.rv;
  } else if (dust.mode === 'decrement') {
    draw(DRAW_ROLES.decrement, dust.m, b.ebv, true);
    for (let k = 0; k < b.n; k++) b.ebv[k] = ebvFromBalmerDecrement(b.ebv[k] as number, settings.dustCurve, settings.intrinsicBalmer);
  } else if (dust.mode === 'fluxes') {
    // The decrement of each draw from that draw's own Hα and Hβ fluxes (the observed fluxes).
    const ha = plan.sources[dust.ha] as LumSource;
    const hb = plan.sources[dust.hb] as LumSource;
    draw(DRAW_ROLES.luminosity[ha.key], ha.m, b.ebv, true);
    draw(DRAW_ROLES.luminosity[hb.key], hb.m, b.scratch, true);
    for (let k = 0; k < b.n; k++)
      b.ebv[k] = ebvFromBalmerDecrement((b.ebv[k] as number) / (b.scratch[k] as number), settings.dustCurve, settings.intrinsicBalmer);
  } else b.ebv.fill(0);

  // Every source's observed value, as log10 (the corrections are added by evaluateChain).
  // Indexed loops over the plan's sources (here and in evaluateChain): iterating `plan.used` and a
  // fresh index array with for…of made the optimized code check the arrays' maps, and it was
  // thrown away and compiled again when an object's array had another elements kind.
  const count = bank ? plan.used.length : plan.sources.length;
  for (let j = 0; j < count; j++) {
    const i = bank ? (plan.used[j] as number) : j;
    const s = plan.sources[i] as LumSource;
    if (s.isLimit) (b.logL[i] as Float64Array).fill(log10(s.m.value));
    else drawLog(DRAW_ROLES.luminosity[s.key], s.m, b.logL[i] as Float64Array);
  }

  if (plan.mass) {
    drawLog(DRAW_ROLES.width[plan.mass.line], plan.mass.fwhm, b.logFwhm);
    if (bank) scaled(bank.normals(DRAW_ROLES.massScatter), plan.mass.cal.scatterDex, b.scatter);
    else b.scatter.fill(0);
  }

  if (plan.local) {
    if (plan.local.xIsSigma) drawLog(DRAW_ROLES.host, plan.local.x, b.x);
    else draw(DRAW_ROLES.host, plan.local.x, b.x, false);
    if (bank) scaled(bank.normals(DRAW_ROLES.localScatter), plan.local.rel.scatterDex, b.localScatter);
    else b.localScatter.fill(0);
  }
}

/** True for a measurement without errors: every draw is its value. */
function isExact(m: { errLo?: number; errHi?: number }): boolean {
  return !m.errLo && !m.errHi;
}

/** out = sigma · z, draw by draw. */
function scaled(z: Float64Array, sigma: number, out: Float64Array): void {
  const n = out.length;
  const n4 = n - (n % 4);
  for (let k = 0; k < n4; k += 4) {
    out[k] = sigma * (z[k] as number);
    out[k + 1] = sigma * (z[k + 1] as number);
    out[k + 2] = sigma * (z[k + 2] as number);
    out[k + 3] = sigma * (z[k + 3] as number);
  }
  for (let k = n4; k < n; k++) out[k] = sigma * (z[k] as number);
}

/** log10 L_bol from the corrected log10 luminosity of the plan's bolometric source. */
function lbolRoute(plan: ObjectPlan, settings: DeriveSettings, logL: number): number {
  const lbol = plan.lbol;
  if (!lbol) return NaN;
  if (lbol.route === 'halpha') return logLbolFromHalpha(logL, settings.bc5100);
  if (lbol.route === 'hbeta') return logLbolFixedBC(logL5100FromLogLHbeta(logL), settings.bc5100);
  return logLbolFromContinuum(lbol.route, logL, { band: lbol.band, bc5100: settings.bc5100 });
}

/**
 * The derivation chain over the sampled inputs: magnification and dust corrections, virial
 * mass, bolometric luminosity, Eddington ratio, required seed mass (nominal only: deriveObject
 * maps the mass percentiles) and offset from the local relation. The same code gives the
 * nominal values (n = 1, central inputs) and the Monte Carlo draws. Writes log10 values into
 * `b.out` (NaN where a quantity has no route) and the corrected luminosities into `b.logL`.
 */
export function evaluateChain(plan: ObjectPlan, settings: DeriveSettings, b: ChainBuffers, nominal: boolean): void {
  const n = b.n;
  const n4 = n - (n % 4);
  const { logMu, ebv, logFwhm, scatter, x } = b;
  const count = nominal ? plan.sources.length : plan.used.length;
  for (let j = 0; j < count; j++) {
    const i = nominal ? j : (plan.used[j] as number);
    const s = plan.sources[i] as LumSource;
    const L = b.logL[i] as Float64Array;
    const c = s.isFlux ? plan.logFourPiDl2 : 0;
    const dk = 0.4 * s.dustK;
    // Four draws per step here and below, for the reason given in virialLogMassInto; the same operations in the same order.
    for (let k = 0; k < n4; k += 4) {
      L[k] = (L[k] as number) + c - (logMu[k] as number) + dk * (ebv[k] as number);
      L[k + 1] = (L[k + 1] as number) + c - (logMu[k + 1] as number) + dk * (ebv[k + 1] as number);
      L[k + 2] = (L[k + 2] as number) + c - (logMu[k + 2] as number) + dk * (ebv[k + 2] as number);
      L[k + 3] = (L[k + 3] as number) + c - (logMu[k + 3] as number) + dk * (ebv[k + 3] as number);
    }
    for (let k = n4; k < n; k++) L[k] = (L[k] as number) + c - (logMu[k] as number) + dk * (ebv[k] as number);
  }

  const [logM, logLbol, logEdd, logMseed, delta] = b.out as [Float64Array, Float64Array, Float64Array, Float64Array, Float64Array];
  const mass = plan.mass;
  if (mass) {
    const L = b.logL[mass.source] as Float64Array;
    if (mass.l5100FromHbeta) {
      for (let k = 0; k < n; k++) logM[k] = virialLogMass(mass.cal, logL5100FromLogLHbeta(L[k] as number), logFwhm[k] as number) + (scatter[k] as number);
    } else virialLogMassInto(mass.cal, L, logFwhm, scatter, logM);
  } else logM.fill(NaN);

  const lbol = plan.lbol;
  if (lbol) {
    const L = b.logL[lbol.source] as Float64Array;
    // Every bolometric route here is a power law in L (fixed corrections, Netzer 2019's c·L^d,
    // Greene & Ho 2005 eq. 1 or 2 inverted times BC5100): linear in log L. The draws use that form,
    // after checking linearity at a third point, and skip the route's log10 calls.
    const f0 = lbolRoute(plan, settings, 40);
    const slope = lbolRoute(plan, settings, 41) - f0;
    const linear = !nominal && Math.abs(f0 + 5 * slope - lbolRoute(plan, settings, 45)) < 1e-9;
    if (linear) {
      for (let k = 0; k < n4; k += 4) {
        logLbol[k] = f0 + slope * ((L[k] as number) - 40);
        logLbol[k + 1] = f0 + slope * ((L[k + 1] as number) - 40);
        logLbol[k + 2] = f0 + slope * ((L[k + 2] as number) - 40);
        logLbol[k + 3] = f0 + slope * ((L[k + 3] as number) - 40);
      }
      for (let k = n4; k < n; k++) logLbol[k] = f0 + slope * ((L[k] as number) - 40);
    } else for (let k = 0; k < n; k++) logLbol[k] = lbolRoute(plan, settings, L[k] as number);
  } else logLbol.fill(NaN);

  const logEddPerMsun = log10(settings.eddingtonPerMsun);
  for (let k = 0; k < n4; k += 4) {
    logEdd[k] = (logLbol[k] as number) - logEddPerMsun - (logM[k] as number);
    logEdd[k + 1] = (logLbol[k + 1] as number) - logEddPerMsun - (logM[k + 1] as number);
    logEdd[k + 2] = (logLbol[k + 2] as number) - logEddPerMsun - (logM[k + 2] as number);
    logEdd[k + 3] = (logLbol[k + 3] as number) - logEddPerMsun - (logM[k + 3] as number);
  }
  for (let k = n4; k < n; k++) logEdd[k] = (logLbol[k] as number) - logEddPerMsun - (logM[k] as number);

  if (nominal && !Number.isNaN(plan.dtSeedGyr)) {
    for (let k = 0; k < n; k++)
      logMseed[k] = logSeedMassRequired(logM[k] as number, plan.dtSeedGyr, settings.efficiency, settings.lambdaSeed, settings.dutyCycle);
  } else logMseed.fill(NaN);

  const local = plan.local;
  if (local) localOffsetInto(local.rel, logM, x, delta);
  else delta.fill(NaN);
}
