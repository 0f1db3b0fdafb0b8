import type { DeriveSettings, LineId, Measured, ObjectInputs } from './types.ts';
import type { FlagId } from './flags.ts';
import { getCosmology } from '../cosmology/getCosmology.ts';
import { MPC_CM } from '../constants/physical.ts';
import { getDustCurve, kLambda } from '../dust/kLambda.ts';
import { lineWavelengthAngstrom } from '../dust/lineWavelengths.ts';
import { getCalibration } from '../virial/calibrations.ts';
import type { VirialCalibration } from '../virial/virialCalibration.ts';
import type { ContinuumBand } from '../bolometric/fixedCorrections.ts';
import type { ContinuumBolometricMethod } from '../bolometric/logLbolFromContinuum.ts';
import { getLocalRelation } from '../local/localRelations.ts';
import type { LocalRelation } from '../local/localRelation.ts';
import { snr } from './drawPositive.ts';
import { log10 } from '../math/index.ts';

/**
 * A copy of a measurement with both errors filled in; an error given on one side only is
 * taken as symmetric (as a bare `_err` is). Every measurement the draws touch has this one
 * shape, so the hot loop's property reads stay monomorphic whatever the caller built.
 */
function spec(m: Measured): Measured {
  const errLo = m.errLo ?? m.errHi ?? 0;
  return { value: m.value, errLo, errHi: m.errHi ?? errLo };
}

/** Rest wavelengths of the continuum bands, Å (the bands' names). */
const BAND_ANGSTROM: Readonly<Record<ContinuumBand, number>> = { l5100: 5100, l3000: 3000, l1350: 1350 };
const BAND_INPUT = { l5100: 'lamL5100', l3000: 'lamL3000', l1350: 'lamL1350' } as const;

/** An observed luminosity the chain uses: a line flux or luminosity, or a continuum λL_λ. */
export interface LumSource {
  key: LineId | ContinuumBand;
  m: Measured;
  /** True when `m` is a flux (erg s⁻¹ cm⁻²) to be multiplied by 4πD_L²; false for a luminosity (erg s⁻¹). */
  isFlux: boolean;
  /** A_λ/E(B−V) of the dust curve at the source's rest wavelength. */
  dustK: number;
  isLimit: boolean;
}

export type DustPlan =
  | { mode: 'none' }
  | { mode: 'av'; m: Measured; rv: number }
  | { mode: 'decrement'; m: Measured }
  /** The decrement is F(Hα)/F(Hβ) of the fluxes given: formed per draw from sources `ha` and `hb`. */
  | { mode: 'fluxes'; ha: number; hb: number };

/** Relative difference below which a given Balmer decrement is taken as the ratio of the given fluxes (a 3-digit rounding). */
const SAME_RATIO_RTOL = 5e-3;

export interface MassPlan {
  line: LineId;
  cal: VirialCalibration;
  fwhm: Measured;
  /** Index into ObjectPlan.sources. */
  source: number;
  /** The calibration's luminosity is L5100 estimated from L(Hβ) (Greene & Ho 2005 eq. 2 inverted; only with hbetaWithoutContinuum 'gh05_eq2'). */
  l5100FromHbeta: boolean;
}

export interface LbolPlan {
  /** Recorded in `lbol_method`, e.g. 'halpha_gh05_bc5100', 'bc3000', 'netzer19_l5100', 'hbeta_gh05_bc5100'. */
  label: string;
  /** 'hbeta': L5100 estimated from L(Hβ) by Greene & Ho 2005 eq. 2, times BC5100 (the last resort). */
  route: 'halpha' | 'hbeta' | ContinuumBolometricMethod;
  band?: ContinuumBand;
  source: number;
}

export interface LocalPlan {
  rel: LocalRelation;
  x: Measured;
  /** The relation takes log σ*; `x` holds σ* in km/s. */
  xIsSigma: boolean;
}

