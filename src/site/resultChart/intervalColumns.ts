/**
 * Error bars of a plotted column, read from the result's own columns: `<stem>_p16` and
 * `<stem>_p84` (the catalog's 16th and 84th Monte Carlo percentiles) for a column `<stem>` or
 * `<stem>_p50`. Nothing is guessed from other names.
 */

/** The stem a column's percentiles are named after: `log_mbh_p50` → `log_mbh`. */
export function percentileStem(column: string): string {
  return column.replace(/_p50$/, '');
}

/** The result's 16th/84th percentile columns for `column`, or null when it lacks either. */
export function intervalColumns(column: string, names: readonly string[]): { lo: string; hi: string } | null {
  const stem = percentileStem(column);
  const lo = `${stem}_p16`;
  const hi = `${stem}_p84`;
  if (column === lo || column === hi) return null;
  return names.includes(lo) && names.includes(hi) ? { lo, hi } : null;
}
