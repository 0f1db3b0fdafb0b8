import { DEFAULT_GZIP_LIMITS, type GzipLimits } from './gzipLimits.ts';
import { open } from 'node:fs/promises';
import type { TableChunk, TableSource } from './types.ts';
import { CatalogError } from './CatalogError.ts';
import { checkChunkRows } from './ChunkBuilder.ts';
import { cellAsText } from './cellText.ts';
import { ForwardReader, isGzipFile, readBytes } from './byteStream.ts';
import { settleColumnNames } from './columnNames.ts';
import { columnDecoder, describeFitsColumns, hasUnsafeInt64, type FitsColumn } from './fitsColumns.ts';
import { boundedIntKey, dataByteLength, padToBlock, readFitsHeader, type ByteSource, type FitsHeader } from './fitsHeader.ts';
import { MAX_COLUMNS, MAX_FITS_HDUS, MAX_FITS_ROW_BYTES } from './limits.ts';

/** Target bytes per disk read of table rows (whole rows, a multiple of the chunk size). */
const READ_TARGET_BYTES = 4 << 20;

/** Keywords that describe structure or columns rather than the catalog (left out of `meta`). */
const STRUCTURAL = /^(SIMPLE|BITPIX|NAXIS\d*|EXTEND|XTENSION|PCOUNT|GCOUNT|TFIELDS|THEAP|GROUPS|END|CONTINUE|T(TYPE|FORM|UNIT|NULL|SCAL|ZERO|DISP|DIM|COMM|UCD|BCOL)\d+)$/;

/**
 * Opens the first binary table (XTENSION = 'BINTABLE') of a FITS file (FITS Standard 4.0).
 *
 * Rows are read through a file handle in blocks of about 4 MiB, so file size does not bound
 * memory. `meta` holds the non-structural keywords of the primary header overridden by those of
 * the table header (COMMENT/HISTORY as arrays of lines). Cells follow {@link columnDecoder}:
 * TNULL and NaN are null, TSCAL/TZERO applied. Opening scans K (64-bit) columns once: a column
 * holding values beyond ±(2^53 − 1) is read as `string` (exact digits). A gzip-compressed file
 * (`.fits.gz`) is decompressed while it is read: once at opening to learn its size, then once per
 * `chunks()` call; it is never held whole in memory or written to disk.
 *
 * Bounds (each a one-line CatalogError): header size and HDU count (see limits.ts), structural
 * keywords in range (see {@link dataByteLength}), BINTABLE rows of 1 to MAX_FITS_ROW_BYTES bytes,
 * TFIELDS 1–999, and data no longer than the file holds.
 *
 * @param path - file to read
 */
export async function openFits(path: string, limits: Readonly<GzipLimits> = DEFAULT_GZIP_LIMITS): Promise<TableSource> {
  const gzip = await isGzipFile(path) ? limits : null;
  const fh = await openBytes(path, gzip);
  try {
    const size = gzip ? await decompressedSize(path, gzip) : fh.size;
    const { header, primary, dataStart, hdu } = await findBintable(fh, size, path);
    const where = `${path}: HDU ${hdu + 1}`;
    dataByteLength(header, where); // checks BITPIX, NAXISn, PCOUNT, GCOUNT
    const rowBytes = boundedIntKey(header, 'NAXIS1', where, 0, MAX_FITS_ROW_BYTES, 0);
    const nRows = boundedIntKey(header, 'NAXIS2', where, 0, Number.MAX_SAFE_INTEGER, 0);
    if (header.byKey.get('TFIELDS') === undefined) throw new CatalogError(`${where}: BINTABLE header has no TFIELDS keyword`);
    const tfields = boundedIntKey(header, 'TFIELDS', where, 1, Math.min(999, MAX_COLUMNS), 0);
    if (rowBytes === 0 && nRows > 0) throw new CatalogError(`${where}: NAXIS1 = 0: rows of zero bytes hold no values (NAXIS2 = ${nRows})`);
    const cols = describeFitsColumns(header, tfields, rowBytes, where);
    const names = settleColumnNames(cols.map((c) => c.info.name), where);
    cols.forEach((c, i) => { c.info.name = names[i]!; });
    const expected = rowBytes * nRows;
    const found = Math.max(0, size - dataStart);
    if (found < expected) throw new CatalogError(`${path}: truncated FITS data: expected ${expected} bytes, found ${found}`);
    await markUnsafeInt64(fh, cols, dataStart, rowBytes, nRows);
    return fitsSource(path, gzip, cols, nRows, rowBytes, dataStart, fitsMeta(primary, header));
  } finally {
    await fh.close();
  }
}

/** A positional byte reader over the file: a file handle, or a forward-only reader over the decompressed bytes. */
async function openBytes(path: string, gzip: Readonly<GzipLimits> | null): Promise<ByteSource & { size: number; close(): Promise<void> }> {
  if (gzip) {
    const r = new ForwardReader(readBytes(path, path, gzip));
    return { size: 0, read: (b, o, l, p) => r.read(b, o, l, p), close: () => r.close() };
  }
  const fh = await open(path, 'r');
  const size = (await fh.stat()).size;
  return { size, read: (b, o, l, p) => fh.read(b, o, l, p), close: () => fh.close() };
}

