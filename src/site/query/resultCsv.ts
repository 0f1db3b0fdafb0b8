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

/** The CSV text of `rs`, rows in the order of `order` (default: as returned). */
export function resultCsv(rs: ResultSet, order?: ArrayLike<number>): string {
  const lines = [rs.names.map(field).join(',')];
  for (let k = 0; k < rs.numRows; k++) {
    const r = order ? order[k]! : k;
    lines.push(rs.columns.map((col) => field(col[r])).join(','));
  }
  return lines.join('\r\n') + '\r\n';
}
