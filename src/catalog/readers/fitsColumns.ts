import type { Cell, ColumnInfo, ColumnKind } from './types.ts';
import { CatalogError } from './CatalogError.ts';
import type { FitsCard, FitsHeader } from './fitsHeader.ts';

/** Bytes per element of each BINTABLE TFORM type code (FITS Standard 4.0, Table 18). */
const TYPE_BYTES: Record<string, number> = { L: 1, X: 1, B: 1, I: 2, J: 4, K: 8, A: 1, E: 4, D: 8, C: 8, M: 16, P: 8, Q: 16 };

/** One BINTABLE column: where it sits in a row and how its cells decode. */
export interface FitsColumn {
  info: ColumnInfo;
  /** TFORM type code (L, B, I, J, K, A, E, D). */
  code: string;
  repeat: number;
  /** Byte offset of the column within a row. */
  offset: number;
  /** TSCALn (default 1) and TZEROn (default 0). */
  scale: number;
  zero: number;
  /** TZEROn as an exact integer, for 64-bit columns. */
  zeroBig: bigint;
  /** TNULLn, compared with the stored integer before scaling. */
  tnull?: bigint;
  /** True when cells are scaled to floats (TSCAL ≠ 1 or a fractional TZERO). */
  scaled: boolean;
}

/**
 * Describes the TFIELDS columns of a BINTABLE header from TTYPEn, TFORMn, TUNITn, TSCALn, TZEROn,
 * TNULLn, TCOMMn (description) and TUCDn (UCD, a common non-standard keyword).
 *
 * Supported: scalar L, B, I, J, K, E, D and rA strings. Array columns (repeat > 1 for a
 * non-character type) and the X, C, M, P, Q types raise a CatalogError naming the column:
 * we only read scalar catalog columns. Integer columns with TSCAL = 1 and an integer TZERO stay
 * `int` (this covers the unsigned conventions TZERO = 128 / 32768 / 2^31 / 2^63); other scaled
 * integers become `float`.
 */
export function describeFitsColumns(h: FitsHeader, tfields: number, rowBytes: number, where: string): FitsColumn[] {
  const cols: FitsColumn[] = [];
  let offset = 0;
  for (let n = 1; n <= tfields; n++) {
    const tform = h.byKey.get(`TFORM${n}`);
    const name = str(h.byKey.get(`TTYPE${n}`)) || `col${n}`;
    if (tform === undefined || typeof tform.value !== 'string') throw new CatalogError(`${where}: column ${n} ("${name}") has no TFORM${n} keyword`);
    const m = /^\s*(\d*)([A-Z])(.*)$/.exec(tform.value);
    const code = m?.[2];
    const width = code === undefined ? undefined : TYPE_BYTES[code];
    if (!m || code === undefined || width === undefined) {
      throw new CatalogError(`${where}: column "${name}": cannot read TFORM${n} = '${tform.value}'`);
    }
    const repeat = m[1] === '' ? 1 : Number(m[1]);
    const describe = `column "${name}" (TFORM${n} = '${tform.value.trim()}')`;
    if ('XCMPQ'.includes(code)) throw new CatalogError(`${where}: ${describe}: FITS type ${code} is not supported (use L, B, I, J, K, E, D or A)`);
    if (code !== 'A' && repeat > 1) {
      throw new CatalogError(`${where}: ${describe} is an array of ${repeat} values; only scalar columns are supported (remove the column or split it into scalar columns)`);
    }
    const scale = num(h.byKey.get(`TSCAL${n}`), 1, where);
    const zeroCard = h.byKey.get(`TZERO${n}`);
    const zero = num(zeroCard, 0, where);
    const integer = 'BIJK'.includes(code);
    const scaled = integer && (scale !== 1 || !Number.isInteger(zero));
    const kind: ColumnKind = code === 'L' ? 'bool' : code === 'A' ? 'string' : code === 'E' || code === 'D' || scaled ? 'float' : 'int';
    const info: ColumnInfo = { name, kind };
    const unit = str(h.byKey.get(`TUNIT${n}`));
    if (unit) info.unit = unit;
    const desc = str(h.byKey.get(`TCOMM${n}`));
    if (desc) info.description = desc;
    const ucd = str(h.byKey.get(`TUCD${n}`));
    if (ucd) info.ucd = ucd;
    const col: FitsColumn = { info, code, repeat, offset, scale, zero, zeroBig: exactZero(zeroCard, zero), scaled };
    const tnull = h.byKey.get(`TNULL${n}`);
    if (tnull !== undefined && integer && /^[+-]?\d+$/.test(tnull.raw)) col.tnull = BigInt(tnull.raw);
    cols.push(col);
    offset += repeat * width;
  }
  if (offset !== rowBytes) throw new CatalogError(`${where}: the columns' TFORMs add up to ${offset} bytes per row but NAXIS1 = ${rowBytes}`);
  return cols;
}

