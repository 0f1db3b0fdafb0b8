/**
 * Turns the static population charts (drawn at build time) into interactive ones: fetches the
 * rows the build drew them from (data/chart-rows.json, a small file: no database) and redraws
 * every chart with the same functions, now with hover, click-through, keyboard and downloads.
 * Large catalogs publish no rows (their charts are binned densities); their static charts
 * only gain the download buttons.
 */
import { mountChart } from '../charts/mountChart.ts';
import { drawPopulation, type ChartRow } from './populationCharts.ts';

interface ChartRowsFile {
  columns: string[] | null;
  rows: unknown[][] | null;
}

/** The chart rows file as chart rows, or null when the build published none. */
export async function fetchChartRows(base: string): Promise<ChartRow[] | null> {
  const res = await fetch(`${base}data/chart-rows.json`);
  if (!res.ok) throw new Error(`the chart data could not be loaded (HTTP ${res.status})`);
  const file = (await res.json()) as ChartRowsFile;
  if (!file.columns || !file.rows) return null;
  const cols = file.columns;
  return file.rows.map((r) => {
    const o: Record<string, unknown> = {};
    for (let c = 0; c < cols.length; c++) o[cols[c]!] = r[c];
    return o as ChartRow;
  });
}

export async function redrawStaticCharts(root: HTMLElement): Promise<void> {
  const base = document.body.dataset.base ?? '/';
  const highlight = root.dataset.highlight;
  const settings = root.dataset.settings ? (JSON.parse(root.dataset.settings) as Record<string, unknown>) : undefined;
  const focused = (document.activeElement as HTMLElement | null)?.closest<HTMLElement>('[data-chart]')?.dataset.chart;
  let rows: ChartRow[] | null = null;
  try {
    rows = await fetchChartRows(base);
  } catch {
    rows = null; // the static charts stay readable as they are
  }
  if (rows) {
    await drawPopulation(root, rows, { base, settings, highlightIds: highlight ? [highlight] : undefined });
  } else {
    for (const mount of root.querySelectorAll<HTMLElement>('[data-chart][data-static]')) {
      const chart = mount.querySelector<HTMLElement>('figure') ?? mount.querySelector<HTMLElement>('svg');
      if (chart) mountChart(mount, chart as HTMLElement, { fileName: `census-${mount.dataset.chart}`, label: mount.dataset.label ?? '', base });
    }
  }
  for (const mount of root.querySelectorAll<HTMLElement>('[data-chart]')) {
    delete mount.dataset.static;
    mount.removeAttribute('tabindex');
  }
  // Keep the keyboard where the reader was: on the redrawn chart.
  if (focused) root.querySelector<SVGElement>(`[data-chart="${focused}"] svg[tabindex]`)?.focus();
}
