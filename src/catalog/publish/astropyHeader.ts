import { stringify } from 'yaml';
import type { ColumnDoc } from '../metadata/columnDoc.ts';
import type { TableDoc } from './tableDoc.ts';

/** astropy's datatype name for each output kind (ECSV 1.0). */
export const ECSV_DATATYPE: Record<ColumnDoc['kind'], string> = { float: 'float64', int: 'int64', bool: 'bool', string: 'string' };

/**
 * The table header as astropy writes it for ECSV and for Parquet's `table_meta_yaml` key: a YAML
 * mapping with `datatype` (name, datatype, unit, description and the UCD under `meta.ucd`, one
 * entry a column) and the table's `meta`. Returned as lines without the ECSV `# ` prefix, the
 * form `astropy.table.meta.get_header_from_yaml` reads. `delimiter` is added for ECSV only.
 */
export function astropyHeaderLines(doc: TableDoc, delimiter?: ','): string[] {
  const datatype = doc.columns.map((c) => ({
    name: c.name,
    ...(c.unit ? { unit: c.unit } : {}),
    datatype: ECSV_DATATYPE[c.kind],
    description: c.description,
    ...(c.ucd ? { meta: { ucd: c.ucd } } : {}),
  }));
  const meta = Object.fromEntries([...(doc.description ? [['description', doc.description]] : []), ...doc.meta]);
  const header = { ...(delimiter ? { delimiter } : {}), datatype, meta };
  return stringify(header, { lineWidth: 0 }).trimEnd().split('\n');
}
