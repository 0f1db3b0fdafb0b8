import { duckdb } from '../duckdb/nodeApi.ts';
import { LINES, type LineId } from '../../core/derive/types.ts';
import { sqlIdentifier, sqlString } from '../parquet/sqlLiteral.ts';
import { CatalogError } from '../readers/CatalogError.ts';


/** What the population step reads of one derived object. */
export interface PopulationRow {
  id: string;
  z: number | null;
  field: string | null;
  mbhMethod: string | null;
  flags: string;
  logMbh: number | null; logMbhP16: number | null; logMbhP84: number | null;
  logLbol: number | null; logLbolP16: number | null; logLbolP84: number | null;
  logMstar: number | null; logMstarErr: number | null;
  flux: Partial<Record<LineId, { value: number | null; err: number | null; limit: number | null }>>;
}

/**
 * Reads the columns the population step needs from a derived catalog (Parquet written by `derive`), in row order.
 * Throws CatalogError naming the file and the missing column.
 * @param parquetPath - the derived catalog.
 * @param fieldColumn - the column naming each object's field, if any.
 * @param limitColumns - per line, a column of per-object limiting fluxes (already in erg s⁻¹ cm⁻² × `limitScale`).
 */
export async function readPopulationRows(
  parquetPath: string, fieldColumn: string | undefined, limitColumns: Partial<Record<LineId, string>>, limitScale: number,
): Promise<PopulationRow[]> {
  const db = await duckdb().DuckDBInstance.create(':memory:');
  const con = await db.connect();
  try {
    const src = `read_parquet(${sqlString(parquetPath)})`;
    let names: string[];
    try {
      const d = await con.runAndReadAll(`DESCRIBE SELECT * FROM ${src}`);
      names = d.getRows().map((r) => String(r[0]));
    } catch (e) {
      throw new CatalogError(`${parquetPath}: cannot read the derived catalog: ${(e as Error).message.split('\n')[0]}`);
    }
    const need = ['id', 'z', 'log_mbh', 'log_mbh_p16', 'log_mbh_p84', 'mbh_method', 'flags'];
    for (const n of need) if (!names.includes(n)) throw new CatalogError(`${parquetPath}: no column "${n}": is this a catalog written by dawn-census derive?`);
    if (fieldColumn !== undefined && !names.includes(fieldColumn)) {
      throw new CatalogError(`${parquetPath}: survey.field_column "${fieldColumn}" is not a column of the catalog`);
    }
    for (const [line, col] of Object.entries(limitColumns)) {
      if (!names.includes(col)) throw new CatalogError(`${parquetPath}: survey limit column "${col}" for ${line} is not a column of the catalog`);
    }
    const col = (n: string): string => (names.includes(n) ? sqlIdentifier(n) : 'NULL');
    const fluxCols = LINES.flatMap((l) => [col(`flux_${l}`), col(`flux_${l}_err`), limitColumns[l] ? `${sqlIdentifier(limitColumns[l] as string)}::DOUBLE` : 'NULL']);
    const sql = `SELECT id, z, ${fieldColumn !== undefined ? `${sqlIdentifier(fieldColumn)}::VARCHAR` : 'NULL'}, mbh_method, flags,
      log_mbh, log_mbh_p16, log_mbh_p84, ${col('log_lbol')}, ${col('log_lbol_p16')}, ${col('log_lbol_p84')},
      ${col('log_mstar')}, ${col('log_mstar_err')}, ${fluxCols.join(', ')} FROM ${src}`;
    const rows = (await con.runAndReadAll(sql)).getRows();
    const num = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);
    return rows.map((r) => {
      const flux: PopulationRow['flux'] = {};
      LINES.forEach((l, i) => {
        const base = 13 + 3 * i;
        const lim = num(r[base + 2]);
        flux[l] = { value: num(r[base]), err: num(r[base + 1]), limit: lim === null ? null : lim * limitScale };
      });
      return {
        id: String(r[0]), z: num(r[1]), field: r[2] === null ? null : String(r[2]), mbhMethod: r[3] === null ? null : String(r[3]),
        flags: r[4] === null ? '' : String(r[4]),
        logMbh: num(r[5]), logMbhP16: num(r[6]), logMbhP84: num(r[7]), logLbol: num(r[8]), logLbolP16: num(r[9]), logLbolP84: num(r[10]),
        logMstar: num(r[11]), logMstarErr: num(r[12]), flux,
      };
    });
  } finally {
    con.closeSync();
  }
}
