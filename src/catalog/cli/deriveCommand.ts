import { availableParallelism } from 'node:os';
import path from 'node:path';
import { applyOverrides } from '../config/applyOverrides.ts';
import type { CensusConfig } from '../config/CensusConfig.ts';
import { defaultConfig } from '../config/defaultConfig.ts';
import { displayPath, loadConfig } from '../config/loadConfig.ts';
import { defaultOutputPath, outputPaths } from '../derive/outputPaths.ts';
import { runDerive } from '../derive/runDerive.ts';
import { OutputRefused } from '../outputs/OutputRefused.ts';
import type { DeriveRunOptions, DeriveSummary } from '../derive/runDerive.ts';
import type { TableFormat } from '../readers/types.ts';
import type { TextOut } from './cliIo.ts';
import { formatCount, formatDuration } from './formatting.ts';
import type { DeriveArgs } from './parseDeriveArgs.ts';
import { createProgressReporter } from './progressReporter.ts';
import { readingsTable } from './readingsTable.ts';
import { UsageError } from './UsageError.ts';
import { terminalText } from '../../shared/text/terminalText.ts';

/** A derive run fully resolved from the command line and the config. */
export interface DerivePlan {
  config: CensusConfig;
  catalogPath: string;
  format?: TableFormat;
  outputPath: string;
  threads: number;
  /** --force: replace outputs this tool did not write. */
  force: boolean;
}

/**
 * Resolves what to read and write: the config (`-c`, else the defaults — a config beside the
 * catalog is never read implicitly) with --draws/--seed applied; the catalog (the argument,
 * else the config's input.path); the output (-o, else the config's output, else
 * `<catalog name>.census.parquet` beside the catalog); the threads (--threads, else every
 * core). Throws UsageError when no catalog is named or --threads exceeds the cores without
 * --force; OutputRefused when the config's output lies outside the config's folder without
 * --force; ConfigError for a bad config or override. The outputs themselves are checked by
 * runDerive (checkOutputTargets) before anything is read.
 */
export async function resolveDerivePlan(args: DeriveArgs): Promise<DerivePlan> {
  const loaded = args.config !== undefined ? await loadConfig(args.config) : defaultConfig();
  const config = applyOverrides(loaded, {
    ...(args.draws !== undefined ? { draws: args.draws } : {}),
    ...(args.seed !== undefined ? { seed: args.seed } : {}),
  });
  // --format adds to the config's output.formats.
  if (args.formats) config.outputFormats = [...new Set([...(config.outputFormats ?? []), ...args.formats])];
  const fromConfig = config.input?.path;
  const catalogAbs = args.catalog !== undefined ? path.resolve(args.catalog) : fromConfig;
  if (catalogAbs === undefined) {
    throw new UsageError(
      args.config !== undefined
        ? `no catalog given: name one (dawn-census derive <catalog> -c ${args.config}) or set input.path in ${args.config}`
        : 'no catalog given: dawn-census derive <catalog> (see dawn-census derive --help)',
    );
  }
  // The config's format describes its own input file, not another one named on the command line.
  const format = catalogAbs === fromConfig ? config.input?.format : undefined;
  const outputPath = args.output !== undefined ? path.resolve(args.output) : (config.output ?? defaultOutputPath(catalogAbs));
  if (args.output === undefined && config.output !== undefined && config.configPath !== undefined && !args.force) {
    const inside = path.relative(path.dirname(config.configPath), config.output);
    if (inside === '' || inside.startsWith('..') || path.isAbsolute(inside)) {
      throw new OutputRefused(
        `${displayPath(config.configPath)} sets output to ${displayPath(config.output)}, outside the config's folder; add --force to write there, or choose the output with -o`,
      );
    }
  }
  const cores = availableParallelism();
  if (args.threads !== undefined && args.threads > cores && !args.force) {
    throw new UsageError(`--threads ${args.threads} is more than the ${cores} ${cores === 1 ? 'core' : 'cores'} of this machine; add --force to run that many anyway`);
  }
  return {
    config,
    // As the user would write it (relative inside the working folder): readers name it in messages.
    catalogPath: displayPath(catalogAbs),
    ...(format ? { format } : {}),
    outputPath,
    threads: args.threads ?? cores,
    force: args.force,
  };
}

/**
 * Runs `dawn-census derive` once the arguments are parsed: progress and row problems on
 * `err` (unless quiet), then the summary. Errors propagate to the caller, which maps them
 * to exit statuses.
 */
export async function deriveCommand(
  args: DeriveArgs,
  err: TextOut,
  extra: Pick<DeriveRunOptions, 'deriveModule' | 'chunkRows' | 'signal' | 'batchTimeoutMs'> = {},
): Promise<DeriveSummary> {
  const plan = await resolveDerivePlan(args);
  const label = displayPath(plan.catalogPath);
  const reporter = createProgressReporter(err, { label, quiet: args.quiet });
  let summary: DeriveSummary;
  try {
    summary = await runDerive({
      ...plan,
      ...extra,
      onProgress: (p) => reporter.progress(p),
      onRowProblem: (p) => reporter.problem(p),
      onNotice: (text) => reporter.notice(text),
    });
  } finally {
    reporter.finish(displayPath(outputPaths(plan.outputPath).rejections));
  }
  if (!args.quiet) err.write(summaryText(summary, plan, label));
  return summary;
}

/** The lines printed after a successful run. */
export function summaryText(s: DeriveSummary, plan: DerivePlan, label: string): string {
  const { draws, seed } = plan.config.settings;
  const rate = s.elapsedMs > 0 ? (s.rows / s.elapsedMs) * 1000 : 0;
  const rows = (n: number): string => `${formatCount(n)} ${n === 1 ? 'row' : 'rows'}`;
  const lines = [
    `Read ${rows(s.rows)} from ${label}`,
    `Derived ${formatCount(s.derived)} (${formatCount(draws)} draws each, seed ${seed}, ${s.threads} ${s.threads === 1 ? 'thread' : 'threads'})`,
    s.flagged > 0
      ? `Flagged ${rows(s.flagged)} with input problems (${formatCount(s.problems)} ${s.problems === 1 ? 'problem' : 'problems'}): listed in ${displayPath(s.paths.rejections)}`
      : `Flagged 0 rows: no input problems (${displayPath(s.paths.rejections)} has only its header)`,
    `Wrote ${displayPath(s.paths.catalog)} (${rows(s.rows)}, ${s.columns} columns) and ${displayPath(s.paths.meta)}`,
    ...(s.readings.length > 0
      ? [`Wrote ${displayPath(s.paths.readings)} (every object under ${s.readings.length} ${s.readings.length === 1 ? 'reading' : 'readings'}: ${s.readings.map((r) => r.reading).join(', ')})`]
      : []),
    ...(s.exports.length > 0 ? [`Wrote copies as ${s.exports.map(displayPath).join(', ')}`] : []),
    ...readingsTable(s.readings, plan.config.settings.lightSeedMsun),
    `Done in ${formatDuration(s.elapsedMs)} (${formatCount(rate)} objects/s)`,
  ];
  return `${lines.map(terminalText).join('\n')}\n`;
}
