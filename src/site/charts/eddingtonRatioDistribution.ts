import { formatFixed } from '../text/formatValue.ts';
import * as Plot from '@observablehq/plot';
import { CAVEATS } from './captions.ts';
import type { ChartPoint } from './chartPoint.ts';
import { attachPoints } from './chartPoints.ts';
import { stackedBins, type StackedBin } from './histogramBins.ts';
import { LEGEND_BAND, LEGEND_LINE, LEGEND_OFFSET, LEGEND_ROW, legendMarks, legendRows, type LegendItem } from './legend.ts';
import { LIMIT_LEFT, LIMIT_RIGHT } from './limitSymbols.ts';
import { limitMark } from '../text/limitMark.ts';
import { PALETTE } from './palette.ts';
import { pointsFromRows } from './pointsFromRows.ts';
import { num } from './rowValues.ts';
import type { CatalogRow, ChartOptions } from './types.ts';
import { tag } from './markTag.ts';

/** Options of {@link eddingtonRatioDistribution}. */
export interface EddingtonRatioDistributionOptions extends ChartOptions {
  /** Bin width in dex (default 0.25). */
  binDex?: number;
}

interface HoverItem {
  x: number;
  y: number;
  text: string;
  id?: string;
  role?: ChartPoint['role'];
}

/**
 * Histogram of log λ_Edd (Eddington ratio L_bol/L_Edd). Bounds are never counted as detections:
 * upper limits ('edd_ratio_upper_limit', or `log_edd_ratio_is_limit` without a direction) are
 * stacked above the detections in an outlined, lighter style, and lower limits
 * ('edd_ratio_lower_limit') on top of them, hatched the other way; the caption says so.
 * Highlighted and new objects are drawn as markers above the bars at their value with their
 * 16th–84th percentile bar, or as an arrow for a bound; a dashed rule marks λ_Edd = 1. Always
 * aggregated, so large selections cost no more than small ones.
 */
