import { escapeControls } from './escapeControls.ts';

/**
 * First characters that make a spreadsheet read a cell as a formula: = + - @, tab and carriage
 * return (OWASP "CSV injection"), the minus sign U+2212 and the full-width ＝ ＋ － ＠, which
 * some spreadsheets also accept.
 */
const FORMULA_START = /^[=+\-@\t\r\u2212\uff1d\uff0b\uff0d\uff20]/u;

/** A plain decimal number ("-3", "+1.5e42"): a spreadsheet reads it as a number, never a formula. */
const PLAIN_NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/**
 * One CSV cell for a file people may open in a spreadsheet (RFC 4180 quoting, made safe):
 * - null and undefined are the empty cell; numbers, bigints and booleans are written as
 *   `String(value)`, unchanged;
 * - text that starts like a formula (= + - @ − tab, carriage return) and is not a plain number
 *   gets a leading `'`, so `=HYPERLINK(…)` is shown, not run (the `'` is the usual sign of
 *   "text as typed");
 * - control characters other than tab and line breaks are shown as escapes (`\x1B`);
 * - the cell is quoted when it holds a comma, quote, line break or leading or trailing blank,
 *   with quotes doubled.
 * Values in the Parquet catalog are never changed; only CSV exports go through this.
 */
export function csvCell(value: unknown): string {
  if (value === null || value === undefined) return '';
  if (typeof value !== 'string') return quoteIfNeeded(String(value));
  let text = escapeControls(value, '\t\n\r');
  if (FORMULA_START.test(text) && !PLAIN_NUMBER.test(text)) text = `'${text}`;
  return quoteIfNeeded(text);
}

function quoteIfNeeded(text: string): string {
  return /[",\r\n]|^\s|\s$/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}
