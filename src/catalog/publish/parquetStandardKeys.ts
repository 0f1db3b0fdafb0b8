import { astropyHeaderLines } from './astropyHeader.ts';
import type { TableDoc } from './tableDoc.ts';
import { votableParts } from './votableXml.ts';

/**
 * The Parquet key/value metadata that other tools read, beside our own `dawn_census` key:
 * - `table_meta_yaml`: astropy's table header (units, descriptions, UCDs under meta), which
 *   `astropy.table.Table.read(..., format='parquet')` applies when pyarrow is installed;
 * - `table::len::<name>` for each text column: its longest value in code points (at least 1),
 *   which astropy's Parquet reader takes as the column's string width; without it, astropy 5.2
 *   measures every value itself and fails on a null one (astropy.io.misc.parquet);
 * - `IVOA.VOTable-Parquet.version` = "1.0" and `IVOA.VOTable-Parquet.content`, a data-less
 *   VOTable with one FIELD per column (IVOA VOParquet 1.0 Note, 2025-01-16), for VO tools.
 */
export function parquetStandardKeys(doc: TableDoc, textLengths: ReadonlyMap<string, number>): Record<string, string> {
  const { head, tail } = votableParts(doc);
  const lengths: Record<string, string> = {};
  for (const c of doc.columns) {
    if (c.kind !== 'string') continue;
    const n = textLengths.get(c.name);
    if (n === undefined) throw new Error(`no text length recorded for the column ${c.name}`);
    lengths[`table::len::${c.name}`] = String(Math.max(1, n));
  }
  return {
    ...lengths,
    table_meta_yaml: astropyHeaderLines(doc).join('\n'),
    'IVOA.VOTable-Parquet.version': '1.0',
    'IVOA.VOTable-Parquet.content': head + tail,
  };
}
