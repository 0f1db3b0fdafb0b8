import { astropyHeaderLines } from './astropyHeader.ts';
import type { TableDoc } from './tableDoc.ts';
import { votableParts } from './votableXml.ts';

/**
 * The Parquet key/value metadata that other tools read, beside our own `dawn_census` key:
 * - `table_meta_yaml`: astropy's table header (units, descriptions, UCDs under meta), which
 *   `astropy.table.Table.read(..., format='parquet')` applies when pyarrow is installed;
 * - `IVOA.VOTable-Parquet.version` = "1.0" and `IVOA.VOTable-Parquet.content`, a data-less
 *   VOTable with one FIELD per column (IVOA VOParquet 1.0 Note, 2025-01-16), for VO tools.
 */
export function parquetStandardKeys(doc: TableDoc): Record<string, string> {
  const { head, tail } = votableParts(doc);
  return {
    table_meta_yaml: astropyHeaderLines(doc).join('\n'),
    'IVOA.VOTable-Parquet.version': '1.0',
    'IVOA.VOTable-Parquet.content': head + tail,
  };
}
