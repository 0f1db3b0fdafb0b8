import type { Cell } from '../readers/types.ts';

/** Outcome of reading one cell. */
export const CELL_OK = 0;
export const CELL_EMPTY = 1;
export const CELL_NOT_A_NUMBER = 2;
export const CELL_NOT_FINITE = 3;
export const CELL_NOT_BOOLEAN = 4;

/** Reusable result of {@link readNumber} / {@link readBool}, so the hot loop allocates nothing per cell. */
export interface CellResult {
  status: number;
  num: number;
  bool: boolean;
}

/** A fresh result holder. */
export function cellResult(): CellResult {
  return { status: CELL_OK, num: NaN, bool: false };
}

/**
 * Reads a numeric cell into `out`: null, blank text, NaN and its spellings (`nan`, `NaN`) are
 * empty, i.e. missing; numbers and decimal text (`12`, ` -3.5e4 `) are numbers; ±Infinity and
 * its spellings (`inf`, `-Infinity`) are not finite; anything else (including hex such as
 * `0x1F`) is not a number.
 *
 * NaN is missing because every format writes missing values its own way and astropy turns a
 * masked float into NaN when a format has no mask (FITS, VOTable BINARY) but into an empty cell
 * or `nan` text in CSV and ECSV: one catalog must mean the same thing in each.
 */
export function readNumber(cell: Cell, out: CellResult): void {
  if (cell === null) {
    out.status = CELL_EMPTY;
    return;
  }
  if (typeof cell === 'number') {
    out.num = cell;
    out.status = Number.isFinite(cell) ? CELL_OK : Number.isNaN(cell) ? CELL_EMPTY : CELL_NOT_FINITE;
    return;
  }
  if (typeof cell !== 'string') {
    out.status = CELL_NOT_A_NUMBER;
    return;
  }
  const t = cell.trim();
  if (t.length === 0) {
    out.status = CELL_EMPTY;
    return;
  }
  const n = Number(t);
  out.num = n;
  if (Number.isFinite(n)) {
    // Number() also reads 0x.., 0o.., 0b..: a catalog means none of them.
    const c1 = t.length > 1 && t.charCodeAt(0) === 48 ? t.charCodeAt(1) | 0x20 : 0;
    out.status = c1 === 0x78 || c1 === 0x6f || c1 === 0x62 ? CELL_NOT_A_NUMBER : CELL_OK;
    return;
  }
  if (n === Infinity || n === -Infinity) {
    out.status = CELL_NOT_FINITE;
    return;
  }
  out.status = nonFiniteWordStatus(t);
}

/** CELL_EMPTY for a NaN spelling, CELL_NOT_FINITE for an infinity spelling, else CELL_NOT_A_NUMBER. */
function nonFiniteWordStatus(t: string): number {
  if (t.length > 9) return CELL_NOT_A_NUMBER;
  const s = t.toLowerCase();
  const u = s.charCodeAt(0) === 43 || s.charCodeAt(0) === 45 ? s.slice(1) : s;
  if (u === 'nan') return CELL_EMPTY;
  return u === 'inf' || u === 'infinity' ? CELL_NOT_FINITE : CELL_NOT_A_NUMBER;
}

/**
 * Reads a flag cell into `out`: booleans; numbers 1 and 0; text true/false, t/f, yes/no, 1/0
 * in any case; null or blank is empty; anything else is not a boolean.
 */
export function readBool(cell: Cell, out: CellResult): void {
  if (cell === null) {
    out.status = CELL_EMPTY;
    return;
  }
  if (typeof cell === 'boolean') {
    out.bool = cell;
    out.status = CELL_OK;
    return;
  }
  if (typeof cell === 'number') {
    out.bool = cell === 1;
    out.status = cell === 1 || cell === 0 ? CELL_OK : CELL_NOT_BOOLEAN;
    return;
  }
  const t = cell.trim();
  if (t.length === 0) {
    out.status = CELL_EMPTY;
    return;
  }
  out.status = CELL_OK;
  switch (t.length <= 5 ? t.toLowerCase() : '') {
    case 'true': case 't': case 'yes': case '1':
      out.bool = true;
      return;
    case 'false': case 'f': case 'no': case '0':
      out.bool = false;
      return;
    default:
      out.status = CELL_NOT_BOOLEAN;
  }
}

/** Longest value or id quoted in a row message; longer ones are cut with '...'. */
export const MAX_SHOWN_CHARS = 40;

/** A cell as given in the file, for messages: text as written (cut to MAX_SHOWN_CHARS), numbers in JavaScript's shortest form. */
export function showCell(cell: Cell): string {
  if (cell === null) return '';
  const s = typeof cell === 'string' ? cell.trim() : String(cell);
  return shorten(s);
}

/** `s` cut to MAX_SHOWN_CHARS characters with '...' when longer. */
export function shorten(s: string): string {
  return s.length > MAX_SHOWN_CHARS ? `${s.slice(0, MAX_SHOWN_CHARS - 3)}...` : s;
}
