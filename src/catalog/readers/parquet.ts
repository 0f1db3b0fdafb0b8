import { open } from 'node:fs/promises';
import type { DuckDBConnection, DuckDBInstance as DuckDBInstanceType, DuckDBTypeId as DuckDBTypeIdType } from '@duckdb/node-api';
import { duckdb } from '../duckdb/nodeApi.ts';
import { parseDocument } from 'yaml';
import type { Cell, ColumnInfo, ColumnKind, TableChunk, TableSource } from './types.ts';
import { CatalogError } from './CatalogError.ts';
import { ChunkBuilder, checkChunkRows } from './ChunkBuilder.ts';
import { settleColumnNames } from './columnNames.ts';
import { toPlain } from './ecsvHeader.ts';


/** DuckDB settings for reading one file: bounded memory on a shared 2-core machine. */
const DUCKDB_OPTIONS = { memory_limit: '1GB', threads: '2' };

/** Decimal digits a double holds exactly: DECIMAL(p, s) with p up to this is read as a float. */
const MAX_EXACT_DECIMAL_DIGITS = 15;

/** DuckDB's type ids by how a column is read (built at the first file: DuckDB loads on first use). */
interface TypeSets {
  smallInt: Set<DuckDBTypeIdType>;
  wideInt: Set<DuckDBTypeIdType>;
  float: Set<DuckDBTypeIdType>;
  asText: Set<DuckDBTypeIdType>;
}
let typeSets: TypeSets | null = null;
function sets(): TypeSets {
  const T = duckdb().DuckDBTypeId;
  typeSets ??= {
    smallInt: new Set([T.TINYINT, T.SMALLINT, T.INTEGER, T.UTINYINT, T.USMALLINT, T.UINTEGER]),
    wideInt: new Set([T.BIGINT, T.UBIGINT, T.HUGEINT, T.UHUGEINT]),
    float: new Set([T.FLOAT, T.DOUBLE, T.DECIMAL]),
    asText: new Set([T.VARCHAR, T.ENUM, T.UUID, T.DATE, T.TIME, T.TIME_NS, T.TIME_TZ, T.TIMESTAMP, T.TIMESTAMP_S, T.TIMESTAMP_MS, T.TIMESTAMP_NS, T.TIMESTAMP_TZ]),
  };
  return typeSets;
}

/**
 * Opens a Parquet file through DuckDB (`@duckdb/node-api`), streaming DuckDB's result chunks.
 *
 * Kinds: BOOLEAN → bool; 8–32-bit integers → int; 64/128-bit integers → int when every value is
 * within ±(2^53 − 1) (checked with one min/max query), else `string` with exact digits;
 * FLOAT/DOUBLE → float (NaN stays NaN: Parquet has real nulls); DECIMAL(p, s) → float for
 * p ≤ 15 (exact once rounded back to s places), else `string` with its exact digits (`12.3400`);
 * `fileType` keeps DuckDB's name of each column's type (`DECIMAL(18,4)`, `BIGINT`); VARCHAR, ENUM, UUID and
 * dates/times → string (ISO text). Nested types (LIST, STRUCT, MAP, ARRAY), BLOB, INTERVAL and
 * others raise a CatalogError naming the column. `meta` holds the file's key-value metadata as
 * strings (except the binary `ARROW:schema`); an Astropy `table_meta_yaml` entry is parsed for
 * column units/descriptions and its `meta` mapping is merged into `meta`; astropy's masked
 * columns (a data column and a boolean `<name>.mask` column) read as one column, missing where
 * the mask is set.
 *
 * @param path - file to read
 */
