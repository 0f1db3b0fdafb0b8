import type { Cosmology } from '../cosmology/cosmology.ts';
import type { LineId } from '../derive/types.ts';
import { detectionLinear, type ForwardRecipe } from './detectionModel.ts';
import type { RelationGrids, SelectionTable } from './relationLikelihood.ts';
import { schechterPerDex, stellarMassFunctionAt, type StellarMassFunction } from './stellarMassFunctions.ts';
import type { SurveySpec } from './surveySpec.ts';
import { lineRedshiftWindow } from './lineRedshiftWindow.ts';

/** Where an object was found: its field, detection line and redshift. */
export interface DetectionSite {
  readonly field: number;
  readonly line: LineId;
  readonly z: number;
  /** The object's own limiting flux, erg s⁻¹ cm⁻² (replaces the field's limit for this line). */
  readonly limitCgs?: number;
}

/** Grid choices of the selection-aware fit. */
export interface TableOptions {
  /** Width of the redshift slices objects share a table in. */
  readonly zSlice: number;
  /** Stellar-mass grid: first node, last node, step (log M_sun). */
  readonly mStar: readonly [number, number, number];
}

export const DEFAULT_TABLE_OPTIONS: TableOptions = { zSlice: 0.1, mStar: [7, 12, 0.1] };

const range = ([a, b, step]: readonly [number, number, number]): Float64Array => {
  const n = Math.round((b - a) / step) + 1;
  return Float64Array.from({ length: n }, (_, i) => a + i * step);
};

/**
 * The fit's grid, and one selection table per (field, line, redshift slice) in use: the stellar mass
 * function's shape at the slice's centre and the detection criteria there.
 * @returns the grids, the tables, and each site's table index (in the order given).
 */
export function buildSelectionTables(
  cosmo: Cosmology,
  survey: SurveySpec,
  recipes: Partial<Record<LineId, ForwardRecipe>>,
  sites: readonly DetectionSite[],
  smfs?: readonly StellarMassFunction[],
  opts: TableOptions = DEFAULT_TABLE_OPTIONS,
): { grids: RelationGrids; tables: SelectionTable[]; index: number[] } {
  const mStar = range(opts.mStar);
  const grids: RelationGrids = { mStar };
  const tables: SelectionTable[] = [];
  const byKey = new Map<string, number>();
  const index = sites.map((site) => {
    const slice = Math.floor(site.z / opts.zSlice);
    // Own limits share a table when they agree to 0.01 dex.
    const own = site.limitCgs !== undefined ? Math.round(Math.log10(site.limitCgs) * 100) : null;
    // Fields with the same limit for the line share tables: the criteria do not depend on the field's area.
    const fieldLimit = survey.fields[site.field]?.limits[site.line];
    const key = `${site.line}|${slice}|${own !== null ? own : JSON.stringify(fieldLimit ?? null)}`;
    const known = byKey.get(key);
    if (known !== undefined) return known;
    // The slice's centre, kept inside the line's window (a slice can straddle the window's edge).
    const w = lineRedshiftWindow(site.line, survey.lamObsRangeAngstrom);
    const zc = w ? Math.min(w.zMax, Math.max(w.zMin, (slice + 0.5) * opts.zSlice)) : site.z;
    const smf = stellarMassFunctionAt(zc, smfs);
    const massPrior = Float64Array.from(mStar, (m) => schechterPerDex(smf, m));
    const recipe = recipes[site.line];
    const field = survey.fields[site.field];
    const limit = own !== null ? { kind: 'constant' as const, fluxCgs: 10 ** (own / 100) } : field?.limits[site.line];
    if (!recipe || !limit) throw new RangeError(`no forward recipe or flux limit for ${site.line} in field ${site.field}`);
    const crit = { limit, lamObsRangeAngstrom: survey.lamObsRangeAngstrom, minFwhmKms: survey.minFwhmKms };
    tables.push({ massPrior, linear: detectionLinear(cosmo, recipe, crit, zc), calibrationScatter: recipe.calibration.scatterDex });
    byKey.set(key, tables.length - 1);
    return tables.length - 1;
  });
  return { grids, tables, index };
}

/**
 * One table with a flat stellar-mass prior and no selection: the likelihood then reduces to an ordinary
 * errors-in-both-variables fit with intrinsic scatter, the "naive" fit to the observed points.
 * @param grids - the grids of the selection-aware fit.
 */
export function naiveTable(grids: RelationGrids): SelectionTable {
  return { massPrior: new Float64Array(grids.mStar.length).fill(1), linear: null, calibrationScatter: 0 };
}
