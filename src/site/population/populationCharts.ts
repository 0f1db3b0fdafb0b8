/**
 * Which population charts the pages draw, which catalog columns they need, and how they are
 * mounted. The chart functions themselves belong to src/site/charts/ (pure
 * `(rows, options) => SVG`); this module decides what rows to give them.
 *
 * MOUNT POINT: until src/site/charts/index.ts exports the chart functions, `drawPopulation`
 * shows a note in each mount instead of a chart.
 */
import type { ResultSet } from '../db/resultSet.ts';

/** Columns the population charts read, when the catalog has them. */
export const CHART_COLUMNS = [
  'id', 'z', 'log_mstar', 'log_mstar_err', 'log_mbh', 'log_mbh_p16', 'log_mbh_p84', 'log_lbol', 'log_lbol_p16', 'log_lbol_p84',
  'log_edd_ratio', 'log_edd_ratio_p16', 'log_edd_ratio_p84', 'fwhm_halpha', 'fwhm_halpha_err', 'log_lum_halpha', 'fwhm_hbeta',
  'fwhm_hbeta_err', 'log_lum_hbeta', 'flux_halpha_is_limit', 'flags',
] as const;

/** Options of one drawing of the population. */
export interface DrawOptions {
  /** Ids drawn on top and emphasised (the object page's object). */
  highlightIds?: readonly string[];
  /** The catalog's settings (for reference curves), as recorded in its metadata. */
  settings?: Record<string, unknown>;
  /** The site's base path, for links to object pages. */
  base: string;
}

export type ChartRow = Record<string, unknown> & { id: string };

/** The rows of a result as chart rows (only rows with an id). */
export function chartRows(rs: ResultSet): ChartRow[] {
  const idIdx = rs.names.indexOf('id');
  if (idIdx < 0) return [];
  const out: ChartRow[] = [];
  for (let r = 0; r < rs.numRows; r++) {
    const id = rs.columns[idIdx]![r];
    if (id === null || id === undefined) continue;
    const row: ChartRow = { id: String(id) };
    for (let c = 0; c < rs.names.length; c++) if (c !== idIdx) row[rs.names[c]!] = rs.columns[c]![r];
    out.push(row);
  }
  return out;
}

/** Draws every `[data-chart]` mount inside `root` from `rows`. */
export function drawPopulation(root: HTMLElement, rows: readonly ChartRow[], options: DrawOptions): void {
  for (const mount of root.querySelectorAll<HTMLElement>('[data-chart]')) {
    const note = document.createElement('p');
    note.className = 'chart-note';
    note.textContent = `Chart “${mount.dataset.chart}” of ${rows.length} objects: the chart module is not wired yet.`;
    mount.replaceChildren(note);
    mount.dataset.drawn = String(rows.length);
  }
  void options;
}
