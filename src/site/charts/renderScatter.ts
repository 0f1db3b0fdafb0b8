import * as Plot from '@observablehq/plot';
import type { ChartPoint } from './chartPoint.ts';
import { attachPoints } from './chartPoints.ts';
import { LEGEND_OFFSET, LEGEND_ROW, legendMarks, legendRows, type LegendItem } from './legend.ts';
import { PALETTE } from './palette.ts';
import { scatterLayers, type SeriesStyle } from './scatterLayers.ts';
import { scatterLegend } from './scatterLegend.ts';
import type { ChartOptions } from './types.ts';

/** Everything a scatter chart hands to {@link renderScatter}. */
export interface ScatterSpec {
  points: readonly ChartPoint[];
  xDomain: [number, number];
  yDomain: [number, number];
  xLabel: string;
  yLabel: string;
  /** Marks drawn under the points (reference lines, bands, tracks). */
  under?: Plot.Markish[];
  /** Marks drawn over everything (labels of reference lines). */
  over?: Plot.Markish[];
  /** Legend entries for the reference marks, after the points' entries. */
  legend?: LegendItem[];
  series?: Record<string, SeriesStyle>;
  caption: string;
  /** Extra plot options (e.g. x: {reverse: true}, axis marks in `under`, marginTop). */
  x?: Plot.ScaleOptions;
  y?: Plot.ScaleOptions;
  marginTop?: number;
  /** Chart description for assistive technology. */
  ariaDescription: string;
  formatX?: (v: number) => string;
  formatY?: (v: number) => string;
}

const MARGIN_LEFT = 56;
const MARGIN_RIGHT = 24;

/**
 * Draws a scatter chart: reference marks, the point layers (or density), the hover layer, a
 * legend under the x axis and the caption; records the points for mountChart.
 */
export function renderScatter(spec: ScatterSpec, options: ChartOptions): SVGSVGElement | HTMLElement {
  const width = options.width ?? 640;
  const height = options.height ?? 440;
  const layers = scatterLayers(spec.points, {
    xDomain: spec.xDomain,
    yDomain: spec.yDomain,
    densityThreshold: options.densityThreshold ?? 5000,
    xLabel: spec.xLabel,
    yLabel: spec.yLabel,
    series: spec.series,
    formatX: spec.formatX,
    formatY: spec.formatY,
  });
  const legend = [...scatterLegend(spec.points, layers.dense, spec.series), ...(spec.legend ?? [])];
  const available = width - 16;
  const rows = legendRows(legend, available);
  const el = Plot.plot({
    document: options.document,
    width,
    height: height + rows * LEGEND_ROW,
    marginLeft: MARGIN_LEFT,
    marginRight: MARGIN_RIGHT,
    marginTop: spec.marginTop ?? 20,
    marginBottom: rows ? LEGEND_OFFSET + rows * LEGEND_ROW : 40,
    style: { color: PALETTE.ink, fontSize: '11px', background: 'white' },
    x: { domain: spec.xDomain, label: spec.xLabel, labelAnchor: 'center', labelArrow: 'none', labelOffset: 32, ...spec.x },
    y: { domain: spec.yDomain, label: spec.yLabel, labelAnchor: 'center', labelArrow: 'none', grid: true, ...spec.y },
    color: layers.color,
    title: options.title,
    caption: options.noCaption ? undefined : layers.dense ? `${spec.caption} With more than ${options.densityThreshold ?? 5000} objects the population is drawn as counts per cell (no bars); upper limits as one arrow per occupied cell.` : spec.caption,
    ariaDescription: spec.ariaDescription,
    marks: [Plot.frame({ stroke: PALETTE.ink, strokeOpacity: 0.25 }), ...(spec.under ?? []), ...layers.marks, ...(spec.over ?? []), ...legendMarks(legend, available, 8 - MARGIN_LEFT), layers.hover],
  });
  attachPoints(el, { points: spec.points, xLabel: spec.xLabel, yLabel: spec.yLabel });
  return el;
}
