import type { ColumnDoc } from '../metadata/columnDoc.ts';
import type { CellValue } from '../parquet/parquetWriter.ts';
import { astropyHeaderLines } from './astropyHeader.ts';
import { headerBlock, stringCards, valueCard } from './fitsCards.ts';
import type { TableDoc } from './tableDoc.ts';
import { votableParts, xmlText } from './votableXml.ts';

/** Writes one format: a header, rows in order, a footer. Every method returns bytes to append. */
export interface FormatWriter {
  head(): Buffer;
  rows(rows: readonly (readonly CellValue[])[]): Buffer;
  tail(): Buffer;
}

const isNull = (v: CellValue): boolean => v === null || v === undefined || (typeof v === 'number' && Number.isNaN(v));
/** Shortest text that reads back as the same double (JavaScript's own, which Python parses alike). */
const numberText = (v: number): string => (Number.isFinite(v) ? String(v) : v > 0 ? 'inf' : '-inf');

/** ECSV 1.0: astropy's header in `# ` comments, then comma-separated values; an empty field is a missing value. */
export function ecsvWriter(doc: TableDoc): FormatWriter {
  const csvField = (s: string): string => (/[",\s#]/.test(s) || s === '' ? `"${s.replaceAll('"', '""')}"` : s);
  const cell = (v: CellValue, c: ColumnDoc): string => {
    if (isNull(v)) return '';
    if (c.kind === 'bool') return v ? 'True' : 'False';
    if (c.kind === 'string') return csvField(String(v));
    return typeof v === 'number' ? numberText(v) : String(v);
  };
  return {
    head: () => Buffer.from(['# %ECSV 1.0', '# ---', ...astropyHeaderLines(doc, ',').map((l) => `# ${l}`), doc.columns.map((c) => csvField(c.name)).join(',')].join('\n') + '\n'),
    rows: (rows) => Buffer.from(rows.map((r) => doc.columns.map((c, i) => cell(r[i] ?? null, c)).join(',') + '\n').join('')),
    tail: () => Buffer.alloc(0),
  };
}

/** VOTable 1.4 with TABLEDATA: one TR per row; an empty TD is a missing value (NaN for doubles). */
export function votableWriter(doc: TableDoc): FormatWriter {
  const { head, tail } = votableParts(doc);
  const cell = (v: CellValue, c: ColumnDoc): string => {
    if (isNull(v)) return '<TD/>';
    if (c.kind === 'bool') return `<TD>${v ? 'T' : 'F'}</TD>`;
    if (c.kind === 'float' && typeof v === 'number') return `<TD>${numberText(v).replace('inf', 'Inf')}</TD>`;
    return `<TD>${xmlText(String(v))}</TD>`;
  };
  return {
    head: () => Buffer.from(`${head}      <DATA>\n        <TABLEDATA>\n`),
    rows: (rows) => Buffer.from(rows.map((r) => `          <TR>${doc.columns.map((c, i) => cell(r[i] ?? null, c)).join('')}</TR>\n`).join('')),
    tail: () => Buffer.from(`        </TABLEDATA>\n      </DATA>\n${tail}`),
  };
}

/**
 * FITS binary table (an empty primary HDU, then BINTABLE): doubles as D (NaN when missing),
 * integers as K, flags as L (0 when missing), text as fixed-width A (UTF-8 bytes, NUL-padded),
 * with TUNITn, TUCDn and TCOMMn (the description) for every column. Needs the row count and
 * the widest text of each string column (bytes) before the first row.
 */
export function fitsWriter(doc: TableDoc, nRows: number, textWidth: readonly number[]): FormatWriter {
  const widths = doc.columns.map((c, i) => (c.kind === 'float' || c.kind === 'int' ? 8 : c.kind === 'bool' ? 1 : Math.max(1, textWidth[i] ?? 1)));
  const rowBytes = widths.reduce((a, b) => a + b, 0);
  const form = (c: ColumnDoc, w: number): string => (c.kind === 'float' ? 'D' : c.kind === 'int' ? 'K' : c.kind === 'bool' ? 'L' : `${w}A`);
  let written = 0;
  return {
    head: () => {
      const primary = headerBlock([valueCard('SIMPLE', true, 'conforms to FITS standard'), valueCard('BITPIX', 8), valueCard('NAXIS', 0), valueCard('EXTEND', true)]);
      const cards = [
        stringCards('XTENSION', 'BINTABLE')[0]!,
        valueCard('BITPIX', 8),
        valueCard('NAXIS', 2),
        valueCard('NAXIS1', rowBytes, 'bytes per row'),
        valueCard('NAXIS2', nRows, 'rows'),
        valueCard('PCOUNT', 0),
        valueCard('GCOUNT', 1),
        valueCard('TFIELDS', doc.columns.length),
        ...stringCards('EXTNAME', doc.name.toUpperCase()),
      ];
      doc.columns.forEach((c, k) => {
        const n = k + 1;
        cards.push(...stringCards(`TTYPE${n}`, c.name), ...stringCards(`TFORM${n}`, form(c, widths[k]!)));
        if (c.unit) cards.push(...stringCards(`TUNIT${n}`, c.unit));
        if (c.ucd) cards.push(...stringCards(`TUCD${n}`, c.ucd));
        cards.push(...stringCards(`TCOMM${n}`, c.description));
      });
      for (const [k, v] of doc.meta) cards.push(...stringCards(metaKey(k), v));
      return Buffer.concat([primary, headerBlock(cards)]);
    },
    rows: (rows) => {
      const buf = Buffer.alloc(rows.length * rowBytes, 0);
      let off = 0;
      for (const r of rows) {
        doc.columns.forEach((c, i) => {
          const v = r[i] ?? null;
          const w = widths[i]!;
          if (c.kind === 'float') buf.writeDoubleBE(isNull(v) ? NaN : Number(v), off);
          else if (c.kind === 'int') buf.writeBigInt64BE(BigInt(isNull(v) ? 0 : (v as number | bigint)), off);
          else if (c.kind === 'bool') buf.write(isNull(v) ? '\0' : v ? 'T' : 'F', off, 'latin1');
          else {
            // Padded with NUL (the buffer's zeros), which ends a FITS string (FITS 4.0 §7.3.3.1).
            if (!isNull(v)) Buffer.from(String(v), 'utf8').copy(buf, off, 0, w);
          }
          off += w;
        });
      }
      written += rows.length;
      return buf;
    },
    tail: () => {
      if (written !== nRows) throw new Error(`FITS writer: ${written} rows written, ${nRows} announced`);
      const data = nRows * rowBytes;
      return Buffer.alloc((2880 - (data % 2880)) % 2880, 0);
    },
  };
}

/** Table-level facts as short FITS keywords (8 characters at most). */
function metaKey(k: string): string {
  const known: Record<string, string> = { title: 'TITLE', group: 'ORIGIN', licence: 'LICENSE', citation: 'REFERENC', authors: 'AUTHOR', catalog_version: 'CATVERS', doi: 'DOI', tool: 'CREATOR', input_sha256: 'INSHA256', description: 'COMMENT' };
  return known[k] ?? k.slice(0, 8).toUpperCase();
}
