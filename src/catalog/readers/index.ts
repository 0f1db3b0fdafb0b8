/**
 * Catalog readers: `openTable(path, { format?, commentPrefix? })` opens CSV, TSV, ECSV, FITS
 * (BINTABLE), VOTable (TABLEDATA, BINARY, BINARY2) or Parquet into one streaming `TableSource`;
 * all but Parquet may be gzip-compressed. Every file problem is a one-line `CatalogError`, and
 * every size a file declares is bounded (limits.ts).
 *
 * Deliberate limits (each reader's TSDoc has the details):
 * - Only scalar columns: FITS repeat > 1, VOTable numeric arraysize, ECSV subtype and Parquet
 *   nested types are refused with a CatalogError naming the column (they are not flattened).
 * - 64-bit integers beyond ±(2^53 − 1) make their column kind `string` (exact digits), never rounded.
 * - Null conventions: empty cells (CSV/TSV/ECSV/VOTable), FITS TNULL and NaN, VOTable VALUES null,
 *   NaN and the BINARY2 null bit, Parquet NULL. NaN/±inf text stays numeric in CSV/TSV/ECSV, as
 *   does NaN in Parquet (normalization reads NaN as missing).
 * - The VOTable FITS serialization and gzip-compressed Parquet are refused; only the first
 *   BINTABLE of a FITS file and the first TABLE of a VOTable are read.
 * - Text formats are read twice (a checking/inference pass at open, then `chunks()`); memory is
 *   bounded by one 1 MiB read buffer plus one chunk, whatever the file size.
 */
export type { Cell, ColumnInfo, ColumnKind, TableChunk, TableFormat, TableSource } from './types.ts';
export { CatalogError } from './CatalogError.ts';
export { openTable, formatFromPath } from './openTable.ts';
