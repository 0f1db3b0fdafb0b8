import { isLimit, type ChartPoint } from './chartPoint.ts';
import type { LegendItem } from './legend.ts';
import { LEGEND_BAND } from './legend.ts';
import { limitSymbol } from './limitSymbols.ts';
import { PALETTE } from './palette.ts';
import { DEFAULT_SERIES, type SeriesStyle } from './scatterLayers.ts';

/**
 * Legend entries for the points of a scatter chart: one per series present (or the density),
 * upper limits, highlighted objects and new objects, each only when the chart shows it.
 */
export function scatterLegend(points: readonly ChartPoint[], dense: boolean, series?: Record<string, SeriesStyle>): LegendItem[] {
  const items: LegendItem[] = [];
  const pop = points.filter((p) => p.role === 'population');
  if (dense) {
    items.push({ label: 'Catalog objects (darker: more per cell)', symbol: LEGEND_BAND, fill: PALETTE.densityHigh, fillOpacity: 0.7 });
  } else {
    const styles = series ?? { default: DEFAULT_SERIES };
    const names = Object.keys(styles);
    for (const name of names) {
      const s = styles[name]!;
      const present = series ? points.some((p) => !isLimit(p) && (p.series ?? names[0]) === name) : pop.some((p) => !isLimit(p));
      if (present) items.push({ label: s.label, symbol: s.symbol, fill: s.colour, r: 3.5 });
    }
  }
  const firstLimit = pop.find(isLimit);
  if (firstLimit) items.push({ label: 'Upper limit', symbol: limitSymbol(firstLimit.xLimit, firstLimit.yLimit), stroke: dense ? PALETTE.ink : PALETTE.population, strokeWidth: 1.2, r: 4.5 });
  if (points.some((p) => p.role === 'highlight')) items.push({ label: 'Highlighted', symbol: 'circle', fill: PALETTE.highlight, stroke: PALETTE.ink, strokeWidth: 1.4, r: 5 });
  if (points.some((p) => p.role === 'extra')) items.push({ label: 'New object', symbol: 'star', fill: PALETTE.extra, stroke: PALETTE.ink, strokeWidth: 1.2, r: 7 });
  return items;
}
