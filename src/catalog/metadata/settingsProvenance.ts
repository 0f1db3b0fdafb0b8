import { EDDINGTON_CONSTANTS, PHYSICAL_CONSTANTS, T_EDD_GYR } from '../../core/constants/index.ts';
import { COSMOLOGY_PRESETS } from '../../core/cosmology/index.ts';
import type { DeriveSettings, LineId } from '../../core/derive/types.ts';
import { LINES } from '../../core/derive/types.ts';
import { DUST_CURVES, INTRINSIC_BALMER_CASE_B } from '../../core/dust/index.ts';
import { BC5100_RICHARDS06, BC_SHEN11, NETZER19 } from '../../core/bolometric/index.ts';
import { SALPETER_GROWTH } from '../../core/growth/index.ts';
import { LOCAL_RELATIONS } from '../../core/local/index.ts';
import { CALIBRATIONS } from '../../core/virial/calibrations.ts';
import { GH05_LHALPHA_L5100, GH05_LHBETA_L5100 } from '../../core/virial/lineContinuumRelations.ts';

/**
 * The settings of a run, as recorded in the catalog's metadata: the settings themselves, and
 * the records behind each id (cosmological parameters, calibration coefficients, dust curve,
 * constants), each with its reference, so a reader can reproduce every number.
 */
export interface SettingsProvenance {
  settings: DeriveSettings;
  cosmology: Record<string, unknown>;
  calibrations: Partial<Record<LineId, Record<string, unknown>>>;
  /**
   * The bolometric method and the records of the corrections it uses; `routes` gives, for every
   * value `lbol_method` can take in this run (the configured route and each fallback), the
   * records of its corrections and their reference.
   */
  bolometric: {
    method: string;
    bc5100: number;
    records: Record<string, unknown>[];
    reference: string;
    routes: Record<string, { records: Record<string, unknown>[]; reference: string }>;
  };
  eddington: { lEddPerMsun: number; reference: string };
  localRelation: Record<string, unknown>;
  dustCurve: Record<string, unknown>;
  intrinsicBalmer: { ratio: number; reference: string };
  growth: { form: string; reference: string; tEddGyr: number };
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
    bolometric: bolometricRecord(settings),
    eddington: {
      lEddPerMsun: settings.eddingtonPerMsun,
      reference: edd?.reference ?? 'value set in the config',
    },
    localRelation: {
      id: settings.localRelation,
      ...(Object.hasOwn(LOCAL_RELATIONS, settings.localRelation) ? dataOnly(LOCAL_RELATIONS[settings.localRelation]) : {}),
    },
    dustCurve: { id: settings.dustCurve, ...(dust ? dataOnly(dust) : {}) },
    intrinsicBalmer: {
      ratio: settings.intrinsicBalmer,
      reference: settings.intrinsicBalmer === INTRINSIC_BALMER_CASE_B.ratio ? INTRINSIC_BALMER_CASE_B.reference : 'value set in the config',
    },
    growth: { form: SALPETER_GROWTH.form, reference: SALPETER_GROWTH.reference, tEddGyr: T_EDD_GYR },
    constants: { ...PHYSICAL_CONSTANTS },
  };
}

/** The bc5100 record matching `bc` (10.33 Richards et al. 2006, 9.26 Shen et al. 2011), else the bare value. */
function bc5100Record(bc: number): Record<string, unknown> {
  if (bc === BC5100_RICHARDS06.bc) return { ...BC5100_RICHARDS06 };
  if (bc === BC_SHEN11.l5100.bc) return { ...BC_SHEN11.l5100 };
  return { id: 'config_bc5100', band: 'l5100', bc, reference: 'value set in the config' };
}

/** The corrections behind one `lbol_method` label. */
function routeRecords(label: string, settings: DeriveSettings): Record<string, unknown>[] {
  switch (label) {
    case 'halpha_gh05_bc5100':
      return [dataOnly(GH05_LHALPHA_L5100), bc5100Record(settings.bc5100)];
    case 'hbeta_gh05_bc5100':
      return [dataOnly(GH05_LHBETA_L5100), bc5100Record(settings.bc5100)];
    case 'bc5100':
      return [bc5100Record(settings.bc5100)];
    case 'bc3000':
      return [{ ...BC_SHEN11.l3000 }];
    case 'bc1350':
      return [{ ...BC_SHEN11.l1350 }];
    case 'netzer19_l5100':
      return [{ ...NETZER19.l5100 }];
    case 'netzer19_l3000':
      return [{ ...NETZER19.l3000 }];
    case 'netzer19_l1350':
      return [{ ...NETZER19.l1350 }];
    default:
      return [];
  }
}

const referenceOf = (records: Record<string, unknown>[]): string =>
  [...new Set(records.map((r) => r.reference).filter((r): r is string => typeof r === 'string'))].join('; ');

/** Every `lbol_method` label a run with `settings` can write: the configured route first, then its fallbacks. */
export function bolometricRouteLabels(settings: DeriveSettings): string[] {
  const continuum =
    settings.bolometric === 'netzer19'
      ? ['netzer19_l5100', 'netzer19_l3000', 'netzer19_l1350']
      : settings.bolometric === 'bc3000'
        ? ['bc3000', 'bc5100', 'bc1350']
        : settings.bolometric === 'bc1350'
          ? ['bc1350', 'bc3000', 'bc5100']
          : ['bc5100', 'bc3000', 'bc1350'];
  const labels = settings.bolometric === 'halpha_gh05_bc5100' ? ['halpha_gh05_bc5100', ...continuum] : [...continuum, 'halpha_gh05_bc5100'];
  return [...labels, 'hbeta_gh05_bc5100'];
}

function bolometricRecord(settings: DeriveSettings): SettingsProvenance['bolometric'] {
  const records: Record<string, unknown>[] = [];
  switch (settings.bolometric) {
    case 'halpha_gh05_bc5100':
      records.push(dataOnly(GH05_LHALPHA_L5100), bc5100Record(settings.bc5100));
      break;
    case 'bc5100':
      records.push(bc5100Record(settings.bc5100));
      break;
    case 'bc3000':
      records.push({ ...BC_SHEN11.l3000 });
      break;
    case 'bc1350':
      records.push({ ...BC_SHEN11.l1350 });
      break;
    case 'netzer19':
      records.push(...Object.values(NETZER19).map((r) => ({ ...r })));
      break;
  }
  const routes: SettingsProvenance['bolometric']['routes'] = {};
  for (const label of bolometricRouteLabels(settings)) {
    const r = routeRecords(label, settings);
    routes[label] = { records: r, reference: referenceOf(r) };
  }
  return { method: settings.bolometric, bc5100: settings.bc5100, records, reference: referenceOf(records), routes };
}