export async function openParquet(path: string): Promise<TableSource> {
  await checkMagic(path);
  const { DuckDBInstance, DuckDBTypeId } = duckdb();
  const { smallInt: SMALL_INT, wideInt: WIDE_INT, float: FLOAT, asText: AS_TEXT } = sets();
  const inst = await DuckDBInstance.create(':memory:', DUCKDB_OPTIONS);
  try {
    const con = await inst.connect();
    try {
      const src = `read_parquet(${sqlString(path)})`;
      const schema = await query(con, `SELECT * FROM ${src} LIMIT 0`, path);
      const names = settleColumnNames(schema.columnNames(), path);
      const typeIds = schema.columnTypes().map((t) => t.typeId);
      const types = schema.columnTypes();
      const kinds: ColumnKind[] = typeIds.map((id, i) => {
        if (id === DuckDBTypeId.BOOLEAN) return 'bool';
        // A DECIMAL wider than a double's 15 exact digits is read as its exact decimal text.
        if (id === DuckDBTypeId.DECIMAL && (types[i] as { width?: number }).width! > MAX_EXACT_DECIMAL_DIGITS) return 'string';
        if (SMALL_INT.has(id) || WIDE_INT.has(id)) return 'int';
        if (FLOAT.has(id)) return 'float';
        if (AS_TEXT.has(id)) return 'string';
        throw new CatalogError(`${path}: column "${names[i]}" has type ${schema.columnTypes()[i]!.toString()}, which is not supported (only scalar number, boolean, text and date columns are read)`);
      });
      const wide = names.map((n, i) => ({ n, i })).filter(({ i }) => WIDE_INT.has(typeIds[i]!));
      if (wide.length > 0) {
        const lim = Number.MAX_SAFE_INTEGER;
        const exprs = wide.map(({ n }) => `(min(${ident(n)}) < -${lim} OR max(${ident(n)}) > ${lim})`).join(', ');
        const r = await query(con, `SELECT ${exprs} FROM ${src}`, path);
        wide.forEach(({ i }, k) => { if (r.value(k, 0) === true) kinds[i] = 'string'; });
      }
      const countRes = await query(con, `SELECT num_rows FROM parquet_file_metadata(${sqlString(path)})`, path);
      const nRows = Number(countRes.value(0, 0) ?? 0);
      const kv = await query(con, `SELECT key, value FROM parquet_kv_metadata(${sqlString(path)})`, path);
      const all: ColumnInfo[] = names.map((name, i) => ({ name, kind: kinds[i]!, fileType: types[i]!.toString() }));
      const meta = kvMeta(kv.getRows() as unknown[][], all);
      // astropy's masked columns: the data column reads as missing where its mask column is true,
      // and the mask column itself is not a column of the table.
      const masks = astropyMasks(meta, all);
      const kept = all.map((_, i) => i).filter((i) => !masks.maskColumns.has(i));
      const columns = kept.map((i) => all[i]!);
      const sql = () => {
        const exprs = kept.map((i) => {
          const e = selectExpr(names[i]!, all[i]!.kind, typeIds[i]!);
          const m = masks.maskOf.get(i);
          return m === undefined ? e : `CASE WHEN ${ident(names[m]!)} IS NOT FALSE THEN NULL ELSE ${e} END`;
        });
        return `SELECT ${exprs.join(', ')} FROM ${src}`;
      };
      return parquetSource(path, inst, columns, nRows, meta, sql);
    } finally {
      con.closeSync();
    }
  } catch (e) {
    inst.closeSync();
    throw e;
  }
}

function parquetSource(path: string, inst: DuckDBInstanceType, columns: ColumnInfo[], nRows: number, meta: Record<string, unknown>, sql: () => string): TableSource {
  let closed = false;
  return {
    path, format: 'parquet', columns, nRows, meta,
    keepAsText(index: number) {
      columns[index]!.kind = 'string';
    },
    async *chunks(chunkRows?: number): AsyncGenerator<TableChunk> {
      if (closed) throw new Error(`${path}: chunks() called after close()`);
      const builder = new ChunkBuilder(columns.length, checkChunkRows(chunkRows));
      const con = await inst.connect();
      try {
        const result = await con.stream(sql()).catch((e: unknown) => { throw readError(path, e); });
        for (;;) {
          const chunk = await result.fetchChunk().catch((e: unknown) => { throw readError(path, e); });
          if (chunk === null || chunk.rowCount === 0) break;
          const cols = chunk.getColumns() as Cell[][];
          const n = chunk.rowCount;
          for (let r = 0; r < n; r++) {
            for (let c = 0; c < cols.length; c++) builder.cols[c]!.push(cols[c]![r] ?? null);
            builder.rowDone();
          }
          yield* builder.takeReady();
        }
        yield* builder.finish();
      } finally {
        con.closeSync();
      }
    },
    async close() {
      if (!closed) inst.closeSync();
      closed = true;
    },
  };
}

/** Casts in SQL so DuckDB hands back plain JS numbers, booleans and strings. */
function selectExpr(name: string, kind: ColumnKind, id: DuckDBTypeIdType): string {
  const { DuckDBTypeId } = duckdb();
  const c = ident(name);
  if (kind === 'string' && id !== DuckDBTypeId.VARCHAR) return `CAST(${c} AS VARCHAR)`;
  if (kind === 'int' || id === DuckDBTypeId.DECIMAL) return `CAST(${c} AS DOUBLE)`;
  return c;
}

