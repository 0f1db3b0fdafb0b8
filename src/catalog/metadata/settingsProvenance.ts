import { EDDINGTON_CONSTANTS, PHYSICAL_CONSTANTS, T_EDD_GYR } from '../../core/constants/index.ts';
import { COSMOLOGY_PRESETS } from '../../core/cosmology/index.ts';
import type { DeriveSettings, LineId } from '../../core/derive/types.ts';
import { LINES } from '../../core/derive/types.ts';
import { DUST_CURVES, INTRINSIC_BALMER_CASE_B } from '../../core/dust/index.ts';
import { CALIBRATIONS } from '../../core/virial/calibrations.ts';

/** Growth of a black hole at a constant Eddington ratio, as used for the seed-mass columns. */
export const GROWTH_MODEL = {
  formula: 'M(t) = M_seed · exp(λ · duty · (1 − ε)/ε · Δt / t_Edd), Δt = age(z) − age(z_seed), t_Edd = σ_T c / (4π G m_p)',
  reference: 'Salpeter 1964, ApJ 140, 796 (Eddington-limited exponential growth); t_Edd from CODATA 2018 constants',
} as const;

/**
 * The settings of a run, as recorded in the catalog's metadata: the settings themselves, and
 * the records behind each id (cosmological parameters, calibration coefficients, dust curve,
 * constants), each with its reference, so a reader can reproduce every number.
 */
export interface SettingsProvenance {
  settings: DeriveSettings;
  cosmology: Record<string, unknown>;
  calibrations: Partial<Record<LineId, Record<string, unknown>>>;
  eddington: { lEddPerMsun: number; reference: string };
  dustCurve: Record<string, unknown>;
  intrinsicBalmer: { ratio: number; reference: string };
  growth: typeof GROWTH_MODEL & { tEddGyr: number };
  constants: Record<string, { value: number; unit: string; reference: string }>;
}

const dataOnly = (record: object): Record<string, unknown> =>
  Object.fromEntries(Object.entries(record).filter(([, v]) => typeof v !== 'function'));

/** Expands `settings` into its provenance record (unknown ids are recorded as the bare id). */
export function settingsProvenance(settings: DeriveSettings): SettingsProvenance {
  const cosmo = Object.hasOwn(COSMOLOGY_PRESETS, settings.cosmology) ? COSMOLOGY_PRESETS[settings.cosmology] : undefined;
  const calibrations: SettingsProvenance['calibrations'] = {};
  for (const line of LINES) {
    const id = settings.calibrations[line];
    const rec = Object.hasOwn(CALIBRATIONS, id) ? CALIBRATIONS[id as keyof typeof CALIBRATIONS] : undefined;
    calibrations[line] = rec ? dataOnly(rec) : { id };
  }
  const edd = Object.values(EDDINGTON_CONSTANTS).find((e) => e.lEddPerMsun === settings.eddingtonPerMsun);
  const dust = Object.hasOwn(DUST_CURVES, settings.dustCurve) ? DUST_CURVES[settings.dustCurve] : undefined;
  return {
    settings,
    cosmology: { id: settings.cosmology, ...(cosmo ? dataOnly(cosmo) : {}) },
    calibrations,
    eddington: {
      lEddPerMsun: settings.eddingtonPerMsun,
      reference: edd?.reference ?? 'value set in the config',
    },
    dustCurve: { id: settings.dustCurve, ...(dust ? dataOnly(dust) : {}) },
    intrinsicBalmer: {
      ratio: settings.intrinsicBalmer,
      reference: settings.intrinsicBalmer === INTRINSIC_BALMER_CASE_B.ratio ? INTRINSIC_BALMER_CASE_B.reference : 'value set in the config',
    },
    growth: { ...GROWTH_MODEL, tEddGyr: T_EDD_GYR },
    constants: { ...PHYSICAL_CONSTANTS },
  };
}
