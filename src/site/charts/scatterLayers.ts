import { formatFixed } from '../text/formatValue.ts';
import * as Plot from '@observablehq/plot';
import { binGrid } from './binGrid.ts';
import { isLimit, type ChartPoint, type PointRole } from './chartPoint.ts';
import { limitSymbol } from './limitSymbols.ts';
import { PALETTE } from './palette.ts';
import { tag } from './markTag.ts';

/** How one series of points is drawn. */
export interface SeriesStyle {
  /** Plot symbol name for detections. */
  symbol: 'circle' | 'triangle' | 'square' | 'diamond';
  colour: string;
  label: string;
}

/** Options of {@link scatterLayers}. */
export interface ScatterLayerOptions {
  xDomain: [number, number];
  yDomain: [number, number];
  /** Above this many population points, draw a density grid. */
  densityThreshold: number;
  xLabel: string;
  yLabel: string;
  /** Styles of the series named in `ChartPoint.series`; points without a series use the first. */
  series?: Record<string, SeriesStyle>;
  /** Formats an axis value for the hover text (default 2 decimals). */
  formatX?: (v: number) => string;
  formatY?: (v: number) => string;
}

/** What the layers need from the plot: marks, and the colour scale of the density (when drawn). */
export interface ScatterLayers {
  marks: Plot.Markish[];
  /** The hover layer (tip over every point); draw it last. */
  hover: Plot.Markish;
  /** Colour scale options for the density grid, or undefined when points are drawn one by one. */
  color?: Plot.ScaleOptions;
  /** True when the population was drawn as a density. */
  dense: boolean;
}

export const DEFAULT_SERIES: SeriesStyle = { symbol: 'circle', colour: PALETTE.population, label: 'Catalog object' };

/** Number of density cells across and up; bounds the marks drawn for a large selection. */
export const DENSITY_BINS: readonly [number, number] = [56, 36];

const ROLE_STYLE: Record<PointRole, { bar: string; barWidth: number; limitWidth: number; label: string }> = {
  population: { bar: PALETTE.population, barWidth: 0.8, limitWidth: 1.2, label: 'catalog' },
  highlight: { bar: PALETTE.ink, barWidth: 1.6, limitWidth: 2, label: 'highlighted' },
  extra: { bar: PALETTE.extra, barWidth: 1.8, limitWidth: 2, label: 'new object' },
};

const fmt2 = (v: number): string => formatFixed(v, 2);

function errorBars(points: readonly ChartPoint[], role: PointRole): Plot.Markish[] {
  const s = ROLE_STYLE[role];
  const xBars = points.filter((p) => !p.xLimit && p.xLo !== null && p.xHi !== null);
  const yBars = points.filter((p) => !p.yLimit && p.yLo !== null && p.yHi !== null);
  const common = { stroke: s.bar, strokeWidth: s.barWidth, strokeOpacity: role === 'population' ? 0.45 : 0.9, clip: true };
  return [
    xBars.length ? Plot.ruleY(xBars, { y: 'y', x1: 'xLo', x2: 'xHi', ...common, ...tag(`${s.label} error bar x`) }) : null,
    yBars.length ? Plot.ruleX(yBars, { x: 'x', y1: 'yLo', y2: 'yHi', ...common, ...tag(`${s.label} error bar y`) }) : null,
  ];
}

function limitMarks(points: readonly ChartPoint[], role: PointRole, colour: string, r: number): Plot.Markish[] {
  const s = ROLE_STYLE[role];
  const label = role === 'population' ? 'upper limit' : `${s.label} upper limit`;
  const groups: [boolean, boolean][] = [
    [false, true],
    [true, false],
    [true, true],
  ];
  return groups.map(([xl, yl]) => {
    const pts = points.filter((p) => p.xLimit === xl && p.yLimit === yl);
    if (!pts.length) return null;
    return Plot.dot(pts, { x: 'x', y: 'y', symbol: limitSymbol(xl, yl), r, stroke: colour, strokeWidth: s.limitWidth, fill: 'none', ariaLabel: (p: ChartPoint) => p.id, ...tag(label) });
  });
}

function detectionMarks(points: readonly ChartPoint[], role: PointRole, opts: ScatterLayerOptions): Plot.Markish[] {
  const series = opts.series ?? { default: DEFAULT_SERIES };
  const names = Object.keys(series);
  const seriesOf = (p: ChartPoint): string => (p.series !== undefined && p.series in series ? p.series : names[0]!);
  return names.map((name) => {
    const style = series[name]!;
    const pts = points.filter((p) => seriesOf(p) === name);
    if (!pts.length) return null;
    if (role === 'population') {
      return Plot.dot(pts, { x: 'x', y: 'y', r: 3.2, symbol: style.symbol, fill: style.colour, fillOpacity: 0.8, stroke: 'white', strokeWidth: 0.6, ariaLabel: (p: ChartPoint) => p.id, ...tag('catalog point') });
    }
    if (role === 'highlight') {
      return Plot.dot(pts, { x: 'x', y: 'y', r: 5.5, symbol: style.symbol, fill: PALETTE.highlight, stroke: PALETTE.ink, strokeWidth: 1.4, ariaLabel: (p: ChartPoint) => p.id, ...tag('highlighted object') });
    }
    return Plot.dot(pts, { x: 'x', y: 'y', r: 8, symbol: 'star', fill: PALETTE.extra, stroke: PALETTE.ink, strokeWidth: 1.2, ariaLabel: (p: ChartPoint) => p.id, ...tag('new object') });
  });
}