async function checkMagic(path: string): Promise<void> {
  const fh = await open(path, 'r');
  try {
    const size = (await fh.stat()).size;
    const head = Buffer.alloc(4);
    const tail = Buffer.alloc(4);
    await fh.read(head, 0, 4, 0);
    if (head[0] === 0x1f && head[1] === 0x8b) {
      throw new CatalogError(`${path}: gzip-compressed Parquet is not read (Parquet compresses its own pages); decompress it first (gunzip)`);
    }
    if (head.toString('latin1') !== 'PAR1') throw new CatalogError(`${path}: not a Parquet file: it does not begin with "PAR1"`);
    if (size >= 12) await fh.read(tail, 0, 4, size - 4);
    if (size < 12 || tail.toString('latin1') !== 'PAR1') {
      throw new CatalogError(`${path}: truncated Parquet file: it does not end with "PAR1"`);
    }
  } finally {
    await fh.close();
  }
}

async function query(con: DuckDBConnection, sql: string, path: string) {
  try {
    return await con.runAndReadAll(sql);
  } catch (e) {
    throw readError(path, e);
  }
}

function readError(path: string, e: unknown): CatalogError {
  const msg = (e instanceof Error ? e.message : String(e)).split('\n')[0]!.trim();
  return new CatalogError(`${path}: cannot read Parquet file: ${msg}`);
}

function kvMeta(rows: unknown[][], columns: ColumnInfo[]): Record<string, unknown> {
  const meta: Record<string, unknown> = {};
  for (const [k, v] of rows) {
    const key = bytesToText(k);
    if (key === 'ARROW:schema') continue;
    const value = bytesToText(v);
    if (key === 'table_meta_yaml' && applyAstropyYaml(value, columns, meta)) continue;
    meta[key] = value;
  }
  return meta;
}

/** Reads Astropy's `table_meta_yaml` (an ECSV-style header); false if it does not parse. */
function applyAstropyYaml(text: string, columns: ColumnInfo[], meta: Record<string, unknown>): boolean {
  const doc = parseDocument(text, { schema: 'yaml-1.1', logLevel: 'silent' });
  if (doc.errors.length > 0) return false;
  const h = toPlain(doc.toJS()) as { datatype?: unknown; meta?: unknown } | null;
  if (h === null || typeof h !== 'object') return false;
  if (Array.isArray(h.datatype)) {
    for (const d of h.datatype as Record<string, unknown>[]) {
      const col = columns.find((c) => c.name === d?.name);
      if (!col) continue;
      if (typeof d.unit === 'string') col.unit = d.unit;
      if (typeof d.description === 'string') col.description = d.description;
    }
  }
  if (h.meta && typeof h.meta === 'object' && !Array.isArray(h.meta)) Object.assign(meta, h.meta);
  return true;
}

/**
 * The mask columns astropy wrote for its masked columns. astropy's Parquet writer does not use
 * Parquet's nulls: a MaskedColumn `x` is stored as the column `x` (masked cells hold a fill value)
 * and a boolean column `x.mask`, both named under `__serialized_columns__` in `table_meta_yaml`
 * (astropy.io.misc.parquet with astropy.table.serialize). Only pairs whose two columns are both
 * in the file, the mask boolean, are used; then `__serialized_columns__` leaves `meta` when every
 * entry was such a pair.
 */
function astropyMasks(meta: Record<string, unknown>, columns: readonly ColumnInfo[]): { maskOf: Map<number, number>; maskColumns: Set<number> } {
  const maskOf = new Map<number, number>();
  const maskColumns = new Set<number>();
  const serialized = meta.__serialized_columns__;
  if (!serialized || typeof serialized !== 'object' || Array.isArray(serialized)) return { maskOf, maskColumns };
  const byName = new Map(columns.map((c, i) => [c.name, i]));
  const index = (name: unknown): number => (typeof name === 'string' ? (byName.get(name) ?? -1) : -1);
  let all = true;
  for (const [name, entry] of Object.entries(serialized as Record<string, unknown>)) {
    const e = entry as { __class__?: unknown; data?: { name?: unknown }; mask?: { name?: unknown } } | null;
    const d = index(e?.data?.name);
    const m = index(e?.mask?.name);
    const pair = e?.__class__ === 'astropy.table.column.MaskedColumn' && d >= 0 && m >= 0 && d !== m && columns[m]!.kind === 'bool' && e.data?.name === name;
    if (!pair || maskOf.has(d) || maskColumns.has(m)) {
      all = false;
      continue;
    }
    maskOf.set(d, m);
    maskColumns.add(m);
  }
  if (all) delete meta.__serialized_columns__;
  return { maskOf, maskColumns };
}

function bytesToText(x: unknown): string {
  if (typeof x === 'string') return x;
  if (x && typeof x === 'object' && 'bytes' in x && x.bytes instanceof Uint8Array) return Buffer.from(x.bytes).toString('utf8');
  if (x instanceof Uint8Array) return Buffer.from(x).toString('utf8');
  return String(x);
}

function ident(name: string): string {
  return `"${name.replace(/"/g, '""')}"`;
}

function sqlString(s: string): string {
  return `'${s.replace(/'/g, "''")}'`;
}
