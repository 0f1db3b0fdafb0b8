import { lstat, stat, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { guessColumns, type ColumnGuesses } from '../config/guessColumns.ts';
import { displayPath } from '../config/loadConfig.ts';
import { starterConfig } from '../config/starterConfig.ts';
import { toolVersion } from '../metadata/toolVersion.ts';
import { OutputRefused } from '../outputs/OutputRefused.ts';
import { openTable } from '../readers/index.ts';
import { terminalText } from '../../shared/text/terminalText.ts';
import { UsageError } from './UsageError.ts';

/** The `init` command line, parsed. */
export interface InitArgs {
  catalog?: string;
  output?: string;
  help: boolean;
}

/** Default name of the config `init` writes, in the current folder. */
export const INIT_DEFAULT_CONFIG = 'census.config.yaml';

/** Parses the arguments after `init`: `[<catalog>] [-o <config>] [--help]`. */
export function parseInitArgs(argv: readonly string[]): InitArgs {
  const out: InitArgs = { help: false };
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i] as string;
    const [flag, inline] = a.startsWith('--') && a.includes('=') ? [a.slice(0, a.indexOf('=')), a.slice(a.indexOf('=') + 1)] : [a, undefined];
    if (flag === '-o' || flag === '--output') {
      const v = inline ?? argv[++i];
      if (v === undefined || v === '') throw new UsageError(`${flag} needs a value`);
      out.output = v;
    } else if (flag === '-h' || flag === '--help') out.help = true;
    else if (a.startsWith('-') && a !== '-') throw new UsageError(`unknown option "${a}" for init (see dawn-census init --help)`);
    else if (out.catalog === undefined) out.catalog = a;
    else throw new UsageError(`init takes one catalog, got "${out.catalog}" and "${a}"`);
  }
  return out;
}

export const INIT_HELP = `Usage: dawn-census init [<catalog>] [-o <config>]

Writes a census config to start from (census.config.yaml in the current folder unless -o names
another file). Given a catalog, it reads the catalog's columns and maps those it recognises to the
canonical inputs: by their own names, by a UCD in the file, or by names common in the field's
catalogs (FWHM_Ha, F_Ha_err, e_FWHM_Ha, redshift, name, ...); each guess is marked in the file for
you to check. Every derivation setting is written out at its default, with the other allowed
values beside it. Without a catalog it writes a template.

Options:
  -o, --output <file>   the config to write (default: ${INIT_DEFAULT_CONFIG})
  -h, --help            this help

It never replaces a file: if the config exists, choose another name with -o.
`;

/** The JSON Schema shipped with the package (lib/ and src/ are both three folders below its root). */
const SCHEMA_FILE = fileURLToPath(new URL('../../../schema/census.config.schema.json', import.meta.url));

/** A path relative to `from`, with forward slashes (a config is read the same on every system). */
function relativePath(from: string, to: string): string {
  const rel = path.relative(from, to) || '.';
  return rel.split(path.sep).join('/');
}

/** The output the config names: the catalog's name without its extensions, `.census.parquet`, in the config's folder. */
function outputName(catalog: string | undefined): string {
  if (!catalog) return 'catalog.census.parquet';
  const base = path.basename(catalog).replace(/\.gz$/i, '').replace(/\.(csv|tsv|txt|ecsv|fits?|fts|vot|votable|xml|parquet)$/i, '');
  return `${base || 'catalog'}.census.parquet`;
}

/** One line of what init found, for the terminal. */
function summary(g: ColumnGuesses): string[] {
  const lines: string[] = [];
  if (g.byName.length) lines.push(`  found under their own names: ${g.byName.map((b) => b.canonical).join(', ')}`);
  if (g.guesses.length) lines.push(`  guessed (check them): ${g.guesses.map((x) => `${x.canonical} ← ${x.source}`).join(', ')}`);
  for (const a of g.ambiguous) lines.push(`  ${a.canonical}: several candidates (${a.candidates.join(', ')}); choose one in the config`);
  const found = new Set([...g.byName, ...g.guesses, ...g.ambiguous].map((x) => x.canonical));
  const missing = ['id', 'z'].filter((c) => !found.has(c));
  if (missing.length) lines.push(`  not found (required): ${missing.join(', ')}; name the columns that hold them in the config`);
  if (g.passthrough.length) lines.push(`  passed through unchanged: ${g.passthrough.length} column${g.passthrough.length === 1 ? '' : 's'}`);
  return lines;
}

/**
 * `dawn-census init`: writes a starting config (see starterConfig.ts) and says what it found.
 * Refuses (OutputRefused, exit 64) when the config's path exists, whatever it is; the file is
 * created exclusively, so one that appears meanwhile is not replaced either. A catalog that
 * cannot be read stops it as derive would (CatalogError, exit 2). Returns the config's path.
 */
export async function initCommand(args: InitArgs, stderr: { write(s: string): unknown }): Promise<string> {
  const configPath = path.resolve(args.output ?? INIT_DEFAULT_CONFIG);
  const shown = displayPath(configPath);
  const exists = await lstat(configPath).then(
    () => true,
    () => false,
  );
  if (exists) throw new OutputRefused(`${shown} exists; init never replaces a file: choose another name with -o`);
  const dir = path.dirname(configPath);
  const isDir = await stat(dir).then(
    (s) => s.isDirectory(),
    () => false,
  );
  if (!isDir) throw new UsageError(`cannot write ${shown}: ${displayPath(dir)} is not a folder`);

  let catalog: Parameters<typeof starterConfig>[0]['catalog'];
  let guesses: ColumnGuesses | undefined;
  if (args.catalog !== undefined) {
    const abs = path.resolve(args.catalog);
    const src = await openTable(abs);
    try {
      guesses = guessColumns(src.columns);
      catalog = {
        path: relativePath(dir, abs),
        format: src.format,
        ...(src.nRows !== undefined ? { rows: src.nRows } : {}),
        columns: src.columns.map((c) => ({ name: c.name, ...(c.unit ? { unit: c.unit } : {}) })),
        guesses,
      };
    } finally {
      await src.close();
    }
  }
  const text = starterConfig({
    version: toolVersion(),
    schemaPath: relativePath(dir, SCHEMA_FILE),
    configName: relativePath(process.cwd(), configPath),
    ...(catalog ? { catalog } : {}),
    outputPath: outputName(args.catalog),
  });
  try {
    await writeFile(configPath, text, { flag: 'wx' });
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'EEXIST') throw new OutputRefused(`${shown} exists; init never replaces a file: choose another name with -o`);
    throw error;
  }
  const lines = [`Wrote ${shown}${args.catalog !== undefined ? ` from ${displayPath(path.resolve(args.catalog))}` : ' (a template: set input.path and the columns)'}`];
  if (guesses) lines.push(...summary(guesses));
  lines.push(`Check it, then run: dawn-census derive -c ${relativePath(process.cwd(), configPath)}`);
  stderr.write(`${lines.map(terminalText).join('\n')}\n`);
  return configPath;
}
