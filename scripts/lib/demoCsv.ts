/**
 * Writes demo rows as CSV (RFC 4180 quoting: a field with a comma, a double quote or a line
 * break is wrapped in double quotes, inner quotes doubled), with optional `#` comment lines
 * on top. Empty cells for null; booleans as `true`/`false`; numbers in JavaScript's shortest
 * round-trip form (e.g. `12.34`, `3.456e+43`).
 */
import { DEMO_COLUMNS, type DemoRow } from './demoRow.ts';

/** Options of {@link toCsv}. */
export interface CsvOptions {
  /** Lines written first, each prefixed with `# `. */
  comments?: readonly string[];
}

/** One CSV cell. */
export function csvField(value: string | number | boolean | null): string {
  if (value === null) return '';
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new Error(`toCsv: non-finite number ${value}`);
    return String(value);
  }
  const s = String(value);
  return /[",\r\n]/.test(s) || s.startsWith('#') ? `"${s.replaceAll('"', '""')}"` : s;
}

/** The header and one line per row, each ending with `\n`. */
export function* csvLines(rows: Iterable<DemoRow>, opts: CsvOptions = {}): Generator<string> {
  for (const c of opts.comments ?? []) yield `# ${c}\n`;
  yield `${DEMO_COLUMNS.join(',')}\n`;
  for (const row of rows) yield `${DEMO_COLUMNS.map((c) => csvField(row[c])).join(',')}\n`;
}

/**
 * The whole CSV text of `rows`.
 * @param rows demo rows
 * @param opts comment lines to put on top
 */
export function toCsv(rows: Iterable<DemoRow>, opts: CsvOptions = {}): string {
  let out = '';
  for (const line of csvLines(rows, opts)) out += line;
  return out;
}
