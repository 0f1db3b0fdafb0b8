/**
 * The one owner of DuckDB-WASM in the browser. It starts DuckDB lazily and once, from bundles
 * the site serves itself (Vite `?url` imports: nothing is fetched from another origin), opens
 * one connection, registers the catalog's Parquet file over HTTP (Range requests) and defines
 * the table `census` on it. Errors become messages a reader understands.
 *
 * Visitor SQL is locked in three ways, each enough on its own for the network:
 *   - DuckDB's worker runs behind networkGuard.worker.js, which lets it request only the wasm
 *     file and the catalog file: any other URL fails before a request is made;
 *   - statementGate.ts lets only reading statements through (a plain message for DROP, CREATE,
 *     ATTACH, COPY, INSTALL, SET, …);
 *   - the configuration is locked after start-up; for catalogs of up to MATERIALIZE_MAX
 *     objects the catalog is copied into a table and external access is switched off
 *     (`enable_external_access = false`: in DuckDB-WASM 1.28.0 this also stops read_parquet on
 *     the registered file, so a view on the file would stop working: measured).
 *
 * Pages call `queryCensus(sql)` for their own queries and `runVisitorQuery` for the reader's
 * (capped, cancellable, with a timeout); `onDbState` lets them show a loading state.
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
// no-inline: a small file would otherwise become a data: URL, an opaque-origin worker the policy refuses.
import guardWorker from './networkGuard.worker.js?url&no-inline';
import { catalogLoadError, friendlyQueryError } from './friendlyError.ts';
import { populationUrl, registerPopulationTable } from './populationTable.ts';
import type { ResultSet } from './resultSet.ts';
import { readingsUrl, registerReadingsTable } from './readingsTable.ts';
import { statementProblem } from './statementGate.ts';

/** The documented name of the catalog table. */
export const TABLE = 'census';

/** Path of the catalog Parquet file, relative to the site's base. */
export const CATALOG_PATH = 'data/catalog.parquet';

/** Catalogs of up to this many objects are copied into an in-memory table, so external access can be switched off. */
export const MATERIALIZE_MAX = 20_000;

/** Rows of a visitor's result kept in the page; the CSV download streams the rest. */
export const ROW_CAP = 100_000;

/** A visitor query running longer than this is stopped. */
export const QUERY_TIMEOUT_MS = 60_000;

/** After a stop, how long the worker may take to acknowledge it before it is replaced. */
const STOP_GRACE_MS = 2_000;

export type DbState = { phase: 'idle' | 'starting' | 'ready' } | { phase: 'failed'; message: string };

/** An error whose message is already in plain words for the reader; `raw` is DuckDB's own text (with its position diagram), if any. */
export class CensusDbError extends Error {
  constructor(
    message: string,
    readonly raw?: string,
  ) {
    super(message);
  }
}

const rawText = (err: unknown) => (err instanceof Error ? err.message : String(err));

let state: DbState = { phase: 'idle' };
const listeners = new Set<(s: DbState) => void>();
let ready: Promise<duckdb.AsyncDuckDBConnection> | null = null;
let current: { db: duckdb.AsyncDuckDB; worker: Worker } | null = null;
/** Settles when the last stopped query has released the worker (or the worker was replaced). */
let draining: Promise<void> = Promise.resolve();

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

const absolute = (u: string) => new URL(u, location.href).href;

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
  const gate = new URL(guardWorker, location.href);
  gate.searchParams.set('worker', absolute(bundle.mainWorker!));
  gate.searchParams.append('allow', absolute(bundle.mainModule));
  gate.searchParams.append('allow', url);
  // The readings table is the catalog's own too (absent for a catalog derived without readings).
  gate.searchParams.append('allow', readingsUrl());
  gate.searchParams.append('allow', populationUrl());
  const worker = new Worker(gate.href);
  const db = new duckdb.AsyncDuckDB(new duckdb.VoidLogger(), worker);
  current = { db, worker };
  await db.instantiate(absolute(bundle.mainModule), bundle.pthreadWorker);
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
  const objects = Number(document.body.dataset.objects ?? 'NaN');
  const copy = Number.isFinite(objects) && objects <= MATERIALIZE_MAX;
  try {
    await conn.query(`CREATE OR REPLACE ${copy ? 'TABLE' : 'VIEW'} ${TABLE} AS SELECT * FROM read_parquet('catalog.parquet')`);
  } catch (err) {
    throw new CensusDbError(catalogLoadError(CATALOG_PATH, status, err instanceof Error ? err.message : String(err)));
  }
  await registerReadingsTable(db, conn, copy);
  await registerPopulationTable(db, conn, copy);
  if (copy) await conn.query('SET enable_external_access = false');
  await conn.query('SET lock_configuration = true');
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

/** Stops the worker and forgets it: the next query starts a fresh database. */
function replaceWorker(): void {
  const old = current;
  current = null;
  ready = null;
  old?.worker.terminate();
  setState({ phase: 'idle' });
}