/** Everything fixed for one object before its draws: distances, ages and the route each quantity takes. */
export interface ObjectPlan {
  z: number;
  ageGyr: number;
  dlMpc: number;
  /** Time from the seed redshift to z, Gyr (NaN when z ≥ z_seed). */
  dtSeedGyr: number;
  /** log10(4π D_L²), D_L in cm. */
  logFourPiDl2: number;
  mu: Measured | null;
  dust: DustPlan;
  /** Every line and continuum luminosity given, lines first in LINES order. */
  sources: LumSource[];
  /** Indices of `sources` the mass and L_bol routes use (the only ones drawn). */
  used: number[];
  mass: MassPlan | null;
  lbol: LbolPlan | null;
  local: LocalPlan | null;
  flags: Set<FlagId>;
}

const CONTINUUM_ORDER: Readonly<Record<string, ContinuumBand[]>> = {
  bc5100: ['l5100', 'l3000', 'l1350'],
  bc3000: ['l3000', 'l5100', 'l1350'],
  bc1350: ['l1350', 'l3000', 'l5100'],
  netzer19: ['l5100', 'l3000', 'l1350'],
  halpha_gh05_bc5100: ['l5100', 'l3000', 'l1350'],
};
const BAND_METHOD: Readonly<Record<ContinuumBand, ContinuumBolometricMethod>> = { l5100: 'bc5100', l3000: 'bc3000', l1350: 'bc1350' };

/**
 * Resolves, from one object's central inputs and the settings, which line gives the mass,
 * which luminosity gives L_bol (falling back through the other methods when the configured
 * one lacks its input), how dust and lensing are corrected, and which host quantity feeds
 * the local relation. Pure; throws RangeError for a redshift that is not positive and finite.
 */
export function planObject(inputs: ObjectInputs, settings: DeriveSettings): ObjectPlan {
  const z = inputs.z;
  if (!(z > 0) || !Number.isFinite(z)) throw new RangeError(`redshift must be positive and finite, got ${z}`);
  const flags = new Set<FlagId>();
  const cosmo = getCosmology(settings.cosmology);
  const ageGyr = cosmo.ageGyr(z);
  const dlMpc = cosmo.luminosityDistanceMpc(z);
  const dtSeedGyr = z < settings.zSeed ? ageGyr - cosmo.ageGyr(settings.zSeed) : NaN;
  if (!(z < settings.zSeed)) flags.add('z_above_seed_redshift');
  const dlCm = dlMpc * MPC_CM;
  const logFourPiDl2 = log10(4 * Math.PI) + 2 * log10(dlCm);

  const mu = inputs.mu ? spec(inputs.mu) : null;
  if (mu && mu.value !== 1) flags.add('lensed');

  const curve = settings.dustCurve;
  const sources: LumSource[] = [];
  const lineSource = new Map<LineId, number>();
  for (const line of ['halpha', 'hbeta', 'mgii', 'civ'] as const) {
    const li = inputs.lines[line];
    const m = li?.fluxCgs ?? li?.lumErgS;
    if (!li || !m) continue;
    lineSource.set(line, sources.length);
    sources.push({ key: line, m: spec(m), isFlux: li.fluxCgs !== undefined, dustK: kLambda(curve, lineWavelengthAngstrom(line)), isLimit: li.fluxIsLimit === true });
  }
  const bandSource = new Map<ContinuumBand, number>();
  for (const band of ['l5100', 'l3000', 'l1350'] as const) {
    const m = inputs[BAND_INPUT[band]];
    if (!m) continue;
    bandSource.set(band, sources.length);
    sources.push({ key: band, m: spec(m), isFlux: false, dustK: kLambda(curve, BAND_ANGSTROM[band]), isLimit: false });
  }

  const dust = planDust(inputs, settings, sources, lineSource, flags);
  const mass = planMass(inputs, settings, sources, lineSource, bandSource, flags);
  const lbol = planLbol(settings, sources, lineSource, bandSource, flags);
  const dustSources = dust.mode === 'fluxes' ? [dust.ha, dust.hb] : [];
  const used = [...new Set([mass?.source, lbol?.source, ...dustSources].filter((i): i is number => i !== undefined))];
  for (const i of used) if (snr((sources[i] as LumSource).m) < 2 && !(sources[i] as LumSource).isLimit) flags.add('low_snr');
  if (mass && snr(mass.fwhm) < 2) flags.add('low_snr');
  if (mass && (sources[mass.source] as LumSource).isLimit) flags.add('mbh_upper_limit');
  const local = planLocal(inputs, settings, flags);
  if (mass && local && mass.cal.massScale !== local.rel.massScale) flags.add('local_relation_mass_scale');
  const lbolLimit = lbol !== null && (sources[lbol.source] as LumSource).isLimit;
  if (lbolLimit) flags.add('lbol_upper_limit');
  if (mass && lbol) {
    const massLimit = (sources[mass.source] as LumSource).isLimit;
    // Both on limits: from the same flux λ ∝ L^(1−b·…) still rises with L (an upper limit);
    // from two different limited fluxes it is not bounded either way.
    if (lbolLimit && massLimit && lbol.source !== mass.source) flags.add('edd_ratio_unconstrained');
    else if (lbolLimit) flags.add('edd_ratio_upper_limit');
    else if (massLimit) flags.add('edd_ratio_lower_limit');
  }

  return { z, ageGyr, dlMpc, dtSeedGyr, logFourPiDl2, mu, dust, sources, used, mass, lbol, local, flags };
}

