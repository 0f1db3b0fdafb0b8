/**
 * A chart of any query result, pure `(result, settings) => SVG` on Observable Plot: the
 * reader's x and y columns, optionally coloured by a column (five classes for numbers, one
 * colour per value for text, up to eight) and sized by one; linear or log axes; error bars
 * from the result's `_p16`/`_p84` columns; limits as arrows from the catalog's flags and
 * `_is_limit` columns; the local relations or Eddington lines where the axes allow. Above
 * DENSE_ABOVE points it draws counts per cell instead.
 */
import * as Plot from '@observablehq/plot';
import { attachPoints } from '../charts/chartPoints.ts';
import type { ChartPoint } from '../charts/chartPoint.ts';
import { EDDINGTON_RATIOS, eddingtonSegments, formatLambda } from '../charts/eddingtonLines.ts';
import { LEGEND_BAND, LEGEND_LINE, LEGEND_OFFSET, LEGEND_ROW, legendMarks, legendRows, type LegendItem } from '../charts/legend.ts';
import { directedLimitSymbol } from '../charts/limitSymbols.ts';
import { tag } from '../charts/markTag.ts';
import { PALETTE } from '../charts/palette.ts';
import { relationCurves } from '../charts/relationLines.ts';
import type { ChartSettings } from '../charts/types.ts';
import type { ResultSet } from '../db/resultSet.ts';
import { formatScientific, formatValue } from '../text/formatValue.ts';
import { intervalColumns } from './intervalColumns.ts';
import { limitOf, limitRule, type LimitKind } from './limitRule.ts';
import { OVERLAY_TEXT, overlayFor } from './resultOverlays.ts';
import type { ResultChartSettings } from './resultChartSettings.ts';

/** Above this many placed points the chart draws counts per cell. */
export const DENSE_ABOVE = 20_000;

/** Colours of the classes (numbers, low to high) and of text values (in order of first appearance). */
const CLASS_COLOURS = ['#d8e6ee', '#8fb8cf', '#4f8fb3', '#2f6a86', '#143f55'];
const VALUE_COLOURS = ['#2f6a86', '#e4572e', '#4f7f2a', '#7a4b9c', '#b08a1e', '#b0226b', '#5d6aa8', '#7c858d'];

/** One placed row. */
export interface ResultPoint extends ChartPoint {
  xKind: LimitKind | null;
  yKind: LimitKind | null;
  colourKey: string | null;
  sizeValue: number | null;
  row: number;
}

export interface ResultChartInput {
  rs: ResultSet;
  settings: ResultChartSettings;
  /** Catalog settings for the overlays (Eddington luminosity per solar mass, chosen local relation). */
  catalog: ChartSettings;
  /** Axis label of a column (its readable name and unit). */
  label: (column: string) => string;
  document?: Document;
  width?: number;
  height?: number;
}

export interface ResultChart {
  element: SVGSVGElement | HTMLElement;
  /** Rows drawn, and rows left out (missing value, or not positive on a log axis). */
  placed: number;
  skipped: number;
}

const numeric = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);

function colourClasses(values: number[]): number[] {
  const sorted = [...values].sort((a, b) => a - b);
  return [1, 2, 3, 4].map((k) => sorted[Math.min(sorted.length - 1, Math.floor((k * sorted.length) / 5))]!);
}

