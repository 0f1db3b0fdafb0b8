import { LINES, type HbetaWithoutContinuum, type BolometricMethodId, type CosmologyId, type DustCurveId, type LineId, type LocalRelationId } from '../../core/derive/types.ts';
import { COSMOLOGY_PRESETS } from '../../core/cosmology/presets.ts';
import { DUST_CURVES } from '../../core/dust/kLambda.ts';
import { LOCAL_RELATIONS } from '../../core/local/localRelations.ts';
import { CALIBRATIONS } from '../../core/virial/calibrations.ts';

/*
 * The ids a census config may name, read from the core's tables (cosmology presets, virial
 * calibrations, dust curves, local relations). The bolometric methods have no table in the
 * core, so they are listed here; `satisfies` keeps the list in step with BolometricMethodId.
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

/** Routes for an Hβ mass without a measured continuum (`hbeta_without_continuum`). */
export const HBETA_WITHOUT_CONTINUUM_IDS = ['line', 'gh05_eq2'] as const satisfies readonly HbetaWithoutContinuum[];

/** Local black-hole–host relations. */
export const LOCAL_RELATION_IDS = Object.keys(LOCAL_RELATIONS) as LocalRelationId[];

/** Dust attenuation curves. */
export const DUST_CURVE_IDS = Object.keys(DUST_CURVES) as DustCurveId[];

/** Input formats the readers understand (`input.format`). */
export const INPUT_FORMATS = ['csv', 'tsv', 'ecsv', 'fits', 'votable', 'parquet'] as const;
