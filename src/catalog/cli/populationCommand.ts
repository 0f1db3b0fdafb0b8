import { availableParallelism } from 'node:os';
import path from 'node:path';
import { displayPath, loadConfig } from '../config/loadConfig.ts';
import { runPopulation, type PopulationSummary } from '../population/runPopulation.ts';
import type { SamplerRun } from '../population/relationFitRun.ts';
import type { TextOut } from './cliIo.ts';
import { formatDuration } from './formatting.ts';
import { UsageError } from './UsageError.ts';
import type { PopulationArgs } from './populationArgs.ts';

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
      const text = `relation fit ${(frac * 100).toFixed(0).padStart(3)} % of the step cap, at most about ${formatDuration(eta)} left`;
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

function samplerLine(r: SamplerRun): string {
  const tau = Math.max(...r.tau);
  const t = Number.isFinite(tau) ? tau.toFixed(0) : 'not measurable';
  return r.converged
    ? `Sampler converged after ${r.stepsRun} steps (autocorrelation time ${t} steps; kept ${r.stepsRun - r.burn} steps ≥ 50 τ)\n`
    : `Warning: the sampler reached its cap of ${r.stepCap} steps before its kept chain was 50 autocorrelation times long (τ ${t} steps): raise survey.relation_fit.steps\n`;
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
    s = await runPopulation(config, catalog, displayPath(path.resolve(args.config)), bar.step, { force: args.force, threads: args.threads ?? availableParallelism() });
  } finally {
    bar.end();
  }
  if (!args.quiet) {
    err.write(
      `${s.withVmax} of ${s.objects} objects have a V_max; ${s.belowLimit} flagged below_survey_limit\n` +
        (s.sentence ? `${s.sentence}\n` : 'No relation fit (fewer than 8 objects with a V_max and a host mass)\n') +
        (s.sampler ? samplerLine(s.sampler) : '') +
        `Wrote ${displayPath(s.paths.summary)}, ${displayPath(s.paths.objects)}, ${displayPath(s.paths.densities)}, ${displayPath(s.paths.posterior)}\n` +
        `Done in ${formatDuration(performance.now() - started)}\n`,
    );
  }
  return s;
}
