import { existsSync } from 'node:fs';
import { ConfigError } from '../config/ConfigError.ts';
import { toolVersion } from '../metadata/toolVersion.ts';
import { CatalogError } from '../readers/CatalogError.ts';
import { processIo } from './cliIo.ts';
import type { CliIo } from './cliIo.ts';
import { parsePopulationArgs, POPULATION_HELP } from './populationArgs.ts';
import type { DeriveRunOptions } from '../derive/runDerive.ts';
import { EXIT } from './exitCodes.ts';
import { DERIVE_HELP, MAIN_HELP, SITE_HELP } from './helpText.ts';
import { parseDeriveArgs } from './parseDeriveArgs.ts';
import { UsageError } from './UsageError.ts';
import { OutputRefused } from '../outputs/OutputRefused.ts';
import { terminalText } from '../../shared/text/terminalText.ts';

/** Substitutions for tests: a stand-in deriveObject module, a smaller chunk size, a shorter stall timeout. */
export type MainOptions = Pick<DeriveRunOptions, 'deriveModule' | 'chunkRows' | 'batchTimeoutMs'>;

/**
 * The `dawn-census` command: `init`, `derive`, `site`, `population`, `--help`, `--version`. Returns the exit status
 * (see EXIT): 0 done, 1 unexpected failure, 2 catalog or config unusable, 64 wrong usage.
 * Never throws: every error becomes one line on stderr, its control characters shown as escapes
 * (a catalog value or file name cannot recolour the terminal or add lines).
 */
export async function main(argv: readonly string[], io: CliIo = processIo(), options: MainOptions = {}): Promise<number> {
  const [command, ...rest] = argv;
  try {
    if (command === undefined) {
      io.stderr.write(MAIN_HELP);
      return EXIT.usage;
    }
    if (command === '--help' || command === '-h' || command === 'help') {
      io.stdout.write(MAIN_HELP);
      return EXIT.ok;
    }
    if (command === '--version' || command === '-V') {
      io.stdout.write(`dawn-census ${toolVersion()}\n`);
      return EXIT.ok;
    }
    if (command === 'site') return await siteMain(rest, io);
    if (command === 'init') {
      const { INIT_HELP, initCommand, parseInitArgs } = await import('./initCommand.ts');
      const iargs = parseInitArgs(rest);
      if (iargs.help) {
        io.stdout.write(INIT_HELP);
        return EXIT.ok;
      }
      await initCommand(iargs, io.stderr);
      return EXIT.ok;
    }
    if (command === 'population') {
      const pargs = parsePopulationArgs(rest);
      if (pargs.help) {
        io.stdout.write(POPULATION_HELP);
        return EXIT.ok;
      }
      // Loaded here: it pulls in DuckDB's native module, which --help does not need.
      const { populationCommand } = await import('./populationCommand.ts');
      await populationCommand(pargs, io.stderr);
      return EXIT.ok;
    }
    if (command !== 'derive') throw new UsageError(`unknown command "${command}" (see dawn-census --help)`);
    const args = parseDeriveArgs(rest);
    if (args.help) {
      io.stdout.write(DERIVE_HELP);
      return EXIT.ok;
    }
    // Ctrl-C and SIGTERM stop the run between chunks so that its temporary files are removed.
    const interrupt = new AbortController();
    const onSigint = (): void => interrupt.abort(new Interrupted('SIGINT'));
    const onSigterm = (): void => interrupt.abort(new Interrupted('SIGTERM'));
    process.once('SIGINT', onSigint);
    process.once('SIGTERM', onSigterm);
    try {
      // Loaded here, not at start-up: it pulls in DuckDB's native module, which --help does not need.
      // Compiled, it is one bundled file (scripts/build-cli.mjs): 0.17–0.22 s to load, against
      // 0.31 s for its modules one by one.
      const bundle = new URL('./deriveCommand.bundle.js', import.meta.url);
      const { deriveCommand } = existsSync(bundle) ? ((await import(bundle.href)) as typeof import('./deriveCommand.ts')) : await import('./deriveCommand.ts');
      await deriveCommand(args, io.stderr, { ...options, signal: interrupt.signal });
    } finally {
      process.off('SIGINT', onSigint);
      process.off('SIGTERM', onSigterm);
    }
    return EXIT.ok;
  } catch (error) {
    return reportError(error, io);
  }
}

/** `dawn-census site build|preview`: the site module (and Astro) load only when asked for. */
async function siteMain(argv: readonly string[], io: CliIo): Promise<number> {
  const { parseSiteArgs, siteBuild, sitePreview } = await import('./siteCommand.ts');
  const args = parseSiteArgs(argv);
  if (args.help) {
    io.stdout.write(SITE_HELP);
    return EXIT.ok;
  }
  if (args.action === 'build') {
    const { out, base } = await siteBuild(args, io.stderr);
    io.stderr.write(`Built the site into ${out} for the base path ${base}\n`);
    return EXIT.ok;
  }
  const server = await sitePreview(args, io.stderr);
  await new Promise<void>((resolve) => process.once('SIGINT', resolve));
  await server.close();
  return EXIT.ok;
}

/** The run was stopped by Ctrl-C (SIGINT) or SIGTERM. */
class Interrupted extends Error {
  override name = 'Interrupted';
  constructor(readonly signalName: 'SIGINT' | 'SIGTERM') {
    super(signalName === 'SIGINT' ? 'interrupted; nothing was written (an earlier output is unchanged)' : 'stopped by SIGTERM; nothing was written (an earlier output is unchanged)');
  }
}

function reportError(error: unknown, io: CliIo): number {
  if (error instanceof Interrupted) {
    io.stderr.write(`\ndawn-census: ${terminalText(error.message)}\n`);
    return error.signalName === 'SIGINT' ? EXIT.interrupted : EXIT.terminated;
  }
  if (error instanceof UsageError || error instanceof OutputRefused) {
    io.stderr.write(`dawn-census: ${terminalText(error.message)}\n`);
    return EXIT.usage;
  }
  if (error instanceof CatalogError || error instanceof ConfigError) {
    io.stderr.write(`${terminalText(error.message)}\n`);
    return EXIT.catalog;
  }
  const message = error instanceof Error ? error.message : String(error);
  io.stderr.write(`dawn-census: ${terminalText(message.split('\n')[0]!)}\n`);
  return EXIT.failure;
}
