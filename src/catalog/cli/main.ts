import { ConfigError } from '../config/ConfigError.ts';
import { toolVersion } from '../metadata/toolVersion.ts';
import { CatalogError } from '../readers/CatalogError.ts';
import { processIo } from './cliIo.ts';
import type { CliIo } from './cliIo.ts';
import { deriveCommand } from './deriveCommand.ts';
import { parsePopulationArgs, populationCommand, POPULATION_HELP } from './populationCommand.ts';
import type { DeriveRunOptions } from '../derive/runDerive.ts';
import { EXIT } from './exitCodes.ts';
import { DERIVE_HELP, MAIN_HELP } from './helpText.ts';
import { parseDeriveArgs } from './parseDeriveArgs.ts';
import { UsageError } from './UsageError.ts';

/** Substitutions for tests: a stand-in deriveObject module, a smaller chunk size. */
export type MainOptions = Pick<DeriveRunOptions, 'deriveModule' | 'chunkRows'>;

/**
 * The `dawn-census` command: `derive`, `--help`, `--version`. Returns the exit status
 * (see EXIT): 0 done, 1 unexpected failure, 2 catalog or config unusable, 64 wrong usage.
 * Never throws: every error becomes one line on stderr.
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
    if (command === 'population') {
      const pargs = parsePopulationArgs(rest);
      if (pargs.help) {
        io.stdout.write(POPULATION_HELP);
        return EXIT.ok;
      }
      await populationCommand(pargs, io.stderr);
      return EXIT.ok;
    }
    if (command !== 'derive') throw new UsageError(`unknown command "${command}" (see dawn-census --help)`);
    const args = parseDeriveArgs(rest);
    if (args.help) {
      io.stdout.write(DERIVE_HELP);
      return EXIT.ok;
    }
    // Ctrl-C stops the run between chunks so that its temporary files are removed.
    const interrupt = new AbortController();
    const onSigint = (): void => interrupt.abort(new Interrupted());
    process.once('SIGINT', onSigint);
    try {
      await deriveCommand(args, io.stderr, { ...options, signal: interrupt.signal });
    } finally {
      process.off('SIGINT', onSigint);
    }
    return EXIT.ok;
  } catch (error) {
    return reportError(error, io);
  }
}

/** The run was stopped by Ctrl-C. */
class Interrupted extends Error {
  override name = 'Interrupted';
  constructor() {
    super('interrupted; nothing was written (an earlier output is unchanged)');
  }
}

function reportError(error: unknown, io: CliIo): number {
  if (error instanceof Interrupted) {
    io.stderr.write(`\ndawn-census: ${error.message}\n`);
    return EXIT.interrupted;
  }
  if (error instanceof UsageError) {
    io.stderr.write(`dawn-census: ${error.message}\n`);
    return EXIT.usage;
  }
  if (error instanceof CatalogError || error instanceof ConfigError) {
    io.stderr.write(`${error.message}\n`);
    return EXIT.catalog;
  }
  const message = error instanceof Error ? error.message : String(error);
  io.stderr.write(`dawn-census: ${message.split('\n')[0]}\n`);
  return EXIT.failure;
}