/** Draws the chart of `input.rs` under `input.settings`. */
export function resultChart(input: ResultChartInput): ResultChart {
  const { rs, settings: s } = input;
  const width = input.width ?? 640;
  const height = input.height ?? 440;
  const col = (name: string) => (name ? rs.names.indexOf(name) : -1);
  const [ix, iy, ic, is, iid] = [col(s.x), col(s.y), col(s.colour), col(s.size), col('id')];
  const xBars = intervalColumns(s.x, rs.names);
  const yBars = intervalColumns(s.y, rs.names);
  const xRule = limitRule(s.x);
  const yRule = limitRule(s.y);
  const rowObject = (r: number): Record<string, unknown> => {
    const o: Record<string, unknown> = {};
    for (let c = 0; c < rs.names.length; c++) o[rs.names[c]!] = rs.columns[c]![r];
    return o;
  };
  const needRow = Boolean(xRule || yRule);
  const points: ResultPoint[] = [];
  let skipped = 0;
  for (let r = 0; r < rs.numRows; r++) {
    const x = ix >= 0 ? numeric(rs.columns[ix]![r]) : null;
    const y = iy >= 0 ? numeric(rs.columns[iy]![r]) : null;
    if (x === null || y === null || (s.xLog && x <= 0) || (s.yLog && y <= 0)) {
      skipped += 1;
      continue;
    }
    const row = needRow ? rowObject(r) : {};
    const v = (c: string | undefined) => (c ? numeric(rs.columns[rs.names.indexOf(c)]![r]) : null);
    const xKind = limitOf(xRule, row);
    const yKind = limitOf(yRule, row);
    const cv = ic >= 0 ? rs.columns[ic]![r] : null;
    points.push({
      id: iid >= 0 ? String(rs.columns[iid]![r]) : `row ${r + 1}`,
      role: iid >= 0 ? 'population' : 'extra',
      x,
      y,
      xLo: v(xBars?.lo),
      xHi: v(xBars?.hi),
      yLo: v(yBars?.lo),
      yHi: v(yBars?.hi),
      xLimit: xKind !== null,
      yLimit: yKind !== null,
      xKind,
      yKind,
      colourKey: cv === null || cv === undefined ? null : typeof cv === 'number' ? String(cv) : String(cv),
      sizeValue: is >= 0 ? numeric(rs.columns[is]![r]) : null,
      row: r,
    });
  }

  const xLabel = input.label(s.x);
  const yLabel = input.label(s.y);
  const dense = points.length > DENSE_ABOVE;
  const marks: Plot.Markish[] = [Plot.frame({ stroke: PALETTE.ink, strokeOpacity: 0.25 })];
  const legend: LegendItem[] = [];
  const captions: string[] = [`${yLabel} against ${xLabel}, ${points.length.toLocaleString('en')} ${points.length === 1 ? 'row' : 'rows'} of the query result.`];

  // colour: classes for numbers, one colour per value for text
  let fillOf: (p: ResultPoint) => string = () => PALETTE.population;
  if (ic >= 0 && !dense) {
    const nums = points.map((p) => numeric(rs.columns[ic]![p.row])).filter((v): v is number => v !== null);
    if (nums.length && nums.length === points.filter((p) => p.colourKey !== null).length) {
      const cuts = colourClasses(nums);
      const cls = (v: number) => cuts.filter((c) => v > c).length;
      fillOf = (p) => {
        const n = numeric(rs.columns[ic]![p.row]);
        return n === null ? '#ffffff' : CLASS_COLOURS[cls(n)]!;
      };
      const lo = Math.min(...nums);
      const hi = Math.max(...nums);
      const bounds = [lo, ...cuts, hi];
      for (let k = 0; k < 5; k++) {
        if (k > 0 && bounds[k] === bounds[k + 1]) continue;
        legend.push({ label: `${formatValue(s.colour, bounds[k])} – ${formatValue(s.colour, bounds[k + 1])}`, symbol: 'circle', fill: CLASS_COLOURS[k], stroke: PALETTE.ink, strokeWidth: 0.5 });
      }
      captions.push(`Colour: ${input.label(s.colour)} in five classes of equal counts.`);
    } else {
      const keys: string[] = [];
      for (const p of points) if (p.colourKey !== null && !keys.includes(p.colourKey)) keys.push(p.colourKey);
      const shown = keys.slice(0, VALUE_COLOURS.length - 1);
      const other = keys.length > shown.length;
      fillOf = (p) => (p.colourKey === null ? '#ffffff' : shown.includes(p.colourKey) ? VALUE_COLOURS[shown.indexOf(p.colourKey)]! : VALUE_COLOURS.at(-1)!);
      shown.forEach((k, i) => legend.push({ label: formatValue(s.colour, k), symbol: 'circle', fill: VALUE_COLOURS[i], stroke: PALETTE.ink, strokeWidth: 0.5 }));
      if (other) legend.push({ label: `${keys.length - shown.length} other values`, symbol: 'circle', fill: VALUE_COLOURS.at(-1), stroke: PALETTE.ink, strokeWidth: 0.5 });
      captions.push(`Colour: ${input.label(s.colour)}.`);
    }
    if (points.some((p) => p.colourKey === null)) legend.push({ label: 'no value', symbol: 'circle', fill: '#ffffff', stroke: PALETTE.ink, strokeWidth: 0.8 });
  }

  // size: area proportional to the value's position between the smallest and largest
  let rOf: (p: ResultPoint) => number = () => 3.4;
  if (is >= 0 && !dense) {
    const vals = points.map((p) => p.sizeValue).filter((v): v is number => v !== null);
    const lo = Math.min(...vals);
    const hi = Math.max(...vals);
    rOf = (p) => (p.sizeValue === null || hi === lo ? 3 : Math.sqrt(4 + ((p.sizeValue - lo) / (hi - lo)) * 60));
    if (vals.length) captions.push(`Point area grows with ${input.label(s.size)}, from ${formatValue(s.size, lo)} (smallest) to ${formatValue(s.size, hi)} (largest).`);
  }

  // overlays
  const overlay = s.overlays ? overlayFor(s.x, s.y, s.xLog, s.yLog) : null;
  const xs = points.map((p) => p.x);
  const ys = points.map((p) => p.y);
  const pad = (lo: number, hi: number, log: boolean): [number, number] => {
    if (!Number.isFinite(lo)) return log ? [1, 10] : [0, 1];
    if (log) return lo === hi ? [lo / 2, hi * 2] : [lo / 1.1, hi * 1.1];
    const d = hi - lo || Math.abs(hi) || 1;
    return [lo - 0.05 * d, hi + 0.05 * d];
  };
  const xDomain = pad(Math.min(...xs), Math.max(...xs), s.xLog);
  const yDomain = pad(Math.min(...ys), Math.max(...ys), s.yLog);
  const over: Plot.Markish[] = [];
  if (overlay === 'local-relations') {
    for (const c of relationCurves(input.catalog.localRelation, ['rv15_agn', 'kh13_mbulge'], xDomain)) {
      const colour = c.chosen ? PALETTE.relationChosen : PALETTE.relationOther;
      marks.push(
        Plot.areaY(c.band, { x: 'x', y1: 'lo', y2: 'hi', fill: colour, fillOpacity: 0.1, clip: true, ...tag('relation band') }),
        Plot.line(c.line, { x: 'x', y: 'y', stroke: colour, strokeWidth: c.chosen ? 1.6 : 1.2, strokeDasharray: c.chosen ? undefined : '5 3', clip: true, ...tag('local relation') }),
      );
      legend.push({ label: `${c.relation.label}${c.chosen ? ' (the catalog’s)' : ''}`, symbol: LEGEND_LINE, stroke: colour, strokeWidth: 1.6, strokeDasharray: c.chosen ? undefined : '5 3' });
    }
    legend.push({ label: '± intrinsic scatter', symbol: LEGEND_BAND, fill: PALETTE.relationChosen, fillOpacity: 0.12 });
    captions.push(`Lines: ${OVERLAY_TEXT[overlay]}, as published for local galaxies.`);
  } else if (overlay === 'eddington-lines') {
    const segs = eddingtonSegments(EDDINGTON_RATIOS, input.catalog.eddingtonPerMsun, xDomain, yDomain);
    marks.push(Plot.link(segs, { x1: 'x1', y1: 'y1', x2: 'x2', y2: 'y2', stroke: PALETTE.guide, strokeDasharray: '4 3', ...tag('eddington line') }));
    over.push(Plot.text(segs, { x: 'labelX', y: 'labelY', text: (d: { lambda: number }) => formatLambda(d.lambda), fill: PALETTE.guide, stroke: 'white', strokeWidth: 3, fontSize: 10, dy: -7, ...tag('eddington label') }));
    legend.push({ label: `Constant Eddington ratio (L_Edd = ${formatScientific(input.catalog.eddingtonPerMsun, 2)} erg s⁻¹ M☉⁻¹)`, symbol: LEGEND_LINE, stroke: PALETTE.guide, strokeDasharray: '4 3' });
    captions.push(`Dashed lines: ${OVERLAY_TEXT[overlay]}.`);
  }

  if (dense) {
    marks.push(Plot.rect(points, Plot.bin({ fill: 'count' }, { x: { value: 'x', thresholds: 60 }, y: { value: 'y', thresholds: 40 }, ...tag('density') })));
    captions.push(`With more than ${DENSE_ABOVE.toLocaleString('en')} rows the chart shows counts per cell (darker: more rows); no bars, limits or colour.`);
  } else {
    const bar = { stroke: PALETTE.population, strokeOpacity: 0.45, strokeWidth: 0.8, clip: true };
    const xb = points.filter((p) => !p.xLimit && p.xLo !== null && p.xHi !== null);
    const yb = points.filter((p) => !p.yLimit && p.yLo !== null && p.yHi !== null);
    if (xb.length) marks.push(Plot.ruleY(xb, { y: 'y', x1: 'xLo', x2: 'xHi', ...bar, ...tag('error bar x') }));
    if (yb.length) marks.push(Plot.ruleX(yb, { x: 'x', y1: 'yLo', y2: 'yHi', ...bar, ...tag('error bar y') }));
    const det = points.filter((p) => !p.xLimit && !p.yLimit);
    marks.push(Plot.dot(det, { x: 'x', y: 'y', r: rOf, fill: fillOf, fillOpacity: 0.85, stroke: PALETTE.ink, strokeWidth: 0.5, ariaLabel: (p: ResultPoint) => p.id, ...tag('result point') }));
    const groups = new Map<string, ResultPoint[]>();
    for (const p of points) if (p.xLimit || p.yLimit) groups.set(`${p.xKind}|${p.yKind}`, [...(groups.get(`${p.xKind}|${p.yKind}`) ?? []), p]);
    for (const pts of groups.values()) {
      const symbol = directedLimitSymbol(pts[0]!.xKind, pts[0]!.yKind)!;
      marks.push(Plot.dot(pts, { x: 'x', y: 'y', symbol, r: 5, stroke: ic >= 0 ? fillOf : PALETTE.population, strokeWidth: 1.3, fill: 'none', ariaLabel: (p: ResultPoint) => p.id, ...tag('result limit') }));
    }
    if (xb.length || yb.length) captions.push(`Bars: the 16th–84th percentiles in the result (${[xBars, yBars].filter(Boolean).map((b) => `${b!.lo}/${b!.hi}`).join(', ')}).`);
    if (groups.size) {
      legend.unshift({ label: 'Limit (arrow: where the true value lies)', symbol: directedLimitSymbol(null, 'upper')!, stroke: PALETTE.population, strokeWidth: 1.3, r: 5 });
      captions.push('Arrows mark limits read from the catalog’s flags and limit columns: the value is a bound, not a measurement.');
    }
  }
  if (skipped) captions.push(`${skipped.toLocaleString('en')} ${skipped === 1 ? 'row has' : 'rows have'} no value to place${s.xLog || s.yLog ? ' (missing, or not positive on a log axis)' : ' (missing)'}.`);

  const available = width - 16;
  const rows = legendRows(legend, available);
  const fx = (v: number) => formatValue(s.x, v);
  const fy = (v: number) => formatValue(s.y, v);
  const tipText = (p: ResultPoint) =>
    `${p.id}\n${xLabel}: ${p.xKind === 'upper' ? '< ' : p.xKind === 'lower' ? '> ' : ''}${fx(p.x)}\n${yLabel}: ${p.yKind === 'upper' ? '< ' : p.yKind === 'lower' ? '> ' : ''}${fy(p.y)}${
      ic >= 0 ? `\n${s.colour}: ${formatValue(s.colour, rs.columns[ic]![p.row])}` : ''
    }${is >= 0 ? `\n${s.size}: ${formatValue(s.size, rs.columns[is]![p.row])}` : ''}`;
  const element = Plot.plot({
    document: input.document,
    width,
    height: height + rows * LEGEND_ROW,
    marginLeft: 60,
    marginRight: 24,
    marginTop: 20,
    marginBottom: rows ? LEGEND_OFFSET + rows * LEGEND_ROW : 40,
    style: { color: PALETTE.ink, fontSize: '11px', background: 'white' },
    x: { type: s.xLog ? 'log' : 'linear', domain: xDomain, label: xLabel, labelAnchor: 'center', labelArrow: 'none', labelOffset: 32, ticks: Math.max(3, Math.floor(width / 90)) },
    y: { type: s.yLog ? 'log' : 'linear', domain: yDomain, label: yLabel, labelAnchor: 'center', labelArrow: 'none', grid: true },
    color: dense ? { type: 'log', range: [PALETTE.densityLow, PALETTE.densityHigh], interpolate: 'lab', legend: false } : undefined,
    caption: captions.join(' '),
    ariaDescription: `Scatter plot of ${yLabel} against ${xLabel} from the query result.`,
    marks: [
      ...marks,
      ...over,
      ...legendMarks(legend, available, 8 - 60),
      dense ? null : Plot.tip(points, Plot.pointer({ x: 'x', y: 'y', title: tipText, ...tag('hover') })),
    ],
  });
  if (!dense && points.some((p) => p.role === 'population')) attachPoints(element, { points, xLabel, yLabel });
  return { element, placed: points.length, skipped };
}
