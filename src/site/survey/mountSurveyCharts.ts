/**
 * Browser: draws the population page's charts from the data the build wrote on `root` (`data-survey-charts`), one
 * per mount (`data-survey-chart`), each with the usual downloads and, on the relation chart, click-through to the
 * objects. No database is needed: the page draws even where DuckDB-WASM cannot start.
 */
import { mountChart } from '../charts/mountChart.ts';
import { PUBLISHED_DENSITIES } from '../../core/population/publishedDensities.ts';
import { relationBehindSelection } from '../charts/relationBehindSelection.ts';
import { spaceDensityByRedshift } from '../charts/spaceDensityByRedshift.ts';
import { spaceDensityFunction } from '../charts/spaceDensityFunction.ts';
import { parseSurveyChartData, type SurveyChartData } from './surveyChartData.ts';

type Draw = (d: SurveyChartData, width: number) => SVGSVGElement | HTMLElement;

const CHARTS: Record<string, Draw> = {
  relation: (d, width) => relationBehindSelection(d.points, { band: d.band, naive: d.naive, pivotLogMstar: d.pivotLogMstar, localRelation: d.localRelation, width }),
  'mbh-function': (d, width) => spaceDensityFunction(d.mbhFunction, { quantity: 'log_mbh', width }),
  'lbol-function': (d, width) => spaceDensityFunction(d.lbolFunction, { quantity: 'log_lbol', width }),
  totals: (d, width) => spaceDensityByRedshift(d.totals, { published: PUBLISHED_DENSITIES, width }),
};

/** Draws every chart under `root`; a chart that fails says so in its mount and the others still draw. */
export function mountSurveyCharts(root: HTMLElement): void {
  const base = document.body.dataset.base ?? '/';
  let data: SurveyChartData;
  try {
    data = parseSurveyChartData(root.dataset.surveyCharts);
  } catch (err) {
    for (const m of root.querySelectorAll<HTMLElement>('[data-survey-chart]')) m.textContent = `The chart could not be drawn: ${(err as Error).message}`;
    return;
  }
  for (const mount of root.querySelectorAll<HTMLElement>('[data-survey-chart]')) {
    const key = mount.dataset.surveyChart ?? '';
    const draw = CHARTS[key];
    if (!draw) continue;
    try {
      // the chart's own width follows its column (the page is one column on a phone)
      const width = Math.max(320, Math.min(760, Math.floor(mount.clientWidth || 640)));
      const chart = draw(data, width);
      mount.replaceChildren();
      mountChart(mount, chart, { fileName: `census-${key}`, label: mount.dataset.label ?? key, base });
    } catch (err) {
      const p = document.createElement('p');
      p.className = 'chart-note';
      p.textContent = `The chart could not be drawn: ${err instanceof Error ? err.message : String(err)}`;
      mount.replaceChildren(p);
    }
  }
}
