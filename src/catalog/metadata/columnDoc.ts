import type { ValueKind } from '../parquet/parquetWriter.ts';

/** Where an output column comes from. */
export type ColumnGroup = 'key' | 'input' | 'passthrough' | 'derived';

/** What a reader of the catalog needs to know about one output column. */
export interface ColumnDoc {
  name: string;
  kind: ValueKind;
  group: ColumnGroup;
  /** Unit in IVOA VOUnits notation ('' for dimensionless); absent for text and identifiers. */
  unit?: string;
  description: string;
  /** IVOA UCD1+ word(s), only where one fits the quantity. */
  ucd?: string;
  /** The paper(s) a derived value rests on. */
  reference?: string;
}