async function decompressedSize(path: string, limits: Readonly<GzipLimits>): Promise<number> {
  let n = 0;
  for await (const b of readBytes(path, path, limits)) n += b.length;
  return n;
}

async function findBintable(fh: ByteSource, size: number, file: string) {
  const primary = await readFitsHeader(fh, 0, 0, file);
  if (primary === null) throw new CatalogError(`${file}: not a FITS file: it is empty`);
  let offset = primary.byteLength + padToBlock(dataByteLength(primary, `${file}: HDU 1`));
  for (let hdu = 1; offset < size; hdu++) {
    if (hdu >= MAX_FITS_HDUS) throw new CatalogError(`${file}: no binary table among the first ${MAX_FITS_HDUS} HDUs`);
    const header = await readFitsHeader(fh, offset, hdu, file);
    if (header === null) break;
    const dataStart = offset + header.byteLength;
    if (header.byKey.get('XTENSION')?.value === 'BINTABLE') return { header, primary, dataStart, hdu };
    offset = dataStart + padToBlock(dataByteLength(header, `${file}: HDU ${hdu + 1}`));
  }
  throw new CatalogError(`${file}: no binary table extension (XTENSION = 'BINTABLE') in this FITS file`);
}

/** Gives kind `string` to K columns holding integers a double cannot represent exactly. */
async function markUnsafeInt64(fh: ByteSource, cols: FitsColumn[], dataStart: number, rowBytes: number, nRows: number) {
  const wide = cols.filter((c) => c.code === 'K' && c.info.kind === 'int' && c.repeat === 1);
  if (wide.length === 0 || rowBytes === 0) return;
  const blockRows = Math.max(1, Math.floor(READ_TARGET_BYTES / rowBytes));
  const buf = Buffer.alloc(blockRows * rowBytes);
  const view = new DataView(buf.buffer, buf.byteOffset, buf.byteLength);
  let pending = wide;
  for (let r = 0; r < nRows && pending.length > 0; r += blockRows) {
    const n = Math.min(blockRows, nRows - r);
    await fh.read(buf, 0, n * rowBytes, dataStart + r * rowBytes);
    pending = pending.filter((c) => {
      if (!hasUnsafeInt64(c, view, 0, n, rowBytes)) return true;
      c.info.kind = 'string';
      return false;
    });
  }
}

function fitsSource(path: string, gzip: Readonly<GzipLimits> | null, cols: FitsColumn[], nRows: number, rowBytes: number, dataStart: number, meta: Record<string, unknown>): TableSource {
  const decoders = cols.map(columnDecoder);
  let closed = false;
  return {
    path, format: 'fits', columns: cols.map((c) => c.info), nRows, meta,
    keepAsText(index: number) {
      const d = decoders[index]!;
      cols[index]!.info.kind = 'string';
      decoders[index] = (b, v, s, n, w) => d(b, v, s, n, w).map(cellAsText);
    },
    async *chunks(chunkRows?: number): AsyncGenerator<TableChunk> {
      if (closed) throw new Error(`${path}: chunks() called after close()`);
      const per = checkChunkRows(chunkRows);
      const chunksPerRead = Math.max(1, Math.floor(READ_TARGET_BYTES / Math.max(1, per * rowBytes)));
      const blockRows = per * chunksPerRead;
      const fh = await openBytes(path, gzip);
      try {
        const buf = Buffer.alloc(Math.min(blockRows, nRows) * rowBytes);
        const view = new DataView(buf.buffer, buf.byteOffset, buf.byteLength);
        for (let r0 = 0; r0 < nRows; r0 += blockRows) {
          const n = Math.min(blockRows, nRows - r0);
          const { bytesRead } = await fh.read(buf, 0, n * rowBytes, dataStart + r0 * rowBytes);
          if (bytesRead < n * rowBytes) {
            throw new CatalogError(`${path}: truncated FITS data: expected ${rowBytes * nRows} bytes, found ${r0 * rowBytes + bytesRead}`);
          }
          for (let c0 = 0; c0 < n; c0 += per) {
            const m = Math.min(per, n - c0);
            const start = c0 * rowBytes;
            yield { rowOffset: r0 + c0, nRows: m, columns: decoders.map((d) => d(buf, view, start, m, rowBytes)) };
          }
        }
      } finally {
        await fh.close();
      }
    },
    async close() { closed = true; },
  };
}

function fitsMeta(primary: FitsHeader, table: FitsHeader): Record<string, unknown> {
  const meta: Record<string, unknown> = {};
  for (const h of [primary, table]) {
    const lines: Record<string, string[]> = {};
    for (const c of h.cards) {
      if (c.key === 'COMMENT' || c.key === 'HISTORY') (lines[c.key] ??= []).push(String(c.value));
      else if (c.key !== '' && c.raw !== '' && !STRUCTURAL.test(c.key)) meta[c.key] = c.value;
    }
    Object.assign(meta, lines);
  }
  return meta;
}