function planMass(
  inputs: ObjectInputs,
  settings: DeriveSettings,
  sources: readonly LumSource[],
  lineSource: Map<LineId, number>,
  bandSource: Map<ContinuumBand, number>,
  flags: Set<FlagId>,
): MassPlan | null {
  // First pass: only measured luminosities; a limit never outranks a measurement. Second
  // pass (nothing measured): limits too, giving an upper-limit mass.
  for (const allowLimit of [false, true]) {
    // A width measured on a line earlier in the priority whose luminosity is missing (or only
    // a limit): say so when a later line gives the mass.
    let skipped = false;
    let skippedLimit = false;
    for (const line of settings.linePriority) {
      const fwhm = inputs.lines[line]?.fwhmKms;
      if (!fwhm) continue;
      const plan = massRoute(line, spec(fwhm), settings, lineSource, bandSource);
      if (!plan) {
        skipped = true;
        continue;
      }
      if (!allowLimit && (sources[plan.source] as LumSource).isLimit) {
        skippedLimit = true;
        continue;
      }
      if (skipped) flags.add('mass_line_fallback');
      if (skippedLimit) flags.add('measured_over_limit');
      if (plan.l5100FromHbeta) flags.add('l5100_from_hbeta');
      return plan;
    }
  }
  flags.add('no_mass');
  return null;
}

/** The mass route of one line with a width, or null when the luminosity its calibration needs is missing. */
function massRoute(
  line: LineId,
  fwhm: Measured,
  settings: DeriveSettings,
  lineSource: Map<LineId, number>,
  bandSource: Map<ContinuumBand, number>,
): MassPlan | null {
  const cal = getCalibration(settings.calibrations[line]);
  const source = cal.luminosity === 'line' ? lineSource.get(line) : bandSource.get(cal.luminosity);
  if (source !== undefined) return { line, cal, fwhm, source, l5100FromHbeta: false };
  // Hβ masses calibrated on L5100 with no continuum measured: by default the calibration on
  // L(Hβ) itself; as an option, λL5100 estimated from L(Hβ) (Greene & Ho 2005 eq. 2 inverted).
  const hb = lineSource.get('hbeta');
  if (line !== 'hbeta' || cal.luminosity !== 'l5100' || hb === undefined) return null;
  if (settings.hbetaWithoutContinuum === 'gh05_eq2') return { line, cal, fwhm, source: hb, l5100FromHbeta: true };
  return { line, cal: getCalibration('vp06_hbeta_line'), fwhm, source: hb, l5100FromHbeta: false };
}

