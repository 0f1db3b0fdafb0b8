import path from 'node:path';

/** The files one derive run writes, side by side. */
export interface OutputPaths {
  /** The Parquet catalog. */
  catalog: string;
  /** Metadata sidecar: `<name>.meta.json` (same JSON as the Parquet `dawn_census` metadata). */
  meta: string;
  /** Rejection report: `<name>.rejections.csv`. */
  rejections: string;
  /** The readings table: `<name>.readings.parquet` (one row per object and reading). */
  readings: string;
}

/**
 * The sidecar paths of a catalog: `<dir>/<name>.parquet` → `<dir>/<name>.meta.json` and
 * `<dir>/<name>.rejections.csv`, `<dir>/<name>.readings.parquet` (a name without `.parquet` keeps its full name as `<name>`).
 */
export function outputPaths(catalogPath: string): OutputPaths {
  const stem = catalogPath.replace(/\.parquet$/i, '');
  return { catalog: catalogPath, meta: `${stem}.meta.json`, rejections: `${stem}.rejections.csv`, readings: `${stem}.readings.parquet` };
}

/** Default output of a catalog read without an `output` setting: `<catalog dir>/<name without extension>.census.parquet`. */
export function defaultOutputPath(inputPath: string): string {
  const base = path.basename(inputPath).replace(/\.[^.]*$/, '');
  return path.join(path.dirname(inputPath), `${base || path.basename(inputPath)}.census.parquet`);
}