function densityMarks(points: readonly ChartPoint[], opts: ScatterLayerOptions): Plot.Markish[] {
  const [nx, ny] = DENSITY_BINS;
  const detections = binGrid(points.filter((p) => !isLimit(p)), opts.xDomain, opts.yDomain, nx, ny);
  // limits are binned on a grid four times coarser and drawn as one limit symbol per occupied cell
  const marks: Plot.Markish[] = [
    Plot.rect(detections, { x1: 'x1', x2: 'x2', y1: 'y1', y2: 'y2', fill: 'count', inset: 0, ...tag('density'), title: (c: { count: number }) => `${c.count} objects` }),
  ];
  for (const [xl, yl] of [
    [false, true],
    [true, false],
    [true, true],
  ] as const) {
    const cells = binGrid(
      points.filter((p) => p.xLimit === xl && p.yLimit === yl),
      opts.xDomain,
      opts.yDomain,
      Math.round(nx / 4),
      Math.round(ny / 4),
    ).map((c) => ({ x: (c.x1 + c.x2) / 2, y: (c.y1 + c.y2) / 2, count: c.count }));
    if (cells.length) {
      // a white halo keeps the limit symbols readable on dark cells
      marks.push(
        Plot.dot(cells, { x: 'x', y: 'y', symbol: limitSymbol(xl, yl), r: 4.5, stroke: 'white', strokeWidth: 3, fill: 'none' }),
        Plot.dot(cells, { x: 'x', y: 'y', symbol: limitSymbol(xl, yl), r: 4.5, stroke: PALETTE.ink, strokeWidth: 1.2, fill: 'none', ...tag('upper limit (binned)') }),
      );
    }
  }
  return marks;
}

/** Hover text of a point: its id, whether it is new, and its coordinates (with "<" for limits). */
export function hoverText(p: ChartPoint, opts: Pick<ScatterLayerOptions, 'xLabel' | 'yLabel' | 'formatX' | 'formatY'>): string {
  const fx = opts.formatX ?? fmt2;
  const fy = opts.formatY ?? fmt2;
  const head = p.role === 'extra' ? `${p.id} (new object)` : p.id;
  return `${head}\n${opts.xLabel}: ${p.xLimit ? '< ' : ''}${fx(p.x)}\n${opts.yLabel}: ${p.yLimit ? '< ' : ''}${fy(p.y)}`;
}

/**
 * The marks of a scatter chart, bottom to top: the population (error bars, detections, limits;
 * or a density grid with binned limits above `densityThreshold` points), highlighted objects,
 * new objects, and one hover layer over all of them that shows the object id and sets the
 * plot's value (used for click-through).
 */
export function scatterLayers(points: readonly ChartPoint[], opts: ScatterLayerOptions): ScatterLayers {
  const byRole = (role: PointRole) => points.filter((p) => p.role === role);
  const population = byRole('population');
  const dense = population.length > opts.densityThreshold;
  const marks: Plot.Markish[] = [];
  if (dense) marks.push(...densityMarks(population, opts));
  for (const role of ['population', 'highlight', 'extra'] as const) {
    if (role === 'population' && dense) continue;
    const pts = role === 'population' ? population : byRole(role);
    if (!pts.length) continue;
    const limits = pts.filter(isLimit);
    const colour = role === 'population' ? PALETTE.population : role === 'highlight' ? PALETTE.highlight : PALETTE.extra;
    marks.push(
      ...errorBars(pts, role),
      ...detectionMarks(pts.filter((p) => !isLimit(p)), role, opts),
      ...limitMarks(limits, role, role === 'highlight' ? PALETTE.ink : colour, role === 'population' ? 4.5 : 6),
    );
  }
  // The tip's text is written only for the point under the pointer (the title channel holds the
  // ids, the format writes the text): writing it for every point cost ~10 ms per 10,000 points and chart.
  const hover = points.length
    ? Plot.tip(points as ChartPoint[], Plot.pointer({ x: 'x', y: 'y', title: 'id', format: { title: (_id: string, i: number) => hoverText(points[i]!, opts) }, ...tag('hover') }))
    : null;
  const color: Plot.ScaleOptions | undefined = dense
    ? { type: 'log', range: [PALETTE.densityLow, PALETTE.densityHigh], interpolate: 'lab', label: 'Objects per cell', legend: false }
    : undefined;
  return { marks, hover, color, dense };
}
