import type { ObjectInputs } from '../../core/derive/types.ts';
import type { Cell } from '../readers/types.ts';

/** One problem of one row, as normalizeChunk reports it (src/catalog/normalize). */
export interface RowProblemLike {
  row: number;
  id: string | null;
  column: string;
  value: unknown;
  reason: string;
  message: string;
}

/**
 * The parts of a normalized row (src/catalog/normalize's NormalizedRow) the derive run reads:
 * declared structurally so this module depends only on the fields it uses.
 */
export interface NormalizedRowLike {
  /** 1-based data row number in the file. */
  row: number;
  id: string | null;
  /** Canonical inputs, or null when the row cannot be derived. */
  inputs: ObjectInputs | null;
  /** Canonical column values in canonical units, by canonical name. */
  canonical: Record<string, number | string | boolean | null>;
  /** Values of the plan's passthrough columns, in plan order. */
  passthrough: Cell[];
  problems: readonly RowProblemLike[];
}
