import type { Cell, ColumnKind } from './types.ts';
import { CatalogError } from './CatalogError.ts';
import { MAX_FIELD_CHARS } from './limits.ts';
import type { VotField } from './votableFields.ts';

/** Bytes per element of each VOTable datatype in the BINARY serializations (IVOA VOTable 1.4 §5.1). */
const ELEMENT_BYTES: Record<string, number> = {
  boolean: 1, bit: 1, unsignedByte: 1, short: 2, int: 4, long: 8, char: 1, unicodeChar: 2, float: 4, double: 8,
};

interface Layout {
  datatype: string;
  kind: ColumnKind;
  /** Elements per cell, or -1 for a variable-length cell (arraysize `*` or `N*`) with a 4-byte count. */
  count: number;
  elem: number;
  nullNum?: number;
  nullBig?: bigint;
}

/**
 * Decodes the base64 `<STREAM>` of a VOTable BINARY or BINARY2 table (IVOA VOTable 1.4 §5) into
 * rows of cells, fed with text pieces of any size. BINARY2 rows start with a null bitmap (one bit
 * per field, most significant first). Nulls: the BINARY2 bit, NaN floats, integers equal to the
 * FIELD's `<VALUES null>`, booleans other than T/F/1/0, empty strings. Strings stop at the first
 * NUL; `char` is read as Latin-1, `unicodeChar` as UCS-2 big-endian. A `long` beyond ±(2^53 − 1)
 * comes out as its exact decimal digits (a string).
 *
 * Bounds: a variable-length cell longer than MAX_FIELD_CHARS elements, invalid base64, or bytes
 * left over after the last whole row are CatalogErrors. Only one row is ever held undecoded.
 */
export class VotBinaryDecoder {
  private readonly layouts: Layout[];
  private readonly maskBytes: number;
  private b64 = '';
  private pending: Buffer = Buffer.alloc(0);
  private rows = 0;

  private readonly label: string;
  private readonly onRow: (cells: Cell[]) => void;

  /**
   * @param fields - the table's FIELDs with the kind each is read as
   * @param binary2 - true for BINARY2 (rows carry a null bitmap)
   * @param label - file name for messages
   * @param onRow - receives each decoded row
   */
  constructor(fields: { field: VotField; kind: ColumnKind }[], binary2: boolean, label: string, onRow: (cells: Cell[]) => void) {
    this.label = label;
    this.onRow = onRow;
    this.layouts = fields.map(({ field, kind }) => layoutOf(field, kind));
    this.maskBytes = binary2 ? Math.ceil(fields.length / 8) : 0;
  }

  /** Feeds a piece of the base64 text (whitespace anywhere is ignored). */
  push(text: string): void {
    const clean = this.b64 + text.replace(/\s+/g, '');
    if (!/^[A-Za-z0-9+/]*={0,2}$/.test(clean)) throw this.fail('the BINARY stream is not valid base64');
    const whole = clean.length - (clean.length % 4);
    this.b64 = clean.slice(whole);
    if (whole === 0) return;
    const bytes = Buffer.from(clean.slice(0, whole), 'base64');
    this.pending = this.pending.length ? Buffer.concat([this.pending, bytes]) : bytes;
    let pos = 0;
    for (;;) {
      const next = this.row(this.pending, pos);
      if (next < 0) break;
      pos = next;
    }
    this.pending = this.pending.subarray(pos);
  }

  /** Ends the stream; bytes left that do not make a whole row are an error. */
  end(): void {
    if (this.b64.replace(/=+$/, '') !== '' || this.pending.length > 0) {
      throw this.fail(`the BINARY stream ends inside row ${this.rows + 1} (truncated or corrupt data)`);
    }
  }

  /** Decodes the row at `pos`; returns the position after it, or -1 when it is not complete yet. */
  private row(buf: Buffer, pos: number): number {
    let p = pos + this.maskBytes;
    if (p > buf.length) return -1;
    const cells: Cell[] = new Array<Cell>(this.layouts.length);
    for (let i = 0; i < this.layouts.length; i++) {
      const l = this.layouts[i]!;
      let count = l.count;
      if (count < 0) {
        if (p + 4 > buf.length) return -1;
        count = buf.readUInt32BE(p);
        p += 4;
        if (count > MAX_FIELD_CHARS) throw this.fail(`row ${this.rows + 1}: a cell of ${count} elements, more than the ${MAX_FIELD_CHARS} allowed`);
      }
      const size = count * l.elem;
      if (p + size > buf.length) return -1;
      const masked = this.maskBytes > 0 && (buf[pos + (i >> 3)]! & (0x80 >> (i & 7))) !== 0;
      cells[i] = masked ? null : decodeCell(l, buf, p, count);
      p += size;
    }
    this.rows++;
    this.onRow(cells);
    return p;
  }

  private fail(msg: string): CatalogError {
    return new CatalogError(`${this.label}: ${msg}`);
  }
}

function layoutOf(f: VotField, kind: ColumnKind): Layout {
  const datatype = f.attrs.datatype ?? '';
  const elem = ELEMENT_BYTES[datatype] ?? 1;
  const a = f.attrs.arraysize?.trim();
  let count = 1;
  if (kind === 'string' && a !== undefined) count = a.endsWith('*') ? -1 : Number.parseInt(a, 10) || 0;
  const l: Layout = { datatype, kind, count, elem };
  const nul = f.nullValue?.trim();
  if (nul !== undefined && /^[+-]?\d+$/.test(nul)) {
    l.nullNum = Number(nul);
    l.nullBig = BigInt(nul);
  }
  return l;
}

function decodeCell(l: Layout, buf: Buffer, p: number, count: number): Cell {
  switch (l.datatype) {
    case 'char':
    case 'unicodeChar': {
      const wide = l.datatype === 'unicodeChar';
      let end = p;
      const lim = p + count * l.elem;
      while (end < lim && !(buf[end] === 0 && (!wide || buf[end + 1] === 0))) end += l.elem;
      if (end === p) return null;
      if (!wide) return buf.toString('latin1', p, end);
      const le = Buffer.from(buf.subarray(p, end));
      le.swap16();
      return le.toString('utf16le');
    }
    case 'boolean': {
      const c = buf[p];
      return c === 84 || c === 116 || c === 49 ? true : c === 70 || c === 102 || c === 48 ? false : null;
    }
    // The standard puts a scalar bit in the most significant bit (0x80); astropy 5.2.1 writes and
    // reads it as 0x08 (converters.py, Bit.binparse). The other bits are padding, so any set bit is true.
    case 'bit': return buf[p]! !== 0;
    case 'unsignedByte': return intOrNull(buf[p]!, l);
    case 'short': return intOrNull(buf.readInt16BE(p), l);
    case 'int': return intOrNull(buf.readInt32BE(p), l);
    case 'long': {
      const v = buf.readBigInt64BE(p);
      if (v === l.nullBig) return null;
      const x = Number(v);
      return Number.isSafeInteger(x) ? x : v.toString();
    }
    case 'float':
    case 'double': {
      const x = l.datatype === 'float' ? buf.readFloatBE(p) : buf.readDoubleBE(p);
      return Number.isNaN(x) ? null : x;
    }
    default: return null;
  }
}

function intOrNull(x: number, l: Layout): Cell {
  return x === l.nullNum ? null : x;
}
