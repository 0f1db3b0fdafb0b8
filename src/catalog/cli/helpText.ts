/** `dawn-census --help`. */
export const MAIN_HELP = `dawn-census — derive black-hole properties for a catalog of broad-line AGN candidates

Usage:
  dawn-census init [<catalog>] [-o <config>]   write a config to start from, its columns mapped
  dawn-census derive <catalog> [options]   derive a catalog into Parquet with provenance
  dawn-census site build -c <config> [--out <dir>]   build the static site of a derived catalog
  dawn-census site preview [-c <config>] [--out <dir>] [--port <n>]   serve a built site locally
  dawn-census population -c <config>       space densities and the selection-aware M_BH–M* relation
  dawn-census --help | -h                  this help
  dawn-census --version | -V               the version

Run "dawn-census <command> --help" for a command's options (init, derive, site, population).
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
      --threads <n>     worker threads (default: one per core; more than the cores
                        needs --force)
      --force           replace output files this tool did not write, write where a
                        config's output points outside the config's folder, and allow
                        more threads than cores. Never writes over the catalog itself,
                        a folder, or a device, FIFO or file in /dev, /proc or /sys.
      --format <f>      also write the catalog as ecsv, votable or fits beside the Parquet
                        file (<name>.ecsv, <name>.vot, <name>.fits); repeatable; adds to the
                        config's output.formats
  -q, --quiet           print errors only: no progress, row problems or summary
  -h, --help            this help

Writes, beside the output <name>.parquet:
  <name>.meta.json        settings, references, input and config SHA-256, counts, columns
  <name>.rejections.csv   every problem found in a row (header only when there is none)
  <name>.readings.parquet every object under every reading of the broad lines
and the ECSV, VOTable or FITS copies asked for. All are replaced together, and only when the
run succeeds. An existing file is
replaced only when dawn-census wrote it (else add --force).

Rows with problems stay in the output, flagged "invalid_input" with empty derived values.

Exit status: 0 done; 1 unexpected failure; 2 the catalog or config cannot be used as a
whole or changed while it was read (nothing written); 64 wrong command line or an output
that may not be written; 130 interrupted by Ctrl-C, 143 stopped by SIGTERM (nothing written).
`;

/** `dawn-census site --help`. */
export const SITE_HELP = `Usage: dawn-census site build -c census.config.yaml [--out dist]
       dawn-census site preview [-c census.config.yaml] [--out dist] [--port 4321]

build    builds the static site for the catalog the config derives (its output, else
         <input name>.census.parquet beside the input) into --out (default dist), for the
         base path in the config's site.base. Run dawn-census derive first. The build
         replaces the whole --out folder, so it must be new, empty or a site built before;
         a folder holding anything else (or the config or the catalog) is refused. The site
         is built beside it and moved into place only when the build succeeds.
preview  serves the built folder at the base path it was built for, with HTTP range
         requests, until Ctrl-C.

Publish the folder on any static host that answers HTTP range requests (the query page reads
the Parquet file in pieces).
`;
