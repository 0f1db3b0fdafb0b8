/**
 * The optional table `population`: the per-object results of `dawn-census population` (survey field, detection
 * line, V_max, V/V_max, below_survey_limit), which the build copies to data/catalog.population.parquet when the
 * catalog has them. Joinable with `census` on `id`. A catalog without them simply has no such table.
 */
import * as duckdb from '@duckdb/duckdb-wasm';
import { publishedTables } from './publishedTables.ts';

/** The documented name of the per-object population table. */
export const POPULATION_TABLE = 'population';

/** Path of its Parquet file, relative to the site's base. */
export const POPULATION_PATH = 'data/catalog.population.parquet';

/** Absolute URL of the per-object population file (the network gate lets DuckDB read it). */
export function populationUrl(): string {
  return new URL(import.meta.env.BASE_URL + POPULATION_PATH, location.href).href;
}

/**
 * Defines `population` when the site carries the file; says nothing when it does not. `materialize` copies it into a
 * table (needed before external access is switched off, as for `census`).
 */
export async function registerPopulationTable(db: duckdb.AsyncDuckDB, conn: duckdb.AsyncDuckDBConnection, materialize = false): Promise<boolean> {
  const url = populationUrl();
  if (!publishedTables().includes('population')) return false;
  try {
    const head = await fetch(url, { method: 'HEAD', cache: 'no-store' });
    if (!head.ok) return false;
    await db.registerFileURL('catalog.population.parquet', url, duckdb.DuckDBDataProtocol.HTTP, false);
    await conn.query(`CREATE OR REPLACE ${materialize ? 'TABLE' : 'VIEW'} ${POPULATION_TABLE} AS SELECT * FROM read_parquet('catalog.population.parquet')`);
    return true;
  } catch {
    // the population table is an extra: the catalog stays usable without it
    return false;
  }
}
