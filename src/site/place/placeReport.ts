import type { CatalogRow } from '../charts/types.ts';
import { hasFlag, num } from '../charts/rowValues.ts';
import { nearestNeighbours } from './neighbours.ts';
import { percentileRank, type PercentileRank } from './ranks.ts';

/** The quantities ranked, each with the flag that marks it as an upper limit. */
export const RANKED = [
  { column: 'log_mbh', label: 'Black-hole mass', unit: 'log M☉', limitFlag: 'mbh_upper_limit' },
  { column: 'log_lbol', label: 'Bolometric luminosity', unit: 'log erg s⁻¹', limitFlag: 'lbol_upper_limit' },
  { column: 'log_edd_ratio', label: 'Eddington ratio', unit: 'log λ_Edd', limitFlag: 'edd_ratio_upper_limit' },
] as const;

/** Half-width of the redshift window the object is also compared within. */
export const Z_WINDOW = 0.5;

export interface RankLine {
  column: (typeof RANKED)[number]['column'];
  label: string;
  unit: string;
  /** The new object's value (null when it could not be derived). */
  value: number | null;
  /** True when the new object's value is an upper limit (its rank is then an upper bound). */
  isLimit: boolean;
  /** Against every catalog object with a measured (non-limit) value. */
  all: PercentileRank;
  /** Against those within ±Z_WINDOW in redshift. */
  window: PercentileRank;
}

export interface NeighbourLine {
  id: string;
  z: number;
  logMbh: number;
  logEddRatio: number;
  /** Standardised distance (in units of the population's standard deviations). */
  distance: number;
}

export interface PlaceReport {
  ranks: RankLine[];
  zWindow: [number, number] | null;
  neighbours: NeighbourLine[];
}

/**
 * Where a new object falls in the catalog: percentile ranks of M_BH, L_bol and λ_Edd among all
 * catalog objects with a measured value (upper limits left out) and among those within ±0.5 in
 * redshift, and its 5 nearest catalog neighbours in standardised (z, log M_BH, log λ_Edd).
 */
export function placeReport(object: CatalogRow, population: readonly CatalogRow[], k = 5): PlaceReport {
  const z = num(object.z);
  const zWindow: [number, number] | null = z === null ? null : [z - Z_WINDOW, z + Z_WINDOW];
  const ranks: RankLine[] = RANKED.map((q) => {
    const value = num(object[q.column]);
    const measured = population.filter((r) => !hasFlag(r, q.limitFlag) && num(r[q.column]) !== null);
    const values = (rows: readonly CatalogRow[]) => rows.map((r) => num(r[q.column]));
    const inWindow = zWindow ? measured.filter((r) => {
      const rz = num(r.z);
      return rz !== null && rz >= zWindow[0] && rz <= zWindow[1];
    }) : [];
    return {
      column: q.column,
      label: q.label,
      unit: q.unit,
      value,
      isLimit: hasFlag(object, q.limitFlag),
      all: value === null ? { percentile: null, n: measured.length } : percentileRank(values(measured), value),
      window: value === null ? { percentile: null, n: inWindow.length } : percentileRank(values(inWindow), value),
    };
  });
  const coords = (r: CatalogRow) => [num(r.z), num(r.log_mbh), num(r.log_edd_ratio)];
  const neighbours = nearestNeighbours(coords(object), population.filter((r) => r.id !== object.id), coords, k).map(({ item, distance }) => ({
    id: String(item.id),
    z: num(item.z)!,
    logMbh: num(item.log_mbh)!,
    logEddRatio: num(item.log_edd_ratio)!,
    distance,
  }));
  return { ranks, zWindow, neighbours };
}
