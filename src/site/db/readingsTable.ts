/**
 * Registers the readings table (`data/readings.parquet`, one row per object and reading) with
 * DuckDB-WASM as the view `readings`, beside `census`. A catalog derived without readings has
 * no such file: then the view is simply absent and the pages that need it say so.
 */
import * as duckdb from '@duckdb/duckdb-wasm';
import { publishedTables } from './publishedTables.ts';

/** The documented name of the readings table. */
export const READINGS_TABLE = 'readings';

/** Path of the readings Parquet file, relative to the site's base. */
export const READINGS_PATH = 'data/readings.parquet';

/** Absolute URL of the readings file. */
export function readingsUrl(): string {
  return new URL(import.meta.env.BASE_URL + READINGS_PATH, location.href).href;
}

/**
 * Creates `readings` when the file is there; returns whether it did. Never throws. `materialize`
 * copies it into a table (needed before external access is switched off, as for `census`).
 */
export async function registerReadingsTable(db: duckdb.AsyncDuckDB, conn: duckdb.AsyncDuckDBConnection, materialize = false): Promise<boolean> {
  if (!publishedTables().includes('readings')) return false;
  try {
    const url = readingsUrl();
    const head = await fetch(url, { method: 'HEAD', cache: 'no-store' });
    if (!head.ok) return false;
    await db.registerFileURL('readings.parquet', url, duckdb.DuckDBDataProtocol.HTTP, false);
    await conn.query(`CREATE OR REPLACE ${materialize ? 'TABLE' : 'VIEW'} ${READINGS_TABLE} AS SELECT * FROM read_parquet('readings.parquet')`);
    return true;
  } catch {
    return false;
  }
}
