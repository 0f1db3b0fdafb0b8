import { DEFAULT_GZIP_LIMITS, type GzipLimits } from './gzipLimits.ts';
import type { Cell, ColumnInfo, ColumnKind, TableChunk, TableSource } from './types.ts';
import { CatalogError } from './CatalogError.ts';
import { ChunkBuilder, checkChunkRows } from './ChunkBuilder.ts';
import { DelimitedTokenizer } from './DelimitedTokenizer.ts';
import { KindInference } from './KindInference.ts';
import { parseBoolText, parseNumberText } from './cellText.ts';
import { MAX_META_COMMENTS } from './limits.ts';
import { settleColumnNames } from './columnNames.ts';
import { readTextChunks } from './textChunks.ts';

/**
 * Opens a CSV (`,`) or TSV (tab) file with a header line.
 *
 * Opening makes one full pass that checks the structure (UTF-8, quoting, field counts), counts
 * the rows and infers each column's kind (see {@link KindInference}); `chunks()` then converts
 * cells to that kind. Empty cells (also `""`) are null. Comment lines (`#`) above the header are
 * kept in `meta.comments`; a `#` line after the header is data, unless `commentPrefix` (one
 * character, the config's `input.comment`) makes every line starting with it a comment. Memory
 * stays bounded by one read buffer plus one chunk. A gzip-compressed file is read as well.
 *
 * @param path - file to read
 * @param format - `'csv'` or `'tsv'` (picks the delimiter)
 * @param commentPrefix - optional one-character comment prefix valid on every line
 * @param limits - bounds on the decompressed bytes of a gzip file (see readBytes)
 */
export async function openCsv(path: string, format: 'csv' | 'tsv', commentPrefix?: string, limits: Readonly<GzipLimits> = DEFAULT_GZIP_LIMITS): Promise<TableSource> {
  const delimiter = format === 'tsv' ? '\t' : ',';
  const tokOpts = { delimiter, label: path, ...(commentPrefix !== undefined ? { commentPrefix } : {}) };
  let names: string[] | null = null as string[] | null;
  let inference: KindInference[] = [];
  let nRows = 0;
  const comments: string[] = [];
  const tok = new DelimitedTokenizer(
    tokOpts,
    (fields, line) => {
      if (names === null) {
        names = settleColumnNames(fields, `${path}: line ${line}`);
        inference = names.map(() => new KindInference());
        return;
      }
      if (fields.length !== names.length) {
        throw new CatalogError(`${path}: line ${line}: ${fields.length} fields, header has ${names.length}`);
      }
      for (let i = 0; i < fields.length; i++) {
        const s = fields[i]!;
        if (s !== '') inference[i]!.add(s);
      }
      nRows++;
    },
    (text) => {
      if (names === null && comments.length < MAX_META_COMMENTS) comments.push(text.trim());
    },
  );
  for await (const text of readTextChunks(path, path, limits)) tok.push(text);
  tok.end();
  const header: string[] | null = names;
  if (header === null) throw new CatalogError(`${path}: empty file: no header line`);
  const columns: ColumnInfo[] = header.map((name, i) => ({ name, kind: inference[i]!.kind }));
  return delimitedSource(path, format, columns, nRows, comments.length ? { comments } : {}, tokOpts, 1, limits);
}

/**
 * Characters of text tokenized between two looks for complete chunks (see `chunks`). A slice may
 * end anywhere, inside a field, a quoted line break, a CRLF or a surrogate pair: the tokenizer
 * carries its state across pieces.
 */
export const TOKENIZE_SLICE_CHARS = 64 * 1024;

/**
 * A {@link TableSource} over delimited text whose structure was already checked: `chunks()`
 * re-tokenizes the file, skips `skipRecords` header records and converts each cell to its
 * column's kind.
 */
export function delimitedSource(
  path: string,
  format: TableSource['format'],
  columns: ColumnInfo[],
  nRows: number,
  meta: Record<string, unknown>,
  tokOpts: { delimiter: string; label: string; commentPrefix?: string },
  skipRecords: number,
  limits: Readonly<GzipLimits> = DEFAULT_GZIP_LIMITS,
): TableSource {
  const converters = columns.map((c) => converterFor(c.kind));
  let closed = false;
  return {
    path, format, columns, nRows, meta,
    keepAsText(index: number) {
      columns[index]!.kind = 'string';
      converters[index] = converterFor('string');
    },
    async *chunks(chunkRows?: number): AsyncGenerator<TableChunk> {
      if (closed) throw new Error(`${path}: chunks() called after close()`);
      const builder = new ChunkBuilder(columns.length, checkChunkRows(chunkRows));
      let skip = skipRecords;
      const tok = new DelimitedTokenizer(tokOpts, (fields) => {
        if (skip > 0) { skip--; return; }
        const cols = builder.cols;
        for (let i = 0; i < converters.length; i++) cols[i]!.push(converters[i]!(fields[i] ?? ''));
        builder.rowDone();
      });
      for await (const text of readTextChunks(path, path, limits)) {
        // A read (1 MiB) is tokenized a slice at a time, and the chunks it completes go out
        // between slices: the first rows reach the caller (a derive run's workers, waiting) once
        // they are read, not once the whole read is tokenized (40–60 ms of a 20,000-row file).
        for (let at = 0; at < text.length; at += TOKENIZE_SLICE_CHARS) {
          tok.push(text.length <= TOKENIZE_SLICE_CHARS ? text : text.slice(at, at + TOKENIZE_SLICE_CHARS));
          yield* builder.takeReady();
        }
      }
      tok.end();
      yield* builder.finish();
    },
    async close() { closed = true; },
  };
}

/** Text-to-cell conversion for a column of the given kind ('' is null). */
export function converterFor(kind: ColumnKind): (s: string) => Cell {
  switch (kind) {
    case 'float': return (s) => (s === '' ? null : parseNumberText(s));
    case 'int': return (s) => (s === '' ? null : Number(s));
    case 'bool': return (s) => (s === '' ? null : parseBoolText(s));
    case 'string': return (s) => (s === '' ? null : s);
  }
}
