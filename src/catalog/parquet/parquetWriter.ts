import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import { duckdb, duckdbBindings } from '../duckdb/nodeApi.ts';
import type { DuckDBAppender, DuckDBConnection, DuckDBType } from '@duckdb/node-api';
import type { DataChunk, Vector } from '@duckdb/node-bindings';
import { sqlIdentifier, sqlString } from './sqlLiteral.ts';


/** Storage kind of an output column (the readers' `ColumnInfo.kind`). */
export type ValueKind = 'float' | 'int' | 'bool' | 'string';

/** One column of the Parquet file: its name and storage kind. */
export interface ParquetColumn {
  name: string;
  kind: ValueKind;
}

/** A value handed to `appendRow`; `null`/`undefined` (and NaN in a float column) are written as NULL. */
export type CellValue = number | bigint | string | boolean | null | undefined;

/** Streams rows into a scratch DuckDB table, then writes them to one Parquet file. */
export interface ParquetWriter {
  /** Appends one row: `values[i]` belongs to `columns[i]`. The array may be reused by the caller. */
  appendRow(values: ArrayLike<CellValue>): void;
  /** Rows appended so far. */
  readonly rowCount: number;
  /**
   * The longest value appended so far in each text column, in Unicode code points (what Python's
   * `len` counts, and so astropy's `table::len::<name>` keys); 0 for a column without values.
   */
  textLengths(): Map<string, number>;
  /**
   * Ends appending: every appended row is committed to the scratch table, which `queryRows` can
   * then read. Called by `finish` if not before; no row may be appended after it.
   */
  commit(): Promise<void>;
  /**
   * Runs `sql` on the committed rows (the scratch table is named `rows`) and returns the result's
   * rows as plain JS objects. Only between `commit` and `finish`.
   */
  queryRows(sql: string): Promise<Record<string, unknown>[]>;
  /**
   * Writes every appended row, in insertion order, to `parquetPath` (zstd level 1, single-threaded so
   * that the bytes depend only on the rows and the metadata), with `kvMetadata` as Parquet
   * key/value metadata, then closes the scratch database.
   */
  finish(kvMetadata: Readonly<Record<string, string>>): Promise<void>;
  /** Closes the scratch database without writing; never throws. */
  abort(): Promise<void>;
}

/** Options of `openParquetWriter`. */
export interface ParquetWriterOptions {
  /** Directory for the scratch DuckDB database (created; the caller removes it). */
  scratchDir: string;
  /**
   * DuckDB memory limit (default {@link scratchMemoryLimit} of the column count): DuckDB's
   * buffer pool (the table's blocks, the rows appended since the last complete row group) is
   * held under it; the table itself is on disk.
   */
  memoryLimit?: string;
}

/**
 * Most columns the writer accepts. Wider tables are refused with a message before any row is
 * read: DuckDB's Parquet writer keeps buffers for every column, so memory grows with the width
 * (about 550 MB at this width, see scratchMemoryLimit).
 */
export const MAX_PARQUET_COLUMNS = 5000;

/**
 * The scratch database's memory limit for `columns` columns: 128 MB, or 64 MB plus 96 KB per
 * column when that is more. Measured (DuckDB 1.5, 300 and 2000 rows of DOUBLE columns): COPY
 * to Parquet ran out of memory with 3,037 columns under 128 MB and succeeded under 256 MB, and
 * 6,000 columns succeeded under 512 MB; 96 KB a column leaves a margin over both.
 */
export function scratchMemoryLimit(columns: number): string {
  return `${Math.max(128, Math.ceil(64 + (columns * 96) / 1024))}MB`;
}

const SQL_TYPE: Record<ValueKind, string> = { float: 'DOUBLE', int: 'BIGINT', bool: 'BOOLEAN', string: 'VARCHAR' };

/**
 * Opens a writer for `parquetPath` with the given columns. Rows go to a DuckDB database on disk
 * in `scratchDir`, so a million-row catalog does not sit in memory, and are copied to Parquet by
 * `finish`. Memory held: about one data chunk on the JS side, plus DuckDB's buffer pool
 * (`memoryLimit`) and the row group COPY is compressing.
 */
