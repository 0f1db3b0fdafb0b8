/**
 * Catalog readers: `openTable(path, { format? })` opens CSV, TSV, ECSV, FITS (BINTABLE), VOTable
 * (TABLEDATA) or Parquet into one streaming `TableSource`. Every file problem is a one-line
 * `CatalogError`.
 *
 * Deliberate limits (each reader's TSDoc has the details):
 * - Only scalar columns: FITS repeat > 1, VOTable numeric arraysize, ECSV subtype and Parquet
 *   nested types are refused with a CatalogError naming the column (they are not flattened).
 * - 64-bit integers beyond ±(2^53 − 1) make their column kind `string` (exact digits), never rounded.
 * - Null conventions: empty cells (CSV/TSV/ECSV/VOTable), FITS TNULL and NaN, VOTable VALUES null
 *   and NaN, Parquet NULL. NaN/±inf text stays numeric in CSV/TSV/ECSV, as does NaN in Parquet.
 * - Gzip-compressed FITS and VOTable BINARY/BINARY2/FITS serializations are refused; only the
 *   first BINTABLE of a FITS file and the first TABLE of a VOTable are read.
 * - Text formats are read twice (a checking/inference pass at open, then `chunks()`); memory is
 *   bounded by one 1 MiB read buffer plus one chunk, whatever the file size.
 */
export type { Cell, ColumnInfo, ColumnKind, TableChunk, TableFormat, TableSource } from './types.ts';
export { CatalogError } from './CatalogError.ts';
export { openTable, formatFromPath } from './openTable.ts';
