/** The files `dawn-census population` writes beside a derived catalog `<name>.parquet`. */
export interface PopulationPaths {
  /** Summary for the site and for readers: `<name>.population.json`. */
  readonly summary: string;
  /** One row per object (field, detection line, V_max, flag): `<name>.population.parquet`. */
  readonly objects: string;
  /** Binned mass and luminosity functions: `<name>.densities.parquet`. */
  readonly densities: string;
  /** Posterior samples of both relation fits: `<name>.posterior.parquet`. */
  readonly posterior: string;
}

/** @param catalogPath - the derived catalog. */
export function populationPaths(catalogPath: string): PopulationPaths {
  const stem = catalogPath.replace(/\.parquet$/i, '');
  return {
    summary: `${stem}.population.json`,
    objects: `${stem}.population.parquet`,
    densities: `${stem}.densities.parquet`,
    posterior: `${stem}.posterior.parquet`,
  };
}
