/**
 * The build's population charts, drawn once per build from the catalog (src/site/build/staticCharts.ts):
 * the landing page writes them into its HTML, the object pages mark their object over the
 * shared chart files (`charts/<key>.svg`), and `data/chart-rows.json` carries the rows the
 * browser redraws them from when a reader hovers (small catalogs only).
 */
import { NARROW_ABOVE } from '../population/populationCharts.ts';
import { loadCatalog } from './loadCatalog.ts';
import { deriveSettingsOf } from './siteMeta.ts';
import { chartRowsOf, sharedChart, type SharedChart } from './staticCharts.ts';

/** The population charts, in page order. */
export const POPULATION_CHARTS = [
  { key: 'mbh-mstar', title: 'Black-hole mass and host stellar mass' },
  { key: 'mbh-z', title: 'Black-hole mass and redshift' },
  { key: 'lbol-mbh', title: 'Bolometric luminosity and black-hole mass' },
  { key: 'edd-hist', title: 'Eddington ratios' },
] as const;

/** Path of a shared chart file, relative to the site's base. */
export const chartFilePath = (key: string) => `charts/${key}.svg`;

let shared: Promise<Map<string, SharedChart>> | null = null;

/** Every population chart drawn from the whole catalog, once per build. */
export function buildCharts(): Promise<Map<string, SharedChart>> {
  shared ??= (async () => {
    const { rows, meta } = await loadCatalog();
    const chartRows = chartRowsOf(rows);
    const settings = deriveSettingsOf(meta);
    return new Map(POPULATION_CHARTS.map((c) => [c.key, sharedChart(c.key, chartRows, settings)]));
  })();
  return shared;
}

/**
 * The rows the browser redraws the charts from, column by column (`null` above NARROW_ABOVE
 * objects: large catalogs keep their static density charts).
 */
export async function chartRowsJson(): Promise<string> {
  const { rows } = await loadCatalog();
  if (rows.length > NARROW_ABOVE) return JSON.stringify({ columns: null, rows: null });
  const chartRows = chartRowsOf(rows);
  const columns = [...new Set(chartRows.flatMap((r) => Object.keys(r)))];
  return JSON.stringify({ columns, rows: chartRows.map((r) => columns.map((c) => r[c] ?? null)) });
}