export async function openParquetWriter(
  parquetPath: string,
  columns: readonly ParquetColumn[],
  options: ParquetWriterOptions,
): Promise<ParquetWriter> {
  if (columns.length > MAX_PARQUET_COLUMNS) {
    throw new Error(`${columns.length} columns is more than the ${MAX_PARQUET_COLUMNS} the Parquet writer accepts`);
  }
  await mkdir(options.scratchDir, { recursive: true });
  const { DuckDBDataChunk, DuckDBInstance } = duckdb();
  const instance = await DuckDBInstance.create(path.join(options.scratchDir, 'rows.duckdb'), {
    threads: '1',
    preserve_insertion_order: 'true',
    memory_limit: options.memoryLimit ?? scratchMemoryLimit(columns.length),
    temp_directory: path.join(options.scratchDir, 'spill'),
  });
  let connection: DuckDBConnection | null = null;
  let appender: DuckDBAppender | null = null;
  const close = (): void => {
    try {
      appender?.closeSync();
    } catch {
      // already closed or failed: nothing more to release
    }
    appender = null;
    connection?.closeSync();
    connection = null;
    instance.closeSync();
  };
  try {
    connection = await instance.connect();
    // The scratch database is thrown away once the Parquet file is written: closing it must not
    // first checkpoint the whole table into its file (a few hundred ms of the main thread).
    await connection.run('PRAGMA disable_checkpoint_on_shutdown');
    const defs = columns.map((c) => `${sqlIdentifier(c.name)} ${SQL_TYPE[c.kind]}`).join(', ');
    await connection.run(`CREATE TABLE rows (${defs})`);
    // One transaction for all rows: the appended rows then go straight into the database file
    // a row group at a time (not through the write-ahead log), and COMMIT in `finish` only links them.
    await connection.run('BEGIN TRANSACTION');
    appender = await connection.createAppender('rows');
  } catch (error) {
    close();
    throw error;
  }
  const app = appender;
  const con = connection;
  const duckType = duckTypes();
  const types = columns.map((c) => duckType[c.kind]);
  const chunk = DuckDBDataChunk.create(types, VECTOR_ROWS);
  const rows = new ChunkColumns(columns, chunk.chunk);
  let inChunk = 0;
  let rowCount = 0;
  let committed = false;
  const textColumns = columns.flatMap((c, i) => (c.kind === 'string' ? [i] : []));
  const textLength = new Array<number>(textColumns.length).fill(0);

  // Rows are gathered column-wise for a DuckDB data chunk (numbers in typed arrays on the JS side,
  // copied in one call per column; see ChunkColumns), far cheaper than one native call per value.
  const flushChunk = (): void => {
    if (inChunk === 0) return;
    rows.copyOut(inChunk);
    if (inChunk < VECTOR_ROWS) chunk.rowCount = inChunk;
    app.appendDataChunk(chunk);
    // The appender keeps what it is given in its own buffer (outside DuckDB's memory limit) until
    // it holds 100 data chunks, i.e. 204,800 rows: hundreds of MB for a wide catalog. Flushing
    // each chunk hands the rows to the table at once, where the memory limit holds them.
    app.flushSync();
    // One chunk, reused: its native memory is invisible to the JS garbage collector, so fresh
    // chunks would pile up unreleased.
    chunk.reset();
    chunk.rowCount = VECTOR_ROWS;
    rows.restart();
    inChunk = 0;
  };

  const commit = async (): Promise<void> => {
    if (committed) return;
    committed = true;
    flushChunk();
    app.flushSync();
    app.closeSync();
    appender = null;
    await con.run('COMMIT');
  };

  return {
    get rowCount() {
      return rowCount;
    },
    textLengths() {
      return new Map(textColumns.map((i, k) => [columns[i]!.name, textLength[k]!]));
    },
    appendRow(values) {
      if (committed) throw new Error('appendRow after commit');
      rows.put(inChunk, values);
      for (let k = 0; k < textColumns.length; k++) {
        const v = values[textColumns[k]!];
        if (v === null || v === undefined) continue;
        const text = typeof v === 'string' ? v : String(v);
        // Code points never outnumber UTF-16 units, so only a longer text needs counting.
        if (text.length > textLength[k]!) textLength[k] = Math.max(textLength[k]!, codePoints(text));
      }
      inChunk++;
      rowCount++;
      if (inChunk === VECTOR_ROWS) flushChunk();
    },
    commit,
    async queryRows(sql) {
      if (!committed) throw new Error('queryRows before commit: the rows are not in the table yet');
      return (await con.runAndReadAll(sql)).getRowObjectsJS() as Record<string, unknown>[];
    },
    async finish(kvMetadata) {
      try {
        await commit();
        const kv = Object.entries(kvMetadata)
          .map(([k, v]) => `${sqlString(k)}: ${sqlString(v)}`)
          .join(', ');
        const kvClause = kv ? `, KV_METADATA {${kv}}` : '';
        // zstd at level 1 rather than DuckDB's 3: measured on a 20,000-row catalog of 46 columns,
        // 40 against 53–68 ms of the run's last, single-threaded step, for a file 0.9 % larger.
        await con.run(`COPY rows TO ${sqlString(parquetPath)} (FORMAT parquet, COMPRESSION zstd, COMPRESSION_LEVEL 1${kvClause})`);
      } finally {
        close();
      }
    },
    async abort() {
      try {
        close();
      } catch {
        // reporting another error: a failing close must not hide it
      }
    },
  };
}

/** Unicode code points in `text` (a surrogate pair counts once). */
export function codePoints(text: string): number {
  let n = text.length;
  for (let i = 0; i < text.length - 1; i++) {
    const c = text.charCodeAt(i);
    if (c >= 0xd800 && c <= 0xdbff) {
      const d = text.charCodeAt(i + 1);
      if (d >= 0xdc00 && d <= 0xdfff) {
        n--;
        i++;
      }
    }
  }
  return n;
}

/** Rows of one DuckDB data chunk (DuckDB's standard vector size). */
const VECTOR_ROWS = 2048;

