/**
 * A query result held column by column (plain JS values: numbers, strings, booleans, null),
 * so a million-row result costs one array per column and the table renders a page at a time.
 */
export interface ResultSet {
  /** Column names, in order. */
  names: string[];
  /** DuckDB/Arrow type names, e.g. 'Float64', 'Utf8', 'Bool'. */
  types: string[];
  /** columns[c][r]: value of column c in row r. */
  columns: unknown[][];
  numRows: number;
}

/** Rows `from`..`to` (exclusive) as objects keyed by column name (all rows by default). */
export function rowObjects(rs: ResultSet, from = 0, to = rs.numRows): Record<string, unknown>[] {
  const out: Record<string, unknown>[] = [];
  const end = Math.min(to, rs.numRows);
  for (let r = Math.max(0, from); r < end; r++) {
    const o: Record<string, unknown> = {};
    for (let c = 0; c < rs.names.length; c++) o[rs.names[c]!] = rs.columns[c]![r];
    out.push(o);
  }
  return out;
}

/** Index of column `name` (exact, then case-insensitive), or -1. */
export function columnIndex(rs: ResultSet, name: string): number {
  const i = rs.names.indexOf(name);
  return i >= 0 ? i : rs.names.findIndex((n) => n.toLowerCase() === name.toLowerCase());
}
