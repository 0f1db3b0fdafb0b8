/** Quotes `text` as a SQL string literal ('…' with embedded quotes doubled). */
export function sqlString(text: string): string {
  return `'${text.replaceAll("'", "''")}'`;
}

/** Quotes `name` as a SQL identifier ("…" with embedded quotes doubled), so any column name is safe. */
export function sqlIdentifier(name: string): string {
  return `"${name.replaceAll('"', '""')}"`;
}