/** Runs `sql` (the site's own queries) against the catalog. Rejects with a CensusDbError whose message is in plain words. */
export async function queryCensus(sql: string): Promise<ResultSet> {
  await draining;
  const conn = await connection();
  let table;
  try {
    table = await conn.query(sql);
  } catch (err) {
    throw new CensusDbError(friendlyQueryError(err), rawText(err));
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

/** A visitor's result: at most `maxRows` rows; `truncated` when the query returned more. */
export interface VisitorResult {
  result: ResultSet;
  truncated: boolean;
}

/** Options of {@link runVisitorQuery} and {@link streamVisitorQuery}. */
export interface VisitorQueryOptions {
  /** Aborting stops the query (the Cancel button). */
  signal?: AbortSignal;
  /** Stop after this many ms (default QUERY_TIMEOUT_MS). */
  timeoutMs?: number;
}

interface BatchLike {
  numRows: number;
  getChildAt(i: number): ArrowVector | null;
}

/**
 * After a stop: asks DuckDB to cancel the running query and resolves once the cancel was answered
 * and the query has ended; a worker that stays busy (e.g. inside a long synchronous read) is
 * replaced after STOP_GRACE_MS. Without this order, a query run while the page's first query was
 * still running (Ctrl+Enter) ended with "0 rows" and no error.
 */
function drainAfterStop(conn: duckdb.AsyncDuckDBConnection, work: Promise<unknown>): Promise<void> {
  return new Promise<void>((resolve) => {
    const grace = setTimeout(() => {
      replaceWorker();
      resolve();
    }, STOP_GRACE_MS);
    const cancelled = conn.cancelSent().catch(() => false);
    const ended = work.then(
      () => undefined,
      () => undefined,
    );
    // A cancel that finds nothing left to stop may linger and stop the next query on the
    // connection; a throwaway query takes it.
    void Promise.all([cancelled, ended])
      .then(() => conn.query('SELECT 1').catch(() => undefined))
      .finally(() => {
        clearTimeout(grace);
        resolve();
      });
  });
}

/**
 * Runs a visitor's `sql` through the statement gate, streaming batches to `onBatch` until it
 * returns false (enough rows) or the result ends. Stops on abort and on timeout: the query is
 * cancelled, and a worker that does not answer the cancel within STOP_GRACE_MS is replaced.
 */
async function visitorStream(sql: string, onBatch: (b: ResultSet) => boolean | Promise<boolean>, options: VisitorQueryOptions): Promise<{ names: string[]; types: string[] }> {
  const problem = statementProblem(sql);
  if (problem) throw new CensusDbError(problem);
  await draining;
  const conn = await connection();
  // Stopped while DuckDB was starting (the reader ran another query): send nothing.
  if (options.signal?.aborted) throw new CensusDbError('The query was stopped.');
  const timeoutMs = options.timeoutMs ?? QUERY_TIMEOUT_MS;
  let stopped: string | null = null;
  let settled = false;
  let stop!: (message: string) => void;
  const stoppedPromise = new Promise<never>((_, reject) => {
    stop = (message: string) => {
      if (settled || stopped) return;
      stopped = message;
      // Set at once, not when this call unwinds: the query that stopped this one (the reader ran
      // another) waits on it before it is sent.
      draining = drainAfterStop(conn, work);
      reject(new CensusDbError(message));
    };
  });
  const work = (async () => {
    const reader = await conn.send(sql);
    // The stream reader learns its schema when opened (it reads the stream's first message).
    await reader.open();
    const fields = reader.schema.fields as { name: string; type: unknown }[];
    const names = fields.map((f) => f.name);
    const types = fields.map((f) => String(f.type));
    for await (const batch of reader as AsyncIterable<BatchLike>) {
      if (stopped) break;
      const columns: unknown[][] = names.map((_: string, c: number) => {
        const vec = batch.getChildAt(c);
        return vec ? columnValues(vec, batch.numRows) : new Array<unknown>(batch.numRows).fill(null);
      });
      if (!(await onBatch({ names, types, columns, numRows: batch.numRows }))) break;
    }
    return { names, types };
  })();
  const timer = setTimeout(() => stop(`The query ran for more than ${Math.round(timeoutMs / 1000)} s and was stopped: narrow it with WHERE or LIMIT, or aggregate.`), timeoutMs);
  const onAbort = () => stop('The query was stopped.');
  options.signal?.addEventListener('abort', onAbort);
  if (options.signal?.aborted) onAbort();
  try {
    return await Promise.race([work, stoppedPromise]);
  } catch (err) {
    if (stopped) throw err;
    throw new CensusDbError(friendlyQueryError(err), rawText(err));
  } finally {
    settled = true;
    clearTimeout(timer);
    options.signal?.removeEventListener('abort', onAbort);
  }
}

/**
 * Runs a visitor's query: the first `maxRows` rows (default ROW_CAP) are kept; `truncated`
 * says the query returned more. Rejects with a CensusDbError in plain words.
 */
export async function runVisitorQuery(sql: string, options: VisitorQueryOptions & { maxRows?: number } = {}): Promise<VisitorResult> {
  const maxRows = options.maxRows ?? ROW_CAP;
  const parts: ResultSet[] = [];
  let rows = 0;
  let truncated = false;
  const { names, types } = await visitorStream(
    sql,
    (b) => {
      const room = maxRows - rows;
      if (b.numRows > room) {
        truncated = true;
        if (room > 0) parts.push({ ...b, columns: b.columns.map((c) => c.slice(0, room)), numRows: room });
        rows = maxRows;
        return false;
      }
      parts.push(b);
      rows += b.numRows;
      return true;
    },
    options,
  );
  const columns = names.map((_, c) => (parts.length === 1 ? parts[0]!.columns[c]! : parts.flatMap((p) => p.columns[c]!)));
  return { result: { names, types, columns, numRows: rows }, truncated };
}

/** Streams every row of a visitor's query to `onBatch` (the full download of a capped result). */
export async function streamVisitorQuery(sql: string, onBatch: (b: ResultSet) => void, options: VisitorQueryOptions = {}): Promise<void> {
  await visitorStream(
    sql,
    (b) => {
      onBatch(b);
      return true;
    },
    options,
  );
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
