/** A SQL identifier, double-quoted (quotes doubled), safe for any column name. */
export function sqlIdent(name: string): string {
  return `"${name.replace(/"/g, '""')}"`;
}

/** A SQL string literal, single-quoted (quotes doubled). */
export function sqlString(text: string): string {
  return `'${text.replace(/'/g, "''")}'`;
}
