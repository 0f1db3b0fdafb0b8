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

/** The chart rows of the population under `reading`. `have` lists the catalog's columns. */
export async function rowsUnderReading(reading: string, have: readonly string[]): Promise<ChartRow[]> {
  const own = CATALOG_CHART_COLUMNS.filter((c) => have.includes(c)).map((c) => `c.${sqlIdent(c)}`);
  const derived = READING_CHART_COLUMNS.map((c) => `r.${sqlIdent(c)}`);
  const rs = await queryCensus(
    `SELECT c.id, ${[...own, ...derived].join(', ')} FROM ${TABLE} c JOIN ${READINGS_TABLE} r ON r.id = c.id WHERE r.reading = ${sqlString(reading)} ORDER BY c."row"`,
  );
  return chartRows(rs);
}

/** Each object's mass and Eddington ratio under readings `a` and `b`. */
export async function shiftRows(a: string, b: string): Promise<ShiftRow[]> {
  const rs = await queryCensus(
    `SELECT x.id, x.log_mbh AS mbh_a, x.log_edd_ratio AS edd_a, y.log_mbh AS mbh_b, y.log_edd_ratio AS edd_b
     FROM ${READINGS_TABLE} x JOIN ${READINGS_TABLE} y ON y.id = x.id AND y.reading = ${sqlString(b)}
     WHERE x.reading = ${sqlString(a)} ORDER BY x.id`,
  );
  const col = (n: string) => rs.columns[rs.names.indexOf(n)]!;
  const num = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);
  const [ids, ma, ea, mb, eb] = ['id', 'mbh_a', 'edd_a', 'mbh_b', 'edd_b'].map(col) as unknown[][];
  return ids!.map((id, i) => ({ id: String(id), mbhA: num(ma![i]), eddA: num(ea![i]), mbhB: num(mb![i]), eddB: num(eb![i]) }));
}
