import { LINES, type ObjectInputs } from '../../core/derive/types.ts';
import { mapHeader, type MappedColumn } from './columnMap.ts';
import { parsePastedCsv } from './csvRow.ts';
import { normalizeRows } from './normalizeOne.ts';
import { implausibleInputs } from './plausibility.ts';

/**
 * Most data rows placed from one paste: each is derived with the catalog's Monte Carlo draws
 * (and again under every reading) in the page, so a bound keeps the tab responsive.
 */
export const MAX_PASTED_ROWS = 200;

/** One pasted data row: its inputs, or one message per problem naming the row, the column and the reason. */
export interface PastedRow {
  /** 1-based data-row number (comment and blank lines not counted). */
  row: number;
  /** The row's id as pasted ('' when empty). */
  id: string;
  inputs: ObjectInputs | null;
  /** One line each, e.g. 'row 2 (id X-1): fwhm_halpha: -1200 km s-1: must be positive'. */
  problems: string[];
}

/** What a pasted CSV snippet gives. */
export interface PastedResult {
  /** Every data row, in order (empty when the paste as a whole cannot be read). */
  rows: PastedRow[];
  /** Problems of the paste as a whole (no header, no id column, a unit that cannot be read). */
  problems: string[];
  /** Columns that are not canonical inputs and were left out (e.g. field, notes). */
  ignored: string[];
  notes: string[];
}

/**
 * Reads a pasted CSV snippet (a header line, then one or more data rows) into one object per
 * row. Header names are read through the catalog's column map first (its source column names,
 * in the units the catalog read them in), then as canonical names (in canonical units: km s^-1,
 * erg s^-1, log M_sun, mag). When `fluxUnit` is given, every `flux_<line>` column and its
 * errors are read in it instead. A row with a problem is reported on its own; the other rows
 * are still read.
 * @param text - the pasted text.
 * @param fluxUnit - unit of every line flux, or undefined/'' to follow the column map.
 * @param map - the catalog's column map (src/site/place/columnMap.ts).
 */
export function pastedRows(text: string, fluxUnit: string | undefined, map: readonly MappedColumn[] = []): PastedResult {
  const csv = parsePastedCsv(text);
  if ('error' in csv) return { rows: [], problems: [csv.error], ignored: [], notes: [] };
  const header = mapHeader(csv.header, map);
  const units: Record<string, string> = { ...header.units };
  if (fluxUnit) {
    for (const l of LINES) {
      units[`flux_${l}`] = fluxUnit;
      // errors follow their value's unit
      for (const e of ['_err', '_err_lo', '_err_hi']) delete units[`flux_${l}${e}`];
    }
  }
  const named = (column: string) => (header.pastedAs[column] ? `${header.pastedAs[column]} (${column})` : column);
  if (header.problems.length) return { rows: [], problems: header.problems, ignored: [], notes: [] };
  const notes: string[] = [];
  let data = csv.rows;
  if (data.length > MAX_PASTED_ROWS) {
    notes.push(`${data.length} data rows were pasted; the first ${MAX_PASTED_ROWS} are placed. Paste the rest separately.`);
    data = data.slice(0, MAX_PASTED_ROWS);
  }
  const res = normalizeRows(header.names, data, units);
  if (!res.rows) {
    return { rows: [], problems: res.problems.map((p) => (p.column ? `${named(p.column)}: ${p.message}` : p.message)), ignored: res.ignored, notes };
  }
  const rows = res.rows.map((r): PastedRow => {
    const where = `row ${r.row}${r.id === '' ? ' (no id)' : ` (id ${r.id})`}`;
    const all = [...r.problems, ...(r.inputs ? implausibleInputs(r.inputs) : [])];
    return { row: r.row, id: r.id, inputs: all.length ? null : r.inputs, problems: all.map((p) => `${where}: ${p.column ? `${named(p.column)}: ` : ''}${p.message}`) };
  });
  return { rows, problems: [], ignored: res.ignored, notes };
}
