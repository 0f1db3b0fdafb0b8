/**
 * Which population charts the pages draw, which catalog columns they need, and how they are
 * mounted. The chart functions themselves belong to src/site/charts/ (pure
 * `(rows, options) => SVG`); this module decides what rows to give them.
 *
 */
import {
  chartSettings,
  eddingtonRatioDistribution,
  fwhmVsLineLuminosity,
  lbolVsMass,
  massVsRedshift,
  massVsStellarMass,
  type CatalogRow,
  type ChartOptions,
  type ChartSettings,
} from '../charts/index.ts';
import type { ResultSet } from '../db/resultSet.ts';
import { mountChart } from '../charts/mountChart.ts';
import { objectHrefHere } from '../objectLink.ts';

/** Columns the population charts read, when the catalog has them. */
export const CHART_COLUMNS = [
  'id', 'z', 'log_mstar', 'log_mstar_err', 'log_mbh', 'log_mbh_p16', 'log_mbh_p84', 'log_lbol', 'log_lbol_p16', 'log_lbol_p84',
  'log_edd_ratio', 'log_edd_ratio_p16', 'log_edd_ratio_p84', 'fwhm_halpha', 'fwhm_halpha_err', 'log_lum_halpha', 'fwhm_hbeta',
  'fwhm_hbeta_err', 'log_lum_hbeta', 'flux_halpha_is_limit', 'flags',
] as const;

/**
 * Above this many objects the landing and object pages fetch each chart's columns separately
 * and without error-bar columns: the charts draw such populations as densities (their own
 * threshold is 5,000 placed points), where no bars are drawn.
 */
export const NARROW_ABOVE = 20_000;

/**
 * Every population chart is drawn 640 px wide (and scaled down by CSS on narrow screens), in
 * the browser and at build time alike, so the redrawn chart replaces the static one exactly.
 */
export const CHART_WIDTH = 640;
export const CHART_HEIGHT = Math.round(CHART_WIDTH * 0.66);

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

type ChartFn = (rows: readonly CatalogRow[], options: ChartOptions & { settings: ChartSettings }) => SVGSVGElement | HTMLElement;

/** The chart drawn in each mount, by its `data-chart` key. */
export const CHART_FUNCTIONS: Record<string, ChartFn> = {
  'mbh-mstar': (rows, o) => massVsStellarMass(rows, o),
  'mbh-z': (rows, o) => massVsRedshift(rows, o),
  'lbol-mbh': (rows, o) => lbolVsMass(rows, o),
  'fwhm-lum': (rows, o) => fwhmVsLineLuminosity(rows, o),
  'edd-hist': (rows, o) => eddingtonRatioDistribution(rows, o),
};

/**
 * The columns each chart reads when drawn as a density (no error bars): large catalogs fetch
 * them chart by chart, so the first chart waits only for its own columns.
 */
export const DENSE_COLUMNS_BY_CHART: Record<string, readonly string[]> = {
  'mbh-mstar': ['id', 'log_mstar', 'log_mbh', 'flags'],
  'mbh-z': ['id', 'z', 'log_mbh', 'flags'],
  'lbol-mbh': ['id', 'log_mbh', 'log_lbol', 'flags'],
  'edd-hist': ['id', 'log_edd_ratio', 'flags'],
  'fwhm-lum': ['id', 'fwhm_halpha', 'log_lum_halpha', 'fwhm_hbeta', 'log_lum_hbeta', 'flux_halpha_is_limit', 'flags'],
};

/** Lets the browser paint what was drawn before the next chart (a frame, then a task). */
export function nextPaint(): Promise<void> {
  return new Promise((resolve) => requestAnimationFrame(() => setTimeout(resolve, 0)));
}

/** Draws the chart of one `[data-chart]` mount from `rows`. */
export function drawChart(mount: HTMLElement, rows: readonly ChartRow[], options: DrawOptions): void {
  const fn = CHART_FUNCTIONS[mount.dataset.chart ?? ''];
  if (!fn) return;
  const settings = chartSettings(options.settings);
  let el: SVGSVGElement | HTMLElement;
  try {
    el = fn(rows as readonly CatalogRow[], { settings, highlightIds: options.highlightIds, width: CHART_WIDTH, height: CHART_HEIGHT });
  } catch (err) {
    const p = document.createElement('p');
    p.className = 'chart-note';
    p.textContent = `This chart could not be drawn: ${err instanceof Error ? err.message : String(err)}`;
    mount.replaceChildren(p);
    return;
  }
  const key = mount.dataset.chart ?? 'chart';
  mountChart(mount, el, { fileName: `census-${key}`, label: mount.dataset.label ?? key, base: options.base, onOpen: (id) => location.assign(objectHrefHere(id)) });
  mount.dataset.drawn = String(rows.length);
  performance.mark(`census:chart:${key}`);
}

/**
 * Draws every `[data-chart]` mount inside `root` from `rows`, one chart per animation frame
 * so the first appears as soon as it is ready.
 */
export async function drawPopulation(root: HTMLElement, rows: readonly ChartRow[], options: DrawOptions): Promise<void> {
  for (const mount of root.querySelectorAll<HTMLElement>('[data-chart]')) {
    await nextPaint();
    drawChart(mount, rows, options);
  }
}
