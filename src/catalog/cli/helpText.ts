/** `dawn-census --help`. */
export const MAIN_HELP = `dawn-census — derive black-hole properties for a catalog of broad-line AGN candidates

Usage:
  dawn-census derive <catalog> [options]   derive a catalog into Parquet with provenance
  dawn-census population -c <config>       space densities and the selection-aware M_BH–M* relation
  dawn-census --help | -h                  this help
  dawn-census --version | -V               the version

Run "dawn-census derive --help" for the options of derive.
`;

/** `dawn-census derive --help`. */
export const DERIVE_HELP = `Usage: dawn-census derive <catalog> [options]
       dawn-census derive -c census.config.yaml [options]

Reads a catalog (CSV, TSV, ECSV, FITS, VOTable or Parquet), checks every row, derives black-hole
masses, bolometric luminosities, Eddington ratios, seed masses and offsets from the local
relation with Monte Carlo errors, and writes a Parquet catalog with its provenance.

Options:
  -c, --config <file>   census config (YAML). Without it the defaults apply: a config lying
                        beside the catalog is not read unless named here. With -c and no
                        <catalog>, the config's input.path is read.
  -o, --output <file>   Parquet file to write (default: the config's output, else
                        <catalog name>.census.parquet beside the catalog)
      --draws <n>       Monte Carlo draws per object (overrides the config)
      --seed <n>        global random seed (overrides the config)
      --threads <n>     worker threads (default: one per core)
  -q, --quiet           print errors only: no progress, row problems or summary
  -h, --help            this help

Writes, beside the output <name>.parquet:
  <name>.meta.json        settings, references, input and config SHA-256, counts, columns
  <name>.rejections.csv   every problem found in a row (header only when there is none)
All three files are replaced together, and only when the run succeeds.

Rows with problems stay in the output, flagged "invalid_input" with empty derived values.

Exit status: 0 done; 1 unexpected failure; 2 the catalog or config cannot be used as a
whole (nothing written); 64 wrong command line; 130 interrupted (nothing written).
`;
