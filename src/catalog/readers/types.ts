/**
 * Shared contract of the catalog readers: every format (CSV, TSV, ECSV, FITS, VOTable, Parquet)
 * opens into a {@link TableSource} that streams its rows column-wise in chunks.
 */

/** Kind of values a column holds once read: IEEE doubles, integers (as numbers), booleans or text. */
export type ColumnKind = 'float' | 'int' | 'bool' | 'string';

/** Description of one column, as declared by the file (or inferred, for CSV/TSV). */
export interface ColumnInfo {
  /** Column name exactly as in the file (after trimming surrounding blanks). */
  name: string;
  /** Kind of every non-null cell of this column. */
  kind: ColumnKind;
  /** Unit string as written in the file (e.g. `km / s`), not normalised. */
  unit?: string;
  /** Free-text description, where the format carries one. */
  description?: string;
  /** IVOA Unified Content Descriptor, where the format carries one. */
  ucd?: string;
  /**
   * The column's type as the file declares it, where the kind alone loses it (Parquet:
   * `BIGINT`, `DECIMAL(18,4)`, `INTEGER`, ...; ECSV: `int64`, `float32`, ...), so a writer can
   * give a passed-through column back its own type.
   */
  fileType?: string;
}

/**
 * One cell value. `null` stands for an empty, missing, TNULL or NULL cell. Numbers of an `int`
 * column are always safe integers; a `float` column may hold NaN or ±Infinity only where the
 * format has no null convention for them (CSV/TSV/ECSV/Parquet).
 */
export type Cell = number | string | boolean | null;

/** A block of consecutive rows, stored column-wise. */
export interface TableChunk {
  /** 0-based index of the first row of this chunk in the table. */
  rowOffset: number;
  /** Number of rows in this chunk (every `columns[i]` has this length). */
  nRows: number;
  /** `columns[i]` holds the cells of `TableSource.columns[i]` for these rows. */
  columns: Cell[][];
}

/** Catalog file formats understood by {@link openTable}. */
export type TableFormat = 'csv' | 'tsv' | 'ecsv' | 'fits' | 'votable' | 'parquet';

/** An opened catalog: its schema, file-level metadata and a re-readable stream of row chunks. */
export interface TableSource {
  /** Path the table was opened from. */
  path: string;
  /** Format the table was read as. */
  format: TableFormat;
  /** Columns in file order. */
  columns: ColumnInfo[];
  /** Number of data rows, when known cheaply (all readers here know it after opening). */
  nRows?: number;
  /** File-level metadata (ECSV meta, FITS header keywords, VOTable PARAMs/DESCRIPTION, Parquet key-value metadata). */
  meta: Record<string, unknown>;
  /**
   * Streams the rows in chunks of at most `chunkRows` rows (default 10 000); every chunk but the
   * last is full. May be called more than once: each call re-reads the file from the start.
   */
  chunks(chunkRows?: number): AsyncIterable<TableChunk>;
  /**
   * Makes later `chunks()` calls return column `index` as text, and sets its kind to `string`:
   * exactly as written for the text formats (CSV, TSV, ECSV, VOTable TABLEDATA: `007`, `1e3`,
   * `3.0` stay so), the shortest decimal that reads back to the stored number for binary ones
   * (FITS, VOTable BINARY, Parquet numbers; Parquet DECIMAL keeps its scale). Ids are read so.
   */
  keepAsText(index: number): void;
  /** Releases the resources held by the source; `chunks()` must not be called afterwards. */
  close(): Promise<void>;
}
