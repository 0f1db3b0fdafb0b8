import { stat } from 'node:fs/promises';
import type { TableFormat, TableSource } from './types.ts';
import { CatalogError } from './CatalogError.ts';
import { readBytes } from './byteStream.ts';
import { DEFAULT_GZIP_LIMITS, type GzipLimits } from './gzipLimits.ts';
import { openCsv } from './csv.ts';
import { openEcsv } from './ecsv.ts';
import { openFits } from './fits.ts';
import { openParquet } from './parquet.ts';
import { openVotable } from './votable.ts';

/** File-name endings of each format (case-insensitive; a further `.gz` is allowed after any of them). */
const EXTENSIONS: [string, TableFormat][] = [
  ['.votable', 'votable'], ['.parquet', 'parquet'], ['.ecsv', 'ecsv'],
  ['.fits', 'fits'], ['.fit', 'fits'], ['.csv', 'csv'], ['.tsv', 'tsv'], ['.tab', 'tsv'],
  ['.vot', 'votable'], ['.xml', 'votable'], ['.pq', 'parquet'],
];

/** Bytes read to sniff a file's start (enough for an XML prolog with a long comment). */
const SNIFF_BYTES = 64 * 1024;

/**
 * Opens a catalog file and returns its {@link TableSource}.
 *
 * The format is `opts.format` when given, else it follows the extension: .csv, .tsv/.tab, .ecsv,
 * .fits/.fit, .vot/.xml/.votable, .parquet/.pq, each optionally followed by `.gz`. A file that
 * starts with the gzip magic bytes is decompressed while it is read (CSV, TSV, ECSV, FITS and
 * VOTable; not Parquet, which compresses internally). Magic bytes are checked by each reader
 * (FITS `SIMPLE  =`, Parquet `PAR1`, ECSV `# %ECSV`) and here for VOTable (`<VOTABLE` after the
 * XML prolog). One convenience: a `.csv` file that begins with `# %ECSV` is read as ECSV unless
 * `opts.format` says otherwise. Every problem with the file is a one-line {@link CatalogError}.
 *
 * @param path - catalog file
 * @param opts.format - force a format regardless of the extension
 * @param opts.commentPrefix - CSV/TSV only: one character that starts a comment line anywhere
 *   (without it, only `#` lines above the header are comments)
 * @param opts.gzipLimits - bounds on a gzip file's decompressed bytes (default DEFAULT_GZIP_LIMITS; see readBytes)
 */
export async function openTable(path: string, opts: { format?: TableFormat; commentPrefix?: string; gzipLimits?: Readonly<GzipLimits> } = {}): Promise<TableSource> {
  const limits = opts.gzipLimits ?? DEFAULT_GZIP_LIMITS;
  let format = opts.format ?? formatFromPath(path);
  if (format === undefined) {
    throw new CatalogError(`unknown catalog format for "${path}": expected .csv, .tsv, .ecsv, .fits, .vot or .parquet (or set input.format in the config)`);
  }
  await checkReadableFile(path);
  if (format === 'csv' && opts.format === undefined && (await head(path, limits)).replace(/^\uFEFF/, '').startsWith('# %ECSV')) format = 'ecsv';
  switch (format) {
    case 'csv': return openCsv(path, 'csv', opts.commentPrefix, limits);
    case 'tsv': return openCsv(path, 'tsv', opts.commentPrefix, limits);
    case 'ecsv': return openEcsv(path, limits);
    case 'fits': return openFits(path, limits);
    case 'parquet': return openParquet(path);
    case 'votable':
      if (!looksLikeVotable(await head(path, limits))) throw new CatalogError(`${path}: not a VOTable: no <VOTABLE> element at the start of the file`);
      return openVotable(path, limits);
    default:
      throw new CatalogError(`unknown catalog format "${String(format)}" for "${path}"`);
  }
}

/** The format implied by a file name, or undefined. */
export function formatFromPath(path: string): TableFormat | undefined {
  const lower = path.toLowerCase().replace(/\.gz$/, '');
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

/** The first SNIFF_BYTES bytes of the file (decompressed when it is gzip) as text. */
async function head(path: string, limits: Readonly<GzipLimits>): Promise<string> {
  const parts: Buffer[] = [];
  let n = 0;
  for await (const b of readBytes(path, path, limits)) {
    parts.push(b);
    n += b.length;
    if (n >= SNIFF_BYTES) break;
  }
  return Buffer.concat(parts).subarray(0, SNIFF_BYTES).toString('utf8');
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
