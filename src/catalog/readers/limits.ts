/**
 * Bounds every reader enforces, so that no input (truncated, corrupt or hostile) can make a
 * reader hang, loop or exhaust memory. Passing a bound is a one-line {@link CatalogError}
 * (exit status 2) that names the file, the place and the limit.
 */

/** Most columns a table may have (FITS allows 999; a catalog with more is almost surely a mistake). */
export const MAX_COLUMNS = 10_000;

/** Longest cell, in characters, of a text format (CSV, TSV, ECSV, VOTable TD) or a VOTable BINARY string. */
export const MAX_FIELD_CHARS = 4 << 20;

/** Most characters in one row of a text format (all its cells together). */
export const MAX_RECORD_CHARS = 32 << 20;

/** Longest piece of XML markup (one tag, comment or declaration) or pending text. */
export const MAX_XML_PENDING_CHARS = 8 << 20;

/** Largest FITS header of one HDU, in 2880-byte blocks (36,000 cards). */
export const MAX_FITS_HEADER_BLOCKS = 1000;

/** Most HDUs looked at before the binary table. */
export const MAX_FITS_HDUS = 1000;

/** Widest FITS binary-table row (NAXIS1), in bytes. */
export const MAX_FITS_ROW_BYTES = 1 << 20;

/** Most leading comment lines kept in `meta.comments` (the rest are read and dropped). */
export const MAX_META_COMMENTS = 1000;

/** Longest comment line kept in `meta.comments`, in characters. */
export const MAX_COMMENT_CHARS = 4096;
