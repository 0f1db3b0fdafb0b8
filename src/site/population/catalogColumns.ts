/** The catalog table's column names, asked once from DuckDB-WASM. */
import { queryCensus, TABLE } from '../db/duckdb.ts';

let names: Promise<string[]> | null = null;

export function catalogColumns(): Promise<string[]> {
  names ??= queryCensus(`SELECT * FROM ${TABLE} LIMIT 0`).then((rs) => rs.names);
  return names;
}
