/**
 * Where the build finds the derived catalog: CENSUS_CATALOG names the Parquet file, and its
 * sidecar `<name>.meta.json` sits beside it. Without CENSUS_CATALOG the demo's derived
 * catalog (data-demo/out/catalog.parquet) is used when it exists.
 */
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';

export interface CatalogFiles {
  /** Absolute path of the Parquet file. */
  parquet: string;
  /** Absolute path of its metadata sidecar. */
  meta: string;
}

/** The sidecar path of a Parquet catalog: `x/catalog.parquet` → `x/catalog.meta.json`. */
export function sidecarPath(parquet: string): string {
  return parquet.replace(/\.parquet$/i, '') + '.meta.json';
}

/** Resolves the catalog files from `env`, or throws a one-line message saying what is missing. */
export function catalogFiles(env: Record<string, string | undefined> = process.env, cwd = process.cwd()): CatalogFiles {
  const named = env.CENSUS_CATALOG;
  const parquet = resolve(cwd, named ?? 'data-demo/out/catalog.parquet');
  if (!existsSync(parquet)) {
    throw new Error(
      named
        ? `CENSUS_CATALOG names ${parquet}, which does not exist: derive it first (dawn-census derive …).`
        : `No catalog to build the site from: set CENSUS_CATALOG to a derived Parquet file, or run \`npm start\` to derive the demo catalog.`,
    );
  }
  const meta = sidecarPath(parquet);
  if (!existsSync(meta)) throw new Error(`The catalog ${parquet} has no metadata sidecar: expected ${meta} beside it.`);
  return { parquet, meta };
}
