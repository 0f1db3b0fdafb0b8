import { LINES, type ObjectInputs } from '../../core/derive/types.ts';
import { parsePastedCsv } from './csvRow.ts';
import { normalizeOne } from './normalizeOne.ts';
import { implausibleInputs } from './plausibility.ts';

/** What a pasted CSV row gives: the inputs, or messages naming each bad column. */
export interface PastedResult {
  inputs: ObjectInputs | null;
  /** One line each, e.g. 'fwhm_halpha: -1200 km s-1: must be positive'. */
  problems: string[];
  /** Columns that are not canonical inputs and were left out (e.g. field, notes). */
  ignored: string[];
  notes: string[];
}

/**
 * Reads a pasted CSV snippet (header line with canonical column names, then one data row)
 * into inputs. Every `flux_<line>` column and its errors are read in `fluxUnit`; the other
 * columns in their canonical units (km s^-1, erg s^-1, log M_sun, mag). Only the first data row
 * is used.
 */
export function pastedRowToInputs(text: string, fluxUnit: string): PastedResult {
  const csv = parsePastedCsv(text);
  if ('error' in csv) return { inputs: null, problems: [csv.error], ignored: [], notes: [] };
  const units: Record<string, string> = {};
  for (const l of LINES) units[`flux_${l}`] = fluxUnit;
  const res = normalizeOne(csv.header, csv.rows[0]!, units);
  const problems = [...res.problems, ...(res.inputs ? implausibleInputs(res.inputs) : [])].map((p) => (p.column ? `${p.column}: ${p.message}` : p.message));
  const notes = csv.rows.length > 1 ? [`Only the first of the ${csv.rows.length} data rows is placed.`] : [];
  return { inputs: problems.length ? null : res.inputs, problems, ignored: res.ignored, notes };
}
