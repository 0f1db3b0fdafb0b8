import { UsageError } from './UsageError.ts';

/** The `population` command line, parsed. */
export interface PopulationArgs {
  config?: string;
  catalog?: string;
  /** Worker threads of the relation fit (default: one per core). */
  threads?: number;
  quiet: boolean;
  help: boolean;
  /** `--force`: replace output files `dawn-census population` did not write. */
  force: boolean;
}

/** Parses the arguments after `population`: `-c <config>`, `--catalog <parquet>`, `--threads <n>`, `--force`, `--quiet`, `--help`. */
export function parsePopulationArgs(argv: readonly string[]): PopulationArgs {
  const out: PopulationArgs = { quiet: false, help: false, force: false };
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i] as string;
    const [flag, inline] = a.startsWith('--') && a.includes('=') ? [a.slice(0, a.indexOf('=')), a.slice(a.indexOf('=') + 1)] : [a, undefined];
    const value = (): string => {
      const v = inline ?? argv[++i];
      if (v === undefined || v === '') throw new UsageError(`${flag} needs a value`);
      return v;
    };
    if (flag === '-c' || flag === '--config') out.config = value();
    else if (flag === '--catalog') out.catalog = value();
    else if (flag === '--threads') {
      const v = value();
      const n = Number(v);
      if (!Number.isInteger(n) || n < 1 || n > 256) throw new UsageError(`--threads must be a whole number from 1 to 256, got "${v}"`);
      out.threads = n;
    }
    else if (flag === '-q' || flag === '--quiet') out.quiet = true;
    else if (flag === '-h' || flag === '--help') out.help = true;
    else if (flag === '--force') out.force = true;
    else throw new UsageError(`unknown option "${a}" for population (see dawn-census population --help)`);
  }
  return out;
}

export const POPULATION_HELP = `dawn-census population -c census.config.yaml [--catalog out/catalog.parquet] [--threads n] [--force] [--quiet]

Space densities and the selection-aware black-hole–host relation of a derived catalog, under the
config's survey: block (fields, areas, limiting fluxes, spectrograph range, width and S/N cuts).
The catalog is the config's output (or --catalog). The relation fit evaluates its walkers on --threads
worker threads (default: one per core); the results are the same for any number of threads. The sampler
stops once its kept chain is 50 autocorrelation times long, or at survey.relation_fit.steps.
Writes beside it, as one set:
  <name>.population.json      summary: relation fits, selection bias, detectable fraction, sentence
  <name>.population.parquet   per object: field, detection line, vmax_cmpc3, below_survey_limit
  <name>.densities.parquet    binned mass and luminosity functions with Poisson and Monte Carlo intervals
  <name>.posterior.parquet    posterior samples of the selection-aware and the naive fits
An existing file there is replaced only when dawn-census population wrote it (else add --force);
the catalog itself, folders and special files are never replaced.
`;

