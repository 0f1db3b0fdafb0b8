/**
 * Recognising and converting the text of one cell (CSV, TSV, ECSV and VOTable share these rules).
 */
import type { Cell } from './types.ts';

const INT_RE = /^[+-]?\d+$/;
const FLOAT_RE = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const SPECIAL_RE = /^[+-]?(?:nan|inf|infinity)$/i;
const TRUE_RE = /^true$/i;
const FALSE_RE = /^false$/i;

/** True for a decimal integer literal such as `-42` (no exponent, no point). */
export function isIntegerText(s: string): boolean {
  return INT_RE.test(s);
}

/** True for a decimal number, or NaN / inf / infinity in any case with an optional sign. */
export function isNumberText(s: string): boolean {
  return FLOAT_RE.test(s) || SPECIAL_RE.test(s);
}

/** True for `true` or `false` in any case. */
export function isBoolText(s: string): boolean {
  return TRUE_RE.test(s) || FALSE_RE.test(s);
}

/**
 * Parses text already known to satisfy {@link isNumberText}; NaN/inf spellings that JavaScript's
 * `Number()` does not accept (`nan`, `inf`, `-inf`) are mapped explicitly.
 */
export function parseNumberText(s: string): number {
  const x = Number(s);
  if (!Number.isNaN(x)) return x;
  const t = s.toLowerCase();
  if (t.endsWith('nan')) return NaN;
  return t.startsWith('-') ? -Infinity : Infinity;
}

/** Parses `true`/`false` (any case); anything else is `null`. */
export function parseBoolText(s: string): boolean | null {
  if (TRUE_RE.test(s)) return true;
  if (FALSE_RE.test(s)) return false;
  return null;
}

/** A cell as text: numbers in JavaScript's shortest round-trip form, booleans as `true`/`false`. */
export function cellAsText(cell: Cell): Cell {
  return cell === null || typeof cell === 'string' ? cell : String(cell);
}

/** True for number text with a leading zero before another digit (`007`, `-00.5`): its spelling carries meaning a number would lose. */
export function hasLeadingZero(s: string): boolean {
  // Character tests rather than a regular expression: this runs on every cell of the first pass.
  const c0 = s.charCodeAt(0);
  const i = c0 === 43 || c0 === 45 ? 1 : 0;
  if (s.charCodeAt(i) !== 48) return false;
  const c = s.charCodeAt(i + 1);
  return c >= 48 && c <= 57;
}
