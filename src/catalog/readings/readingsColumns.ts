import type { ColumnDoc } from '../metadata/columnDoc.ts';
import { DERIVED_PERCENTILES, DERIVED_TAIL } from '../metadata/derivedColumns.ts';
import type { DerivedColumnSpec } from '../metadata/derivedColumns.ts';
import { packedField } from '../derive/packedDerived.ts';
import type { PackedDerived } from '../derive/packedDerived.ts';
import type { CellValue } from '../parquet/parquetWriter.ts';

/** One row of the readings table: an object under one reading. */
export interface ReadingRowContext {
  id: string;
  reading: string;
  /** The object's results under this reading, or null where it was not derived. */
  packed: PackedDerived | null;
  k: number;
  flags: string;
}

/** A column of the readings table: its documentation and how its value is read. */
export interface ReadingsColumn extends ColumnDoc {
  value: (c: ReadingRowContext) => CellValue;
}

/** The derived columns the readings table repeats, in its order (a subset of the main catalog's). */
export const READINGS_DERIVED_NAMES = [
  'log_mbh', 'log_mbh_p16', 'log_mbh_p50', 'log_mbh_p84', 'mbh_method',
  'log_lbol', 'log_lbol_p16', 'log_lbol_p84', 'lbol_method',
  'log_edd_ratio', 'log_edd_ratio_p16', 'log_edd_ratio_p84', 'p_super_eddington',
  'delta_log_mbh_local', 'p_above_local', 'log_mseed', 'lambda_req_light', 'lambda_req_heavy', 'flags',
] as const;

const SPECS = new Map<string, DerivedColumnSpec>([...DERIVED_TAIL, ...DERIVED_PERCENTILES].map((s) => [s.name, s]));

function column(spec: DerivedColumnSpec): ReadingsColumn {
  const { source, topic: _topic, ...doc } = spec;
  let value: ReadingsColumn['value'];
  if (source === 'flags') value = (c) => c.flags;
  else if (source === 'mbhMethod' || source === 'lbolMethod') value = (c) => (c.packed ? c.packed[source][c.k] : null);
  else {
    const read = packedField(source);
    value = (c) => (c.packed ? read(c.packed, c.k) : null);
  }
  const description =
    source === 'flags' ? `${doc.description}; under this reading, also the reading's own flags (width_from_core, core_width_fallback, width_deflated, dust_off_by_reading, lbol_route_unchanged)` : `${doc.description}, under this row's reading`;
  return { ...doc, description, group: 'derived', value };
}

/** The columns of `readings.parquet`, in order: id, reading, then the derived quantities. */
export const READINGS_COLUMNS: readonly ReadingsColumn[] = [
  { name: 'id', kind: 'string', group: 'key', description: 'Object identifier, as in the catalog', ucd: 'meta.id', value: (c) => c.id },
  { name: 'reading', kind: 'string', group: 'key', description: 'Id of the reading of the broad lines these values are derived under (see the metadata)', ucd: 'meta.code', value: (c) => c.reading },
  ...READINGS_DERIVED_NAMES.map((n) => column(SPECS.get(n)!)),
];
