import { LIMIT_COLUMN } from './limitMark.ts';

/**
 * How a downloaded table says which values are bounds. The value column keeps the number (so
 * the file stays machine-readable) and the `<quantity>_is_limit` column beside it says it is a
 * bound; these lines, put among a CSV's leading `#` lines, say so in words.
 */
export const BOUNDS_NOTE =
  'Bounds: where a <quantity>_is_limit column is true, that quantity is a bound, not a measurement: an upper limit, ' +
  'except log_edd_ratio where flags holds edd_ratio_lower_limit (a lower limit). Its _p16/_p50/_p84 are then empty. ' +
  'A flux_<line>_is_limit column marks an upper-limit flux and the line luminosity made from it. Filter on these columns before you count or average.';

/** The column that says whether `column` (a derived quantity, or a line's flux or luminosity) is a bound, or null. */
export function boundMarkerOf(column: string): string | null {
  const stem = column.replace(/_p(16|50|84)$/, '');
  if (LIMIT_COLUMN[stem]) return LIMIT_COLUMN[stem]!;
  const m = /^(?:flux|lum|log_lum)_(halpha|hbeta|mgii|civ|oiii)$/.exec(stem);
  return m ? `flux_${m[1]}_is_limit` : null;
}

/**
 * The lines (without '#') a downloaded result needs about bounds: the note when any of its
 * columns can hold a bound, and one warning per such column whose marker column the result
 * lacks (the query left it out), naming the column to add.
 */
export function boundsNoteLines(columns: readonly string[]): string[] {
  const have = new Set(columns);
  const markers = new Map<string, string[]>();
  for (const c of columns) {
    const m = boundMarkerOf(c);
    if (m === null) continue;
    if (!markers.has(m)) markers.set(m, []);
    markers.get(m)!.push(c);
  }
  if (markers.size === 0) return [];
  const lines = [BOUNDS_NOTE];
  for (const [m, cols] of markers) {
    const missing = have.has(m) ? [] : [m];
    // which way a λ_Edd bound points is in the flags
    if (cols.some((c) => c.startsWith('log_edd_ratio')) && !have.has('flags')) missing.push('flags');
    if (missing.length === 0) continue;
    lines.push(`WARNING: ${cols.join(', ')} can hold bounds, but this result lacks ${missing.join(' and ')}: add ${missing.length > 1 ? 'them' : 'it'} to the SELECT to tell bounds from measurements.`);
  }
  return lines;
}
