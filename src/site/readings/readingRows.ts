/**
 * The rows the Readings page draws: the catalog's own columns (redshift, host mass) joined with
 * one reading's derived values from the `readings` table.
 */
import { queryCensus, TABLE } from '../db/duckdb.ts';
import { READINGS_TABLE } from '../db/readingsTable.ts';
import { sqlIdent, sqlString } from '../db/sqlIdent.ts';
import { chartRows, type ChartRow } from '../population/populationCharts.ts';
import type { ShiftRow } from './shiftChart.ts';

/** Columns the population charts take from the readings table. */
export const READING_CHART_COLUMNS = [
  'log_mbh', 'log_mbh_p16', 'log_mbh_p84', 'log_lbol', 'log_lbol_p16', 'log_lbol_p84',
  'log_edd_ratio', 'log_edd_ratio_p16', 'log_edd_ratio_p84', 'flags',
] as const;

/** Columns the population charts take from the catalog, where it has them. */
export const CATALOG_CHART_COLUMNS = ['z', 'log_mstar', 'log_mstar_err'] as const;

/** The columns a large catalog's charts need (drawn as densities: no error bars, so no percentiles). */
const DENSE_READING_COLUMNS = ['log_mbh', 'log_lbol', 'log_edd_ratio', 'flags'] as const;
const DENSE_CATALOG_COLUMNS = ['z', 'log_mstar'] as const;

/** Most objects the shift chart draws: above this it draws the same deterministic sample (by a hash of the id) for every pair. */
export const SHIFT_SAMPLE = 5000;

/**
 * The chart rows of the population under `reading`. `have` lists the catalog's columns;
 * `dense` (catalogs above NARROW_ABOVE objects) fetches only the columns a density chart reads.
 */
export async function rowsUnderReading(reading: string, have: readonly string[], dense = false): Promise<ChartRow[]> {
  const own = (dense ? DENSE_CATALOG_COLUMNS : CATALOG_CHART_COLUMNS).filter((c) => have.includes(c)).map((c) => `c.${sqlIdent(c)}`);
  const derived = (dense ? DENSE_READING_COLUMNS : READING_CHART_COLUMNS).map((c) => `r.${sqlIdent(c)}`);
  const rs = await queryCensus(
    `SELECT c.id, ${[...own, ...derived].join(', ')} FROM ${TABLE} c JOIN ${READINGS_TABLE} r ON r.id = c.id WHERE r.reading = ${sqlString(reading)} ORDER BY c."row"`,
  );
  return chartRows(rs);
}

/**
 * Each object's mass and Eddington ratio under readings `a` and `b`; with `sample`, at most
 * SHIFT_SAMPLE objects, the same ones for every pair (those with the smallest hash of their id).
 */
export async function shiftRows(a: string, b: string, sample = false): Promise<ShiftRow[]> {
  const rs = await queryCensus(
    `SELECT x.id, x.log_mbh AS mbh_a, x.log_edd_ratio AS edd_a, y.log_mbh AS mbh_b, y.log_edd_ratio AS edd_b
     FROM ${READINGS_TABLE} x JOIN ${READINGS_TABLE} y ON y.id = x.id AND y.reading = ${sqlString(b)}
     WHERE x.reading = ${sqlString(a)} ORDER BY ${sample ? `hash(x.id), x.id LIMIT ${SHIFT_SAMPLE}` : 'x.id'}`,
  );
  const col = (n: string) => rs.columns[rs.names.indexOf(n)]!;
  const num = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);
  const [ids, ma, ea, mb, eb] = ['id', 'mbh_a', 'edd_a', 'mbh_b', 'edd_b'].map(col) as unknown[][];
  return ids!.map((id, i) => ({ id: String(id), mbhA: num(ma![i]), eddA: num(ea![i]), mbhB: num(mb![i]), eddB: num(eb![i]) }));
}
