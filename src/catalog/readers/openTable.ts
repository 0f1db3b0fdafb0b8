import { open, stat } from 'node:fs/promises';
import type { TableFormat, TableSource } from './types.ts';
import { CatalogError } from './CatalogError.ts';
import { openCsv } from './csv.ts';
import { openEcsv } from './ecsv.ts';
import { openFits } from './fits.ts';
import { openParquet } from './parquet.ts';
import { openVotable } from './votable.ts';

/** File-name endings of each format (checked longest first; case-insensitive). */
const EXTENSIONS: [string, TableFormat][] = [
  ['.fits.gz', 'fits'], ['.votable', 'votable'], ['.parquet', 'parquet'], ['.ecsv', 'ecsv'],
  ['.fits', 'fits'], ['.fit', 'fits'], ['.csv', 'csv'], ['.tsv', 'tsv'], ['.tab', 'tsv'],
  ['.vot', 'votable'], ['.xml', 'votable'], ['.pq', 'parquet'],
];

/** Bytes read to sniff a file's start (enough for an XML prolog with a long comment). */
const SNIFF_BYTES = 64 * 1024;

/**
 * Opens a catalog file and returns its {@link TableSource}.
 *
 * The format is `opts.format` when given, else it follows the extension: .csv, .tsv/.tab, .ecsv,
 * .fits/.fit/.fits.gz, .vot/.xml/.votable, .parquet/.pq. Magic bytes are checked by each reader
 * (FITS `SIMPLE  =`, Parquet `PAR1`, ECSV `# %ECSV`) and here for VOTable (`<VOTABLE` after the
 * XML prolog). One convenience: a `.csv` file that begins with `# %ECSV` is read as ECSV unless
 * `opts.format` says otherwise. Every problem with the file is a one-line {@link CatalogError}.
 *
 * @param path - catalog file
 * @param opts.format - force a format regardless of the extension
 */
export async function openTable(path: string, opts: { format?: TableFormat } = {}): Promise<TableSource> {
  let format = opts.format ?? formatFromPath(path);
  if (format === undefined) {
    throw new CatalogError(`unknown catalog format for "${path}": expected .csv, .tsv, .ecsv, .fits, .vot or .parquet (or set input.format in the config)`);
  }
  await checkReadableFile(path);
  if (format === 'csv' && opts.format === undefined && (await head(path)).replace(/^\uFEFF/, '').startsWith('# %ECSV')) format = 'ecsv';
  switch (format) {
    case 'csv': return openCsv(path, 'csv');
    case 'tsv': return openCsv(path, 'tsv');
    case 'ecsv': return openEcsv(path);
    case 'fits': return openFits(path);
    case 'parquet': return openParquet(path);
    case 'votable':
      if (!looksLikeVotable(await head(path))) throw new CatalogError(`${path}: not a VOTable: no <VOTABLE> element at the start of the file`);
      return openVotable(path);
    default:
      throw new CatalogError(`unknown catalog format "${String(format)}" for "${path}"`);
  }
}

/** The format implied by a file name, or undefined. */
export function formatFromPath(path: string): TableFormat | undefined {
  const lower = path.toLowerCase();
  return EXTENSIONS.find(([ext]) => lower.endsWith(ext))?.[1];
}

async function checkReadableFile(path: string): Promise<void> {
  try {
    const s = await stat(path);
    if (s.isDirectory()) throw new CatalogError(`${path}: is a directory, not a catalog file`);
  } catch (e) {
    if (e instanceof CatalogError) throw e;
    const code = (e as NodeJS.ErrnoException).code;
    throw new CatalogError(`${path}: ${code === 'ENOENT' ? 'no such file' : code === 'EACCES' ? 'permission denied' : `cannot read the file (${code ?? String(e)})`}`);
  }
}

async function head(path: string): Promise<string> {
  const fh = await open(path, 'r');
  try {
    const buf = Buffer.alloc(SNIFF_BYTES);
    const { bytesRead } = await fh.read(buf, 0, SNIFF_BYTES, 0);
    return buf.toString('utf8', 0, bytesRead);
  } finally {
    await fh.close();
  }
}

/** True when, after the XML declaration, comments, processing instructions and a DOCTYPE, the root is VOTABLE. */
export function looksLikeVotable(start: string): boolean {
  let s = start.replace(/^\uFEFF/, '');
  for (;;) {
    s = s.trimStart();
    const m = /^(?:<\?[\s\S]*?\?>|<!--[\s\S]*?-->|<!DOCTYPE[^>[]*(?:\[[\s\S]*?\])?\s*>)/.exec(s);
    if (!m) break;
    s = s.slice(m[0].length);
  }
  return /^<(?:[A-Za-z_][\w.-]*:)?VOTABLE[\s>/]/.test(s);
}