/** Decoder of one column over `nRows` rows of `buf` starting at byte `start`. */
export type ColumnDecoder = (buf: Buffer, view: DataView, start: number, nRows: number, rowBytes: number) => Cell[];

/**
 * Builds the decoder of a column (big-endian, FITS Standard 4.0 §7.3). TNULL integers and NaN
 * floats become null (NaN is the FITS null for floating-point columns); L bytes `T`/`F` are
 * booleans and 0 is null; strings stop at the first NUL and lose trailing blanks, "" is null.
 * A K column whose values exceed ±(2^53 − 1) must have been given kind `string` (exact digits).
 */
export function columnDecoder(col: FitsColumn): ColumnDecoder {
  const { offset, scale, zero, zeroBig, tnull, scaled, code, repeat } = col;
  const nullNum = tnull === undefined ? undefined : Number(tnull);
  if (repeat === 0) return (_b, _v, _s, nRows) => new Array<Cell>(nRows).fill(null);
  const num = (get: (view: DataView, p: number) => number): ColumnDecoder => (_b, view, start, nRows, rowBytes) => {
    const out: Cell[] = new Array(nRows);
    for (let r = 0, p = start + offset; r < nRows; r++, p += rowBytes) {
      const raw = get(view, p);
      out[r] = raw === nullNum ? null : scaled ? zero + scale * raw : raw + zero;
    }
    return out;
  };
  switch (code) {
    case 'L': return (buf, _v, start, nRows, rowBytes) => {
      const out: Cell[] = new Array(nRows);
      for (let r = 0, p = start + offset; r < nRows; r++, p += rowBytes) {
        const b = buf[p];
        out[r] = b === 84 ? true : b === 70 ? false : null;
      }
      return out;
    };
    case 'A': return (buf, _v, start, nRows, rowBytes) => {
      const out: Cell[] = new Array(nRows);
      for (let r = 0, p = start + offset; r < nRows; r++, p += rowBytes) {
        const lim = p + repeat;
        let e = p;
        while (e < lim && buf[e] !== 0) e++;
        while (e > p && buf[e - 1] === 32) e--;
        out[r] = e === p ? null : buf.toString('latin1', p, e);
      }
      return out;
    };
    case 'B': return num((v, p) => v.getUint8(p));
    case 'I': return num((v, p) => v.getInt16(p, false));
    case 'J': return num((v, p) => v.getInt32(p, false));
    case 'E':
    case 'D': {
      const wide = code === 'D';
      const plain = scale === 1 && zero === 0;
      return (_b, view, start, nRows, rowBytes) => {
        const out: Cell[] = new Array(nRows);
        for (let r = 0, p = start + offset; r < nRows; r++, p += rowBytes) {
          const x = wide ? view.getFloat64(p, false) : view.getFloat32(p, false);
          out[r] = Number.isNaN(x) ? null : plain ? x : zero + scale * x;
        }
        return out;
      };
    }
    case 'K': return (_b, view, start, nRows, rowBytes) => {
      const out: Cell[] = new Array(nRows);
      const asString = col.info.kind === 'string';
      for (let r = 0, p = start + offset; r < nRows; r++, p += rowBytes) {
        const raw = view.getBigInt64(p, false);
        if (raw === tnull) { out[r] = null; continue; }
        if (scaled) { out[r] = zero + scale * Number(raw); continue; }
        const v = raw + zeroBig;
        out[r] = asString ? v.toString() : Number(v);
      }
      return out;
    };
    default: throw new Error(`unreachable FITS type ${code}`);
  }
}

/** True when a K column holds a value that a double cannot represent exactly. */
export function hasUnsafeInt64(col: FitsColumn, view: DataView, start: number, nRows: number, rowBytes: number): boolean {
  const lim = BigInt(Number.MAX_SAFE_INTEGER);
  for (let r = 0, p = start + col.offset; r < nRows; r++, p += rowBytes) {
    const raw = view.getBigInt64(p, false);
    if (raw === col.tnull) continue;
    const v = raw + col.zeroBig;
    if (v > lim || v < -lim) return true;
  }
  return false;
}

function str(c: FitsCard | undefined): string {
  return typeof c?.value === 'string' ? c.value.trim() : '';
}

function num(c: FitsCard | undefined, dflt: number, where: string): number {
  if (c === undefined) return dflt;
  if (typeof c.value !== 'number') throw new CatalogError(`${where}: keyword ${c.key} must be a number, got "${c.raw}"`);
  return c.value;
}

/** TZEROn as a BigInt (exact for 2^63, which a double also holds exactly). */
function exactZero(c: FitsCard | undefined, zero: number): bigint {
  if (c !== undefined && /^[+-]?\d+$/.test(c.raw)) return BigInt(c.raw);
  return Number.isInteger(zero) ? BigInt(zero) : 0n;
}
