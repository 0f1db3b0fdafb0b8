import path from 'node:path';
import { displayPath, loadConfig } from '../config/loadConfig.ts';
import { runPopulation, type PopulationSummary } from '../population/runPopulation.ts';
import type { TextOut } from './cliIo.ts';
import { formatDuration } from './formatting.ts';
import { UsageError } from './UsageError.ts';

/** The `population` command line, parsed. */
export interface PopulationArgs {
  config?: string;
  catalog?: string;
  quiet: boolean;
  help: boolean;
}

/** Parses the arguments after `population`: `-c <config>`, `--catalog <parquet>`, `--quiet`, `--help`. */
export function parsePopulationArgs(argv: readonly string[]): PopulationArgs {
  const out: PopulationArgs = { quiet: false, help: false };
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
    else if (flag === '-q' || flag === '--quiet') out.quiet = true;
    else if (flag === '-h' || flag === '--help') out.help = true;
    else throw new UsageError(`unknown option "${a}" for population (see dawn-census population --help)`);
  }
  return out;
}

export const POPULATION_HELP = `dawn-census population -c census.config.yaml [--catalog out/catalog.parquet] [--quiet]

Space densities and the selection-aware black-hole–host relation of a derived catalog, under the
config's survey: block (fields, areas, limiting fluxes, spectrograph range, width and S/N cuts).
The catalog is the config's output (or --catalog). Writes beside it, as one set:
  <name>.population.json      summary: relation fits, selection bias, detectable fraction, sentence
  <name>.population.parquet   per object: field, detection line, vmax_cmpc3, below_survey_limit
  <name>.densities.parquet    binned mass and luminosity functions with Poisson and Monte Carlo intervals
  <name>.posterior.parquet    posterior samples of the selection-aware and the naive fits
`;

/** A progress line for the sampler: a bar and the time left, redrawn on a terminal, every 10 % elsewhere. */
function progress(err: TextOut, quiet: boolean): { step: (done: number, total: number) => void; end: () => void } {
  const start = performance.now();
  let lastDecile = -1;
  let lastDraw = 0;
  let drawn = false;
  return {
    step(done, total) {
      if (quiet) return;
      const frac = done / total;
      const eta = done > 0 ? ((performance.now() - start) / done) * (total - done) : 0;
      const text = `relation fit ${(frac * 100).toFixed(0).padStart(3)} %  about ${formatDuration(eta)} left`;
      if (err.isTTY) {
        if (performance.now() - lastDraw < 100 && done < total) return;
        lastDraw = performance.now();
        const bar = '#'.repeat(Math.round(frac * 24)).padEnd(24, '.');
        err.write(`\r\x1b[K[${bar}] ${text}`);
        drawn = true;
      } else if (Math.floor(frac * 10) > lastDecile) {
        lastDecile = Math.floor(frac * 10);
        err.write(`${text}\n`);
      }
    },
    end() {
      if (drawn) err.write('\r\x1b[K');
    },
  };
}

/** Runs `dawn-census population`; errors propagate to the caller, which maps them to exit statuses. */
export async function populationCommand(args: PopulationArgs, err: TextOut): Promise<PopulationSummary> {
  if (args.config === undefined) throw new UsageError('population needs the census config: dawn-census population -c census.config.yaml');
  const config = await loadConfig(args.config);
  const catalog = args.catalog !== undefined ? path.resolve(args.catalog) : config.output;
  if (catalog === undefined) throw new UsageError(`no derived catalog: set output in ${args.config} or give --catalog`);
  const started = performance.now();
  const bar = progress(err, args.quiet);
  let s: PopulationSummary;
  try {
    s = await runPopulation(config, catalog, displayPath(path.resolve(args.config)), bar.step);
  } finally {
    bar.end();
  }
  if (!args.quiet) {
    err.write(
      `${s.withVmax} of ${s.objects} objects have a V_max; ${s.belowLimit} flagged below_survey_limit\n` +
        (s.sentence ? `${s.sentence}\n` : 'No relation fit (fewer than 8 objects with a V_max and a host mass)\n') +
        `Wrote ${displayPath(s.paths.summary)}, ${displayPath(s.paths.objects)}, ${displayPath(s.paths.densities)}, ${displayPath(s.paths.posterior)}\n` +
        `Done in ${formatDuration(performance.now() - started)}\n`,
    );
  }
  return s;
}
