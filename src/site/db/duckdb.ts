/**
 * The one owner of DuckDB-WASM in the browser. It starts DuckDB lazily and once, from bundles
 * the site serves itself (Vite `?url` imports: nothing is fetched from another origin), opens
 * one connection, registers the catalog's Parquet file over HTTP (Range requests) and defines
 * the table `census` on it. Errors become messages a reader understands.
 *
 * Pages call `queryCensus(sql)`; `onDbState` lets them show a loading state while it starts.
 */
// @duckdb/duckdb-wasm is pinned at 1.28.0 on purpose: measured here, releases from 1.29 on
// fetch their Parquet reader from a remote extension host at the first query, so a self-hosted
// site fails offline and depends on a third party; 1.28.0 has the Parquet reader built in and
// its eh bundle is half the size. Do not call INSTALL or LOAD.
import * as duckdb from '@duckdb/duckdb-wasm';
import mvpWasm from '@duckdb/duckdb-wasm/dist/duckdb-mvp.wasm?url';
import mvpWorker from '@duckdb/duckdb-wasm/dist/duckdb-browser-mvp.worker.js?url';
import ehWasm from '@duckdb/duckdb-wasm/dist/duckdb-eh.wasm?url';
import ehWorker from '@duckdb/duckdb-wasm/dist/duckdb-browser-eh.worker.js?url';
import { catalogLoadError, friendlyQueryError } from './friendlyError.ts';
import { registerPopulationTable } from './populationTable.ts';
import type { ResultSet } from './resultSet.ts';

/** The documented name of the catalog table. */
export const TABLE = 'census';

/** Path of the catalog Parquet file, relative to the site's base. */
export const CATALOG_PATH = 'data/catalog.parquet';

export type DbState = { phase: 'idle' | 'starting' | 'ready' } | { phase: 'failed'; message: string };

/** An error whose message is already in plain words for the reader. */
export class CensusDbError extends Error {}

let state: DbState = { phase: 'idle' };
const listeners = new Set<(s: DbState) => void>();
let ready: Promise<duckdb.AsyncDuckDBConnection> | null = null;

function setState(s: DbState): void {
  state = s;
  for (const l of listeners) l(s);
}

/** Calls `listener` now and on every change of the start-up state. Returns an unsubscribe function. */
export function onDbState(listener: (s: DbState) => void): () => void {
  listeners.add(listener);
  listener(state);
  return () => listeners.delete(listener);
}

/** Absolute URL of the catalog file (DuckDB-WASM's HTTP reader needs an absolute URL). */
export function catalogUrl(): string {
  return new URL(import.meta.env.BASE_URL + CATALOG_PATH, location.href).href;
}

async function start(): Promise<duckdb.AsyncDuckDBConnection> {
  setState({ phase: 'starting' });
  const url = catalogUrl();
  // Ask for the file first: a missing file gets a clear message instead of DuckDB's I/O error.
  let status: number | null = null;
  try {
    const head = await fetch(url, { method: 'HEAD', cache: 'no-store' });
    status = head.status;
  } catch {
    status = null;
  }
  if (status !== null && status >= 400) throw new CensusDbError(catalogLoadError(CATALOG_PATH, status));

  const bundle = await duckdb.selectBundle({
    mvp: { mainModule: mvpWasm, mainWorker: mvpWorker },
    eh: { mainModule: ehWasm, mainWorker: ehWorker },
  });
  const worker = new Worker(bundle.mainWorker!);
  const db = new duckdb.AsyncDuckDB(new duckdb.VoidLogger(), worker);
  await db.instantiate(bundle.mainModule, bundle.pthreadWorker);
  await db.open({ query: { castBigIntToDouble: true, castDecimalToDouble: true } });
  const conn = await db.connect();
  // Parquet is built into this DuckDB; never reach for extensions on another host.
  for (const setting of ['autoinstall_known_extensions', 'autoload_known_extensions']) {
    try {
      await conn.query(`SET ${setting} = false`);
    } catch {
      // older DuckDB without the setting: it cannot auto-install either
    }
  }
  await db.registerFileURL('catalog.parquet', url, duckdb.DuckDBDataProtocol.HTTP, false);
  try {
    await conn.query(`CREATE OR REPLACE VIEW ${TABLE} AS SELECT * FROM read_parquet('catalog.parquet')`);
  } catch (err) {
    throw new CensusDbError(catalogLoadError(CATALOG_PATH, status, err instanceof Error ? err.message : String(err)));
  }
  await registerPopulationTable(db, conn);
  return conn;
}

/** The connection, starting DuckDB-WASM on first use. Rejects with a CensusDbError in plain words. */
export function connection(): Promise<duckdb.AsyncDuckDBConnection> {
  if (!ready) {
    ready = start().then(
      (c) => {
        setState({ phase: 'ready' });
        return c;
      },
      (err: unknown) => {
        const message = err instanceof CensusDbError ? err.message : catalogLoadError(CATALOG_PATH, null, err instanceof Error ? err.message : String(err));
        setState({ phase: 'failed', message });
        throw new CensusDbError(message);
      },
    );
  }
  return ready;
}

/** Runs `sql` against the catalog. Rejects with a CensusDbError whose message is in plain words. */
export async function queryCensus(sql: string): Promise<ResultSet> {
  const conn = await connection();
  let table;
  try {
    table = await conn.query(sql);
  } catch (err) {
    throw new CensusDbError(friendlyQueryError(err));
  }
  const names = table.schema.fields.map((f: { name: string }) => f.name);
  const types = table.schema.fields.map((f: { type: unknown }) => String(f.type));
  const columns: unknown[][] = [];
  for (let c = 0; c < names.length; c++) {
    const vec = table.getChildAt(c);
    columns.push(vec ? columnValues(vec, table.numRows) : new Array<unknown>(table.numRows).fill(null));
  }
  return { names, types, columns, numRows: table.numRows };
}

interface ArrowVector {
  nullCount: number;
  isValid(i: number): boolean;
  toArray(): unknown;
}

/** A column as plain values. Numeric columns come out of Arrow as one typed array (fast); nulls are patched in. */
function columnValues(vec: ArrowVector, n: number): unknown[] {
  const arr = vec.toArray();
  let out: unknown[];
  if (ArrayBuffer.isView(arr)) {
    const typed = arr as unknown as ArrayLike<number | bigint>;
    out = new Array<unknown>(n);
    for (let r = 0; r < n; r++) {
      const v = typed[r]!;
      out[r] = typeof v === 'bigint' ? Number(v) : v;
    }
    if (vec.nullCount > 0) for (let r = 0; r < n; r++) if (!vec.isValid(r)) out[r] = null;
  } else {
    out = Array.from(arr as ArrayLike<unknown>, plain);
  }
  return out;
}

function plain(v: unknown): unknown {
  if (typeof v === 'bigint') return Number(v);
  if (v === undefined) return null;
  if (v instanceof Date) return v.toISOString();
  if (v !== null && typeof v === 'object' && 'toJSON' in v) return (v as { toJSON(): unknown }).toJSON();
  return v;
}
