import type { Cosmology } from '../../core/cosmology/cosmology.ts';
import type { DeriveSettings, LineId } from '../../core/derive/types.ts';
import type { ForwardRecipe } from '../../core/population/detectionModel.ts';
import type { RelationProblem } from '../../core/population/fitRelation.ts';
import { buildSelectionTables } from '../../core/population/selectionTables.ts';
import { CALIBRATIONS } from '../../core/virial/calibrations.ts';
import type { VirialCalibration } from '../../core/virial/virialCalibration.ts';
import type { SurveyConfig } from '../config/SurveyConfig.ts';
import type { ObjectVolume } from './objectVolumes.ts';
import type { PopulationRow } from './readPopulationRows.ts';

/** M* error assumed where the catalog gives none: common practice for SED-fitted masses, no source. */
export const DEFAULT_MSTAR_ERR_DEX = 0.3;
/** Floor of the measurement-only error of log M_BH once the calibration's scatter is taken out, dex. */
export const MIN_MBH_MEAS_ERR_DEX = 0.05;

/** The selection-aware fit's problem for a catalog, and what the summary says about its objects. */
export interface CatalogRelationProblem {
  readonly problem: RelationProblem;
  /** Objects given the assumed M* error. */
  readonly assumedMstarErr: number;
  /** Objects per selection table (weights of the bias and the detectable fraction). */
  readonly tableWeights: number[];
}

/**
 * The objects with a V_max, a detection line with a forward recipe, a host mass inside the fit's range and a
 * black-hole mass, with their selection tables (redshift slices of 0.25, M* grid of 0.1 dex over the fit's
 * range). Null with fewer than 8 such objects.
 */
export function relationProblemFor(
  rows: readonly PopulationRow[], volumes: readonly ObjectVolume[], survey: SurveyConfig, settings: DeriveSettings, cosmo: Cosmology,
): CatalogRelationProblem | null {
  const recipes: Partial<Record<LineId, ForwardRecipe>> = {};
  for (const line of ['halpha', 'hbeta'] as const) {
    const cal = (CALIBRATIONS as Record<string, VirialCalibration>)[settings.calibrations[line]];
    if (cal && (cal.luminosity === 'line' || cal.luminosity === 'l5100')) {
      recipes[line] = { line, calibration: cal, bc5100: settings.bc5100, eddingtonPerMsun: settings.eddingtonPerMsun };
    }
  }
  let assumed = 0;
  const use: { x: number; ex: number; y: number; hw: number; site: { field: number; line: LineId; z: number; limitCgs?: number } }[] = [];
  rows.forEach((r, i) => {
    const v = volumes[i] as ObjectVolume;
    if (v.vmaxCmpc3 === null || v.line === null || v.field === null || !recipes[v.line]) return;
    if (r.logMstar === null || r.logMbh === null || r.logMbhP16 === null || r.logMbhP84 === null || r.z === null) return;
    const [lo, hi] = survey.fit.mStarRange;
    if (r.logMstar < lo || r.logMstar > hi) return;
    if (r.logMstarErr === null) assumed++;
    use.push({
      x: r.logMstar, ex: r.logMstarErr ?? DEFAULT_MSTAR_ERR_DEX, y: r.logMbh, hw: (r.logMbhP84 - r.logMbhP16) / 2,
      site: { field: v.field, line: v.line, z: r.z, ...(v.limitCgs !== undefined ? { limitCgs: v.limitCgs } : {}) },
    });
  });
  if (use.length < 8) return null;
  const [m0, m1] = survey.fit.mStarRange;
  const built = buildSelectionTables(cosmo, survey.spec, recipes, use.map((u) => u.site), undefined, { zSlice: 0.25, mStar: [m0, m1, 0.1] });
  const data = use.map((u, i) => {
    const sc = (recipes[u.site.line] as ForwardRecipe).calibration.scatterDex;
    return { x: u.x, ex: u.ex, y: u.y, ey: Math.max(Math.sqrt(Math.max(u.hw * u.hw - sc * sc, 0)), MIN_MBH_MEAS_ERR_DEX), table: built.index[i] as number };
  });
  const problem = { data, tables: built.tables, grids: built.grids, erdf: survey.fit.eddingtonRatio };
  const tableWeights = built.tables.map((_, t) => built.index.filter((k) => k === t).length);
  return { problem, assumedMstarErr: assumed, tableWeights };
}
