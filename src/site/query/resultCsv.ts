/**
 * A result as CSV text (RFC 4180): a header of column names, one line per row, fields
 * quoted when they hold a comma, quote or line break, quotes doubled; missing values empty.
 * Numbers keep full precision (the table's rounding is for the eye only). Text cells are made
 * safe for spreadsheets by the shared `csvCell` (formula-like text gets a leading `'`, control
 * characters are escaped), as in the build's rejection report.
 */
import { csvCell } from '../../shared/text/csvCell.ts';
import type { ResultSet } from '../db/resultSet.ts';

function field(v: unknown): string {
  return typeof v === 'number' && !Number.isFinite(v) ? '' : csvCell(v);
}

/** The header line of a CSV with these column names (with its line break). */
export function resultCsvHeader(names: readonly string[]): string {
  return names.map(field).join(',') + '\r\n';
}

/** The lines of `rs`'s rows, in the order of `order` (default: as returned), each with its line break. */
export function resultCsvLines(rs: ResultSet, order?: ArrayLike<number>): string {
  let out = '';
  for (let k = 0; k < rs.numRows; k++) {
    const r = order ? order[k]! : k;
    out += rs.columns.map((col) => field(col[r])).join(',') + '\r\n';
  }
  return out;
}

/** The CSV text of `rs`, rows in the order of `order` (default: as returned). */
export function resultCsv(rs: ResultSet, order?: ArrayLike<number>): string {
  return resultCsvHeader(rs.names) + resultCsvLines(rs, order);
}