/** DuckDB's type of each storage kind. */
function duckTypes(): Record<ValueKind, DuckDBType> {
  const { BIGINT, BOOLEAN, DOUBLE, VARCHAR } = duckdb();
  return { float: DOUBLE, int: BIGINT, bool: BOOLEAN, string: VARCHAR };
}

const KIND_CODE: Record<ValueKind, number> = { float: 0, int: 1, bool: 2, string: 3 };

/**
 * The rows of one DuckDB data chunk, column by column, kept in JavaScript arrays and copied into
 * the chunk's vectors once it is full (text goes straight to its vector: DuckDB keeps its own
 * copy). What @duckdb/node-api's vector classes do per value, without their cost: they set a
 * value's validity with BigInt arithmetic (a heap allocation per value once a column had a null),
 * which was most of the main thread's garbage in a derive run. A value becomes NULL as node-api's
 * conversions make it: null or undefined in every column, NaN in a float column, a non-integer
 * number in an int column.
 */
class ChunkColumns {
  private readonly kinds: Int32Array;
  private readonly floats: (Float64Array | null)[];
  private readonly ints: (BigInt64Array | null)[];
  private readonly bools: (Uint8Array | null)[];
  /** Validity of each column's rows: bit r of word r >> 5 (DuckDB's uint64 words, little-endian). */
  private readonly valid: Uint32Array[];
  /** Columns with a null in the current chunk (their validity is copied). */
  private readonly hasNull: Uint8Array;
  private vectors: Vector[];
  private readonly rawChunk: DataChunk;
  private readonly bindings = duckdbBindings();

  constructor(columns: readonly ParquetColumn[], rawChunk: DataChunk) {
    const n = columns.length;
    this.rawChunk = rawChunk;
    this.kinds = Int32Array.from(columns, (c) => KIND_CODE[c.kind]);
    this.floats = columns.map((c) => (c.kind === 'float' ? new Float64Array(VECTOR_ROWS) : null));
    this.ints = columns.map((c) => (c.kind === 'int' ? new BigInt64Array(VECTOR_ROWS) : null));
    this.bools = columns.map((c) => (c.kind === 'bool' ? new Uint8Array(VECTOR_ROWS) : null));
    this.valid = Array.from({ length: n }, () => new Uint32Array(VECTOR_ROWS / 32).fill(0xffffffff));
    this.hasNull = new Uint8Array(n);
    this.vectors = [];
    this.restart();
  }

  /** After the chunk was reset: its vectors, and every row valid. */
  restart(): void {
    const b = this.bindings;
    this.vectors = Array.from(this.kinds, (_, i) => b.data_chunk_get_vector(this.rawChunk, i));
    for (let i = 0; i < this.kinds.length; i++) {
      if (this.hasNull[i]) (this.valid[i] as Uint32Array).fill(0xffffffff);
      this.hasNull[i] = 0;
    }
  }

  /** Row `r` of the chunk: `values[i]` for column i. */
  put(r: number, values: ArrayLike<CellValue>): void {
    const kinds = this.kinds;
    for (let i = 0; i < kinds.length; i++) {
      const v = values[i];
      switch (kinds[i]) {
        case 0: {
          const x = v === null || v === undefined ? NaN : typeof v === 'number' ? v : Number(v);
          if (x === x) (this.floats[i] as Float64Array)[r] = x;
          else this.setNull(i, r);
          break;
        }
        case 1: {
          const x = typeof v === 'bigint' ? v : typeof v === 'number' ? (Number.isInteger(v) ? BigInt(v) : null) : typeof v === 'boolean' ? (v ? 1n : 0n) : null;
          if (x !== null) (this.ints[i] as BigInt64Array)[r] = x;
          else this.setNull(i, r);
          break;
        }
        case 2:
          if (v === null || v === undefined) this.setNull(i, r);
          else (this.bools[i] as Uint8Array)[r] = (typeof v === 'boolean' ? v : Boolean(v)) ? 1 : 0;
          break;
        default:
          if (v === null || v === undefined) this.setNull(i, r);
          else this.bindings.vector_assign_string_element(this.vectors[i] as Vector, r, typeof v === 'string' ? v : String(v));
      }
    }
  }

  private setNull(i: number, r: number): void {
    const w = this.valid[i] as Uint32Array;
    w[r >>> 5] = (w[r >>> 5] as number) & ~(1 << (r & 31));
    this.hasNull[i] = 1;
  }

  /** Copies the first `count` rows of every column into the chunk's vectors. */
  copyOut(count: number): void {
    const b = this.bindings;
    for (let i = 0; i < this.kinds.length; i++) {
      const vector = this.vectors[i] as Vector;
      const data = this.floats[i] ?? this.ints[i] ?? this.bools[i];
      if (data) b.copy_data_to_vector(vector, 0, data.buffer as ArrayBuffer, 0, count * data.BYTES_PER_ELEMENT);
      if (this.hasNull[i]) {
        b.vector_ensure_validity_writable(vector);
        b.copy_data_to_vector_validity(vector, 0, (this.valid[i] as Uint32Array).buffer as ArrayBuffer, 0, VECTOR_ROWS / 8);
      }
    }
  }
}