export function eddingtonRatioDistribution(rows: readonly CatalogRow[], options: EddingtonRatioDistributionOptions = {}): SVGSVGElement | HTMLElement {
  const width = options.width ?? 640;
  const height = options.height ?? 380;
  const binDex = options.binDex ?? 0.25;
  // the direction of each bound, by point (a lower limit's arrow points right)
  const lower = new WeakSet<object>();
  const { points, unplaced } = pointsFromRows(rows, options, (r) => {
    const x = num(r.log_edd_ratio);
    if (x === null) return null;
    const mark = limitMark('log_edd_ratio', r);
    const p = { x, y: 0, xLo: num(r.log_edd_ratio_p16), xHi: num(r.log_edd_ratio_p84), yLo: null, yHi: null, xLimit: mark !== '', yLimit: false };
    if (mark === '>') lower.add(p);
    return p;
  });
  const catalog = points.filter((p) => p.role !== 'extra');
  const bins = stackedBins(catalog.map((p) => ({ v: p.x, limit: lower.has(p) ? 'lower' as const : p.xLimit })), binDex);
  const total = (b: StackedBin): number => b.detections + b.limits + b.lowerLimits;
  const maxCount = Math.max(1, ...bins.map(total));
  const marked = points.filter((p) => p.role !== 'population');
  // markers sit in a lane above the tallest bar, one row per marked object
  const laneY = (i: number) => maxCount * (1.1 + 0.09 * i);
  const markers = marked.map((p, i) => ({ ...p, y: laneY(i), lower: lower.has(p) }));
  const yMax = markers.length ? laneY(markers.length - 1) * 1.06 : maxCount * 1.08;
  const xs = [...bins.flatMap((b) => [b.x1, b.x2]), ...markers.flatMap((m) => [m.x, m.xLo ?? m.x, m.xHi ?? m.x]), 0];
  const xDomain: [number, number] = [Math.min(...xs) - binDex / 2, Math.max(...xs) + binDex / 2];
  const hasLimits = bins.some((b) => b.limits > 0);
  const hasLower = bins.some((b) => b.lowerLimits > 0);
  const legend: LegendItem[] = [{ label: 'Detections', symbol: LEGEND_BAND, fill: PALETTE.population, fillOpacity: 0.85 }];
  if (hasLimits) legend.push({ label: 'Upper limits (stacked above)', symbol: LEGEND_BAND, fill: '#dfe9ee', stroke: PALETTE.population, strokeDasharray: '3 2' });
  if (hasLower) legend.push({ label: 'Lower limits (stacked on top)', symbol: LEGEND_BAND, fill: 'white', stroke: PALETTE.population, strokeDasharray: '1 2' });
  legend.push({ label: 'λ_Edd = 1', symbol: LEGEND_LINE, stroke: PALETTE.ink, strokeDasharray: '4 3' });
  if (markers.some((m) => m.role === 'highlight')) legend.push({ label: 'Highlighted', symbol: 'circle', fill: PALETTE.highlight, stroke: PALETTE.ink, strokeWidth: 1.4, r: 5 });
  if (markers.some((m) => m.role === 'extra')) legend.push({ label: 'New object', symbol: 'star', fill: PALETTE.extra, stroke: PALETTE.ink, strokeWidth: 1.2, r: 7 });
  const available = width - 16;
  const rowsNeeded = legendRows(legend, available);
  const hover: HoverItem[] = [
    ...bins.map((b) => ({
      x: (b.x1 + b.x2) / 2,
      y: total(b),
      text: `${formatFixed(b.x1, 2)} ≤ log λ_Edd < ${formatFixed(b.x2, 2)}\n${b.detections} detected${b.limits ? `, ${b.limits} upper limits` : ''}${b.lowerLimits ? `, ${b.lowerLimits} lower limits` : ''}`,
    })),
    ...markers.map((m) => ({
      x: m.x,
      y: m.y,
      id: m.id,
      role: m.role,
      text: `${m.role === 'extra' ? `${m.id} (new object)` : m.id}\nlog λ_Edd: ${m.xLimit ? (m.lower ? '> ' : '< ') : ''}${formatFixed(m.x, 2)}`,
    })),
  ];
  const shown = catalog.length;
  const el = Plot.plot({
    document: options.document,
    width,
    height: height + rowsNeeded * LEGEND_ROW,
    marginLeft: 56,
    marginRight: 24,
    marginTop: 20,
    marginBottom: LEGEND_OFFSET + rowsNeeded * LEGEND_ROW,
    style: { color: PALETTE.ink, fontSize: '11px', background: 'white' },
    x: { domain: xDomain, label: 'log λ_Edd (L_bol / L_Edd)', labelAnchor: 'center', labelArrow: 'none', labelOffset: 32 },
    y: { domain: [0, yMax], label: 'Objects per bin', labelAnchor: 'center', labelArrow: 'none', grid: true },
    title: options.title,
    caption: options.noCaption
      ? undefined
      : [
          `Distribution of Eddington ratios in ${binDex}-dex bins; bounds are not counted as detections: upper limits are stacked above the detections (their true values lie further left)${hasLower ? ', lower limits on top of them (their true values lie further right)' : ''}.`,
          'λ_Edd combines the mass and the bolometric-luminosity systematics.',
          CAVEATS.mass,
          `${shown} objects shown${unplaced ? `; ${unplaced} without an Eddington ratio not shown` : ''}.`,
        ].join(' '),
    ariaDescription: 'Histogram of log Eddington ratio, with upper limits stacked separately.',
    marks: [
      Plot.frame({ stroke: PALETTE.ink, strokeOpacity: 0.25 }),
      Plot.rectY(bins, { x1: 'x1', x2: 'x2', y1: 0, y2: 'detections', fill: PALETTE.population, fillOpacity: 0.85, inset: 0.5, ...tag('detections bin') }),
      Plot.rectY(
        bins.filter((b) => b.limits > 0),
        { x1: 'x1', x2: 'x2', y1: 'detections', y2: (b: { detections: number; limits: number }) => b.detections + b.limits, fill: '#dfe9ee', stroke: PALETTE.population, strokeDasharray: '3 2', inset: 0.5, ...tag('upper limits bin') },
      ),
      Plot.rectY(
        bins.filter((b) => b.lowerLimits > 0),
        { x1: 'x1', x2: 'x2', y1: (b: StackedBin) => b.detections + b.limits, y2: total, fill: 'white', stroke: PALETTE.population, strokeDasharray: '1 2', inset: 0.5, ...tag('lower limits bin') },
      ),
      Plot.ruleX([0], { stroke: PALETTE.ink, strokeDasharray: '4 3', ...tag('Eddington limit') }),
      Plot.ruleY(markers.filter((m) => m.xLo !== null && m.xHi !== null && !m.xLimit), {
        y: 'y',
        x1: 'xLo',
        x2: 'xHi',
        stroke: (m: ChartPoint) => (m.role === 'extra' ? PALETTE.extra : PALETTE.ink),
        strokeWidth: 1.6,
        ...tag('marked error bar x'),
      }),
      Plot.ruleX(markers, { x: 'x', y1: 0, y2: 'y', stroke: (m: ChartPoint) => (m.role === 'extra' ? PALETTE.extra : PALETTE.highlight), strokeWidth: 1.2, strokeOpacity: 0.7, ...tag('marked value') }),
      Plot.dot(markers.filter((m) => m.role === 'highlight' && !m.xLimit), { x: 'x', y: 'y', r: 5.5, fill: PALETTE.highlight, stroke: PALETTE.ink, strokeWidth: 1.4, ...tag('highlighted object') }),
      Plot.dot(markers.filter((m) => m.role === 'extra' && !m.xLimit), { x: 'x', y: 'y', r: 8, symbol: 'star', fill: PALETTE.extra, stroke: PALETTE.ink, strokeWidth: 1.2, ...tag('new object') }),
      Plot.dot(markers.filter((m) => m.role === 'highlight' && m.xLimit && !m.lower), { x: 'x', y: 'y', r: 6, symbol: LIMIT_LEFT, stroke: PALETTE.ink, strokeWidth: 2, fill: 'none', ...tag('highlighted upper limit') }),
      Plot.dot(markers.filter((m) => m.role === 'extra' && m.xLimit && !m.lower), { x: 'x', y: 'y', r: 6, symbol: LIMIT_LEFT, stroke: PALETTE.extra, strokeWidth: 2, fill: 'none', ...tag('new object upper limit') }),
      Plot.dot(markers.filter((m) => m.role === 'highlight' && m.lower), { x: 'x', y: 'y', r: 6, symbol: LIMIT_RIGHT, stroke: PALETTE.ink, strokeWidth: 2, fill: 'none', ...tag('highlighted lower limit') }),
      Plot.dot(markers.filter((m) => m.role === 'extra' && m.lower), { x: 'x', y: 'y', r: 6, symbol: LIMIT_RIGHT, stroke: PALETTE.extra, strokeWidth: 2, fill: 'none', ...tag('new object lower limit') }),
      ...legendMarks(legend, available, 8 - 56),
      Plot.tip(hover, Plot.pointer({ x: 'x', y: 'y', title: 'text', ...tag('hover') })),
    ],
  });
  attachPoints(el, { points: markers, xLabel: 'log λ_Edd', yLabel: 'objects' });
  return el;
}
