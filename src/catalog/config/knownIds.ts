import { LINES, type BolometricMethodId, type CosmologyId, type DustCurveId, type LineId, type LocalRelationId } from '../../core/derive/types.ts';
import { COSMOLOGY_PRESETS } from '../../core/cosmology/presets.ts';
import { CALIBRATIONS } from '../../core/virial/calibrations.ts';

/*
 * The ids a census config may name. Cosmologies and virial calibrations come from the core's
 * tables; the other lists mirror the core's dust-curve, bolometric and local-relation tables
 * until those exist, and `satisfies` keeps them in step with the id types of
 * src/core/derive/types.ts.
 */

/** Cosmology ids (keys of COSMOLOGY_PRESETS). */
export const COSMOLOGY_IDS = Object.keys(COSMOLOGY_PRESETS) as CosmologyId[];

/** Virial calibration ids allowed for each broad line. */
export const CALIBRATION_IDS_BY_LINE: Readonly<Record<LineId, readonly string[]>> = Object.fromEntries(
  LINES.map((l) => [l, Object.values(CALIBRATIONS).filter((c) => c.line === l).map((c) => c.id)]),
) as Record<LineId, string[]>;

/** Bolometric-luminosity methods. */
export const BOLOMETRIC_IDS = [
  'halpha_gh05_bc5100',
  'bc5100',
  'bc3000',
  'bc1350',
  'netzer19',
] as const satisfies readonly BolometricMethodId[];

/** Local black-hole–host relations. */
export const LOCAL_RELATION_IDS = [
  'rv15_agn',
  'rv15_early',
  'kh13_mbulge',
  'kh13_sigma',
] as const satisfies readonly LocalRelationId[];

/** Dust attenuation curves. */
export const DUST_CURVE_IDS = ['calzetti00', 'ccm89', 'smc'] as const satisfies readonly DustCurveId[];

/** Input formats the readers understand (`input.format`). */
export const INPUT_FORMATS = ['csv', 'tsv', 'ecsv', 'fits', 'votable', 'parquet'] as const;
