import { EXPORT_FORMATS, type ExportFormat } from '../config/publicationConfig.ts';
import { UsageError } from './UsageError.ts';

/** The `derive` command line, parsed. */
export interface DeriveArgs {
  /** The input catalog (optional when the config names one). */
  catalog?: string;
  /** `-c`: the census config file. */
  config?: string;
  /** `-o`: the Parquet file to write. */
  output?: string;
  /** `--draws`: Monte Carlo draws per object (overrides the config). */
  draws?: number;
  /** `--seed`: global random seed (overrides the config). */
  seed?: number;
  /** `--threads`: worker threads (default: every core). */
  threads?: number;
  /** `--format ecsv|votable|fits` (repeatable): further formats written beside the Parquet file. */
  formats?: ExportFormat[];
  /** `--quiet`: no progress, problem lines or summary; errors only. */
  quiet: boolean;
  /** `--force`: replace outputs not written by this tool, allow a config output outside its folder and more threads than cores. */
  force: boolean;
  /** `--help`. */
  help: boolean;
}

/** Largest `--threads` accepted (a guard against typing mistakes). */
export const MAX_THREADS = 256;

type ValueOption = 'config' | 'output' | 'draws' | 'seed' | 'threads';

const VALUE_OPTIONS: Readonly<Record<string, ValueOption>> = {
  '-c': 'config',
  '--config': 'config',
  '-o': 'output',
  '--output': 'output',
  '--draws': 'draws',
  '--seed': 'seed',
  '--threads': 'threads',
};

const FLAG_OPTIONS: Readonly<Record<string, 'quiet' | 'help' | 'force'>> = {
  '--force': 'force',
  '-q': 'quiet',
  '--quiet': 'quiet',
  '-h': 'help',
  '--help': 'help',
};

function integer(option: string, text: string): number {
  if (!/^\d+$/.test(text)) throw new UsageError(`${option} needs a whole number, got "${text}"`);
  const n = Number(text);
  if (!Number.isSafeInteger(n)) throw new UsageError(`${option} is too large: ${text}`);
  return n;
}

/**
 * Parses the arguments after `derive`. Options take their value as the next argument or after
 * `=` (`--draws=500`); `--` ends the options. Throws UsageError (one line) for an unknown
 * option, a missing or non-numeric value, `--threads` outside 1…256, a repeated option or a
 * second catalog. Ranges of `--draws` and `--seed` are checked with the config's rules later.
 */
export function parseDeriveArgs(argv: readonly string[]): DeriveArgs {
  const out: DeriveArgs = { quiet: false, help: false, force: false };
  const seen = new Set<string>();
  let onlyPositional = false;
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i]!;
    if (onlyPositional || arg === '-' || !arg.startsWith('-')) {
      if (out.catalog !== undefined) throw new UsageError(`more than one catalog given ("${out.catalog}" and "${arg}"); derive reads one catalog`);
      out.catalog = arg;
      continue;
    }
    if (arg === '--') {
      onlyPositional = true;
      continue;
    }
    const eq = arg.startsWith('--') ? arg.indexOf('=') : -1;
    const name = eq > 0 ? arg.slice(0, eq) : arg;
    const flag = FLAG_OPTIONS[name];
    if (flag) {
      if (eq > 0) throw new UsageError(`${name} takes no value`);
      out[flag] = true;
      continue;
    }
    if (name === '--format') {
      const value = eq > 0 ? arg.slice(eq + 1) : argv[++i];
      if (value === undefined || value === '' || value.startsWith('-')) throw new UsageError('--format needs a value (ecsv, votable or fits)');
      if (!(EXPORT_FORMATS as readonly string[]).includes(value)) throw new UsageError(`--format must be one of ${EXPORT_FORMATS.join(', ')}, got "${value}"`);
      out.formats = [...new Set([...(out.formats ?? []), value as ExportFormat])];
      continue;
    }
    const key = VALUE_OPTIONS[name];
    if (!key) throw new UsageError(`unknown option ${name} for derive (see dawn-census derive --help)`);
    if (seen.has(key)) throw new UsageError(`${name} given more than once`);
    seen.add(key);
    let value: string | undefined;
    if (eq > 0) value = arg.slice(eq + 1);
    else {
      value = argv[++i];
      if (value === undefined || (value.startsWith('-') && value !== '-' && !/^-\d/.test(value))) throw new UsageError(`${name} needs a value`);
    }
    if (value === '') throw new UsageError(`${name} needs a value`);
    if (key === 'config' || key === 'output') out[key] = value;
    else out[key] = integer(name, value);
  }
  if (out.threads !== undefined && (out.threads < 1 || out.threads > MAX_THREADS)) {
    throw new UsageError(`--threads must be between 1 and ${MAX_THREADS}, got ${out.threads}`);
  }
  return out;
}
