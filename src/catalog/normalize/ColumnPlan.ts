import type { ColumnInfo, ColumnKind } from '../readers/types.ts';
import type { CanonicalColumn, CanonicalKind } from './canonicalColumns.ts';

/** How one canonical column is read from the file. */
export interface PlannedColumn {
  /** Canonical name. */
  name: string;
  /** Index of the file column in `TableSource.columns` (and `TableChunk.columns`). */
  sourceIndex: number;
  /** Name of the file column. */
  sourceName: string;
  /** Unit of the file's values (config override, else file metadata, else for an error column its value's unit); undefined means the canonical unit. */
  unitIn?: string;
  /** Converts a file value to the canonical unit (for error columns: the scale only, no zero-point shift). */
  convert: (x: number) => number;
  /** What the canonical column holds. */
  kind: CanonicalKind;
  /** What the file column holds. */
  fileKind: ColumnKind;
  /** The canonical column's definition (description, unit, UCD, limits). */
  def: CanonicalColumn;
  /** Unit shown in row messages next to the value as given: `unitIn`, else the canonical unit as people write it (`def.unitText`). */
  unitLabel: string;
  /** Name shown in row messages: the canonical name, with the file's column name when it differs. */
  label: string;
}

/** A file column that is not a canonical input and is copied to the output unchanged. */
export interface PassthroughColumn {
  name: string;
  sourceIndex: number;
  info: ColumnInfo;
}

/** How each column of a catalog is read: produced by planColumns, consumed by normalizeChunk. */
export interface ColumnPlan {
  /** File name as shown in messages. */
  label: string;
  /** The canonical columns found in the file, in the order of CANONICAL_COLUMNS. */
  canonical: PlannedColumn[];
  /** The other file columns, in file order. */
  passthrough: PassthroughColumn[];
  /**
   * First data row (1-based) of each id seen so far, so that normalizeChunk flags duplicates
   * across chunks. Chunks must therefore go through normalizeChunk in file order, once.
   */
  seenIds: Map<string, number>;
}