function planLbol(
  settings: DeriveSettings,
  sources: readonly LumSource[],
  lineSource: Map<LineId, number>,
  bandSource: Map<ContinuumBand, number>,
  flags: Set<FlagId>,
): LbolPlan | null {
  const method = settings.bolometric;
  const candidates: LbolPlan[] = [];
  const ha = lineSource.get('halpha');
  const haPlan: LbolPlan | null = ha !== undefined ? { label: 'halpha_gh05_bc5100', route: 'halpha', source: ha } : null;
  if (method === 'halpha_gh05_bc5100' && haPlan) candidates.push(haPlan);
  for (const band of CONTINUUM_ORDER[method] ?? []) {
    const source = bandSource.get(band);
    if (source === undefined) continue;
    candidates.push(
      method === 'netzer19'
        ? { label: `netzer19_${band}`, route: 'netzer19', band, source }
        : { label: BAND_METHOD[band], route: BAND_METHOD[band], band, source },
    );
  }
  if (method !== 'halpha_gh05_bc5100' && haPlan) candidates.push(haPlan);
  // Last resort, as for the Hβ mass without a continuum: L5100 from L(Hβ).
  const hb = lineSource.get('hbeta');
  if (hb !== undefined) candidates.push({ label: 'hbeta_gh05_bc5100', route: 'hbeta', source: hb });
  // A measured luminosity always outranks a limited one, whatever the order of preference.
  const measured = candidates.find((c) => !(sources[c.source] as LumSource).isLimit);
  const chosen = measured ?? candidates[0] ?? null;
  if (chosen && chosen !== candidates[0]) flags.add('measured_over_limit');
  if (!chosen) flags.add('no_lbol');
  else if (chosen.route !== (method === 'halpha_gh05_bc5100' ? 'halpha' : method)) flags.add('lbol_fallback');
  if (chosen?.route === 'hbeta') flags.add('l5100_from_hbeta');
  return chosen;
}

function planDust(
  inputs: ObjectInputs,
  settings: DeriveSettings,
  sources: readonly LumSource[],
  lineSource: Map<LineId, number>,
  flags: Set<FlagId>,
): DustPlan {
  if (inputs.av) return { mode: 'av', m: spec(inputs.av), rv: getDustCurve(settings.dustCurve).rv };
  const bd = inputs.balmerDecrement;
  if (!bd) {
    flags.add('no_dust_correction');
    return { mode: 'none' };
  }
  if (bd.value < settings.intrinsicBalmer) flags.add('balmer_below_intrinsic');
  // A decrement that is the ratio of the broad fluxes given shares their errors (Hα's error
  // enters the luminosity and the dust correction): draw the fluxes, form the ratio per draw.
  const ha = lineSource.get('halpha');
  const hb = lineSource.get('hbeta');
  if (ha !== undefined && hb !== undefined) {
    const a = sources[ha] as LumSource;
    const b = sources[hb] as LumSource;
    if (a.isFlux && b.isFlux && !a.isLimit && !b.isLimit && Math.abs(a.m.value / b.m.value / bd.value - 1) <= SAME_RATIO_RTOL) {
      flags.add('balmer_from_line_fluxes');
      return { mode: 'fluxes', ha, hb };
    }
  }
  return { mode: 'decrement', m: spec(bd) };
}

function planLocal(inputs: ObjectInputs, settings: DeriveSettings, flags: Set<FlagId>): LocalPlan | null {
  const rel = getLocalRelation(settings.localRelation);
  if (rel.x === 'logSigma') {
    if (!inputs.sigmaStarKms) return flags.add('no_host_mass'), null;
    return { rel, x: spec(inputs.sigmaStarKms), xIsSigma: true };
  }
  if (!inputs.logMstar) return flags.add('no_host_mass'), null;
  if (rel.x === 'logMbulge') flags.add('bulge_mass_from_total');
  return { rel, x: spec(inputs.logMstar), xIsSigma: false };
}
