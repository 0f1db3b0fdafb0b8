/**
 * Bounds on a gzip-compressed catalog's decompressed bytes, so that a small file that expands
 * without end (a "gzip bomb") stops with a one-line CatalogError (exit status 2) instead of
 * filling memory or running for hours. Set in the config as `input.gzip_max_ratio` and
 * `input.gzip_max_gb`.
 */
export interface GzipLimits {
  /** Most decompressed bytes per compressed byte read so far (checked once GZIP_RATIO_FLOOR_BYTES have come out). */
  maxRatio: number;
  /** Most decompressed bytes in all. */
  maxBytes: number;
}

/**
 * Defaults: deflate cannot exceed about 1032:1, and text tables compress 3–20:1 (a very sparse
 * one perhaps 100:1), so 250:1 stops the runs of one repeated byte a bomb is made of while
 * leaving real catalogs alone (common practice, no source); 64 GB of text is far more than any
 * catalog of candidates.
 */
export const DEFAULT_GZIP_LIMITS: Readonly<GzipLimits> = { maxRatio: 250, maxBytes: 64e9 };

/** Decompressed bytes below which the ratio is not checked (small files and file starts may compress very well). */
export const GZIP_RATIO_FLOOR_BYTES = 16 << 20;
