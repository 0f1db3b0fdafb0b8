import type { Cell, ColumnInfo, ColumnKind } from './types.ts';
import { isNumberText, parseNumberText } from './cellText.ts';

/** A FIELD (or PARAM) as declared: its attributes, DESCRIPTION and VALUES null. */
export interface VotField {
  attrs: Record<string, string>;
  description?: string;
  nullValue?: string;
}

/** Parses the text of one TD into a cell; `undefined` means the text is not valid for the datatype. */
export type VotParser = (s: string) => Cell | undefined;

const INT_TYPES = new Set(['unsignedByte', 'short', 'int', 'long']);
const FLOAT_TYPES = new Set(['float', 'double']);
const TEXT_TYPES = new Set(['char', 'unicodeChar']);

/**
 * Kind of a VOTable datatype (IVOA VOTable 1.4 §2.1), or an explanation of why it is not read:
 * scalar boolean, bit (read as a boolean, as Astropy writes boolean columns), unsignedByte, short,
 * int, long, float, double and char/unicodeChar strings of any arraysize are supported; numeric
 * arrays and the complex types are not.
 */
export function votKind(f: VotField): ColumnKind | string {
  const dt = f.attrs.datatype ?? '';
  const arraysize = f.attrs.arraysize;
  if (TEXT_TYPES.has(dt)) return 'string';
  const known = dt === 'boolean' || dt === 'bit' || INT_TYPES.has(dt) || FLOAT_TYPES.has(dt);
  if (!known) return dt === '' ? 'has no datatype' : `has datatype "${dt}", which is not supported`;
  if (arraysize !== undefined && arraysize.trim() !== '1') {
    return `is an array (arraysize="${arraysize}"); only scalar columns are supported (remove the column or split it into scalar columns)`;
  }
  return dt === 'boolean' || dt === 'bit' ? 'bool' : INT_TYPES.has(dt) ? 'int' : 'float';
}

/** The column description of a FIELD. */
export function votColumnInfo(f: VotField, name: string, kind: ColumnKind): ColumnInfo {
  const info: ColumnInfo = { name, kind };
  if (f.attrs.unit) info.unit = f.attrs.unit;
  if (f.description) info.description = f.description;
  if (f.attrs.ucd) info.ucd = f.attrs.ucd;
  return info;
}

/**
 * The TD parser of a FIELD. Blank cells and the FIELD's `<VALUES null="...">` are null; floats:
 * NaN is null (the VOTable null for floating point), `Inf`/`+Inf`/`-Inf` are ±Infinity; integers
 * accept decimal or `0x` hexadecimal; booleans accept T/F/TRUE/FALSE/1/0 (any case), `?` is null.
 * Strings are kept exactly as written, blanks included; an empty TD is null. With `bigAsString` (a long column holding values beyond
 * ±(2^53 − 1), read as kind `string`) integers come out as exact decimal digits.
 */
export function votParser(f: VotField, kind: ColumnKind, bigAsString: boolean): VotParser {
  const nul = f.nullValue?.trim();
  const nulNum = nul !== undefined && nul !== '' ? Number(nul) : NaN;
  switch (kind) {
    case 'string':
      return (s) => (s === '' || s === nul ? null : s);
    case 'bool':
      return (s) => {
        const t = s.trim().toLowerCase();
        if (t === '' || t === '?' || t === nul?.toLowerCase()) return null;
        if (t === 't' || t === 'true' || t === '1') return true;
        if (t === 'f' || t === 'false' || t === '0') return false;
        return undefined;
      };
    case 'int':
      return (s) => {
        const t = s.trim();
        if (t === '' || t === nul) return null;
        let x: number;
        if (/^[+-]?\d+$/.test(t)) x = Number(t);
        else if (/^0x[0-9a-f]+$/i.test(t)) x = parseInt(t.slice(2), 16);
        else return undefined;
        if (x === nulNum) return null;
        return bigAsString ? BigInt(t).toString() : x;
      };
    case 'float':
      return (s) => {
        const t = s.trim();
        if (t === '' || t === nul) return null;
        if (!isNumberText(t)) return undefined;
        const x = parseNumberText(t);
        return Number.isNaN(x) || x === nulNum ? null : x;
      };
  }
}

/** The TD parser that keeps a cell's text exactly as written (for ids): empty and the VALUES null are null. */
export function votTextParser(f: VotField): VotParser {
  const nul = f.nullValue?.trim();
  return (s) => {
    const t = s.trim();
    return t === '' || t === nul ? null : t;
  };
}
