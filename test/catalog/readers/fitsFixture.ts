/**
 * A tiny FITS writer for tests (FITS Standard 4.0): a primary HDU, optionally an image HDU, then
 * one BINTABLE with the given columns. Values are the *stored* (raw) values, so tests can check
 * TSCAL/TZERO/TNULL against expectations computed independently.
 */

export type RawValue = number | bigint | string | boolean | null;

export interface FitsFixtureColumn {
  name?: string;
  /** TFORM, e.g. 'D', '1J', '12A'. */
  tform: string;
  /** Stored values: L true/false/null, A strings, numbers (bigint for K), NaN for E/D. */
  values: RawValue[];
  unit?: string;
  tnull?: number | bigint;
  tscal?: number;
  /** TZERO as the literal written in the card (e.g. '32768', '9223372036854775808'). */
  tzero?: string;
}

export interface FitsFixtureOptions {
  /** Extra cards for the primary header, as [key, literal value]. */
  primaryCards?: [string, string][];
  /** Extra cards for the table header. */
  tableCards?: [string, string][];
  /** Insert an 8-bit image HDU of this many bytes before the table. */
  imageBytes?: number;
  /** Leave the END card out of the table header. */
  omitTableEnd?: boolean;
}

const BLOCK = 2880;
const WIDTH: Record<string, number> = { L: 1, B: 1, I: 2, J: 4, K: 8, A: 1, E: 4, D: 8 };

/** Formats one 80-character card; `value` is a literal (strings must carry their quotes). */
export function card(key: string, value?: string, comment?: string): string {
  let s = key.padEnd(8);
  if (value !== undefined) {
    const v = value.startsWith("'") ? value : value.padStart(20);
    s += `= ${v}`;
    if (comment) s += ` / ${comment}`;
  }
  if (s.length > 80) throw new Error(`card too long: ${s}`);
  return s.padEnd(80);
}

/** Quotes a string for a card value (a doubled quote escapes a quote; padded to 8 characters). */
export function q(s: string): string {
  return `'${s.replace(/'/g, "''").padEnd(8)}'`;
}

function headerBytes(cards: string[], end = true): Buffer {
  const text = cards.join('') + (end ? card('END') : '');
  const padded = text.padEnd(Math.ceil(text.length / BLOCK) * BLOCK, ' ');
  return Buffer.from(padded, 'latin1');
}

function padData(b: Buffer): Buffer {
  const n = Math.ceil(b.length / BLOCK) * BLOCK;
  return Buffer.concat([b, Buffer.alloc(n - b.length)]);
}

/** Builds the bytes of a FITS file holding one binary table. */
export function fitsBinTable(cols: FitsFixtureColumn[], opts: FitsFixtureOptions = {}): Buffer {
  const nRows = cols[0]?.values.length ?? 0;
  const layout = cols.map((c) => {
    const m = /^(\d*)([A-Z])$/.exec(c.tform);
    if (!m) throw new Error(`bad tform ${c.tform}`);
    const repeat = m[1] === '' ? 1 : Number(m[1]);
    return { repeat, code: m[2]!, bytes: repeat * WIDTH[m[2]!]! };
  });
  const rowBytes = layout.reduce((s, l) => s + l.bytes, 0);
  const data = Buffer.alloc(rowBytes * nRows);
  const view = new DataView(data.buffer, data.byteOffset, data.byteLength);
  for (let r = 0; r < nRows; r++) {
    let p = r * rowBytes;
    cols.forEach((c, i) => {
      const { code, repeat, bytes } = layout[i]!;
      const v = c.values[r];
      switch (code) {
        case 'L': data[p] = v === true ? 84 : v === false ? 70 : 0; break;
        case 'A': data.write(String(v ?? '').slice(0, repeat), p, 'latin1'); break;
        case 'B': view.setUint8(p, Number(v)); break;
        case 'I': view.setInt16(p, Number(v), false); break;
        case 'J': view.setInt32(p, Number(v), false); break;
        case 'K': view.setBigInt64(p, BigInt(v as bigint | number), false); break;
        case 'E': view.setFloat32(p, Number(v), false); break;
        case 'D': view.setFloat64(p, Number(v), false); break;
      }
      p += bytes;
    });
  }

  const primary = [card('SIMPLE', 'T'), card('BITPIX', '8'), card('NAXIS', '0'), card('EXTEND', 'T')];
  for (const [k, v] of opts.primaryCards ?? []) primary.push(card(k, v));
  const parts: Buffer[] = [headerBytes(primary)];
  if (opts.imageBytes !== undefined) {
    parts.push(headerBytes([
      card('XTENSION', q('IMAGE')), card('BITPIX', '8'), card('NAXIS', '1'),
      card('NAXIS1', String(opts.imageBytes)), card('PCOUNT', '0'), card('GCOUNT', '1'),
    ]));
    parts.push(padData(Buffer.alloc(opts.imageBytes, 7)));
  }
  const table = [
    card('XTENSION', q('BINTABLE')), card('BITPIX', '8'), card('NAXIS', '2'),
    card('NAXIS1', String(rowBytes)), card('NAXIS2', String(nRows)),
    card('PCOUNT', '0'), card('GCOUNT', '1'), card('TFIELDS', String(cols.length)),
  ];
  cols.forEach((c, i) => {
    const n = i + 1;
    if (c.name !== undefined) table.push(card(`TTYPE${n}`, q(c.name)));
    table.push(card(`TFORM${n}`, q(c.tform)));
    if (c.unit !== undefined) table.push(card(`TUNIT${n}`, q(c.unit)));
    if (c.tnull !== undefined) table.push(card(`TNULL${n}`, String(c.tnull)));
    if (c.tscal !== undefined) table.push(card(`TSCAL${n}`, String(c.tscal)));
    if (c.tzero !== undefined) table.push(card(`TZERO${n}`, c.tzero));
  });
  for (const [k, v] of opts.tableCards ?? []) table.push(card(k, v));
  parts.push(headerBytes(table, !opts.omitTableEnd));
  parts.push(padData(data));
  return Buffer.concat(parts);
}
