import { formatCount, formatFixed } from '../text/formatValue.ts';
import * as Plot from '@observablehq/plot';
import { PALETTE } from '../charts/palette.ts';
import { paddedExtent } from '../charts/extent.ts';
import { canDrawRaster, rasterArrows } from '../charts/rasterArrows.ts';

/** One object's position under two readings: black-hole mass and Eddington ratio (log10). */
export interface ShiftRow {
  id: string;
  mbhA: number | null;
  eddA: number | null;
  mbhB: number | null;
  eddB: number | null;
}

/** Options of {@link readingShiftChart}. */
export interface ShiftChartOptions {
  labelA: string;
  labelB: string;
  width?: number;
  height?: number;
  document?: Document;
  /** When `rows` are a sample: how many objects the readings hold (said in the caption). */
  sampleOf?: number;
}

const finite = (x: number | null): x is number => x !== null && Number.isFinite(x);

/**
 * Above this many objects the start of each arrow is not circled and points carry no title
 * element: 10,000 circles with titles doubled the SVG and took most of the redraw (measured on
 * the Readings page); the pointer tip still names the object.
 */
export const SHIFT_CIRCLES_MAX = 2_000;

/**
 * Above this many objects the arrows are drawn on a canvas inside the SVG (rasterArrows.ts)
 * where the document can draw one (a browser): 10,000 arrows as SVG paths took about 0.6 s of
 * the Readings page's redraw, as a canvas a few milliseconds. The downloads carry the canvas as an image.
 */
export const SHIFT_RASTER_ABOVE = 2_000;

/**
 * Each object's shift between two readings, as an arrow in the plane of black-hole mass
 * (log M_sun) and Eddington ratio (log λ_Edd): a hollow circle where it sits under reading A
 * (up to SHIFT_CIRCLES_MAX objects), an arrow to where it sits under B, and the Eddington limit
 * as a dashed line. Objects missing a value under either reading are left out and counted in the caption.
 */
export function readingShiftChart(rows: readonly ShiftRow[], o: ShiftChartOptions): SVGSVGElement | HTMLElement {
  const placed = rows.filter((r) => finite(r.mbhA) && finite(r.eddA) && finite(r.mbhB) && finite(r.eddB));
  const x = paddedExtent(placed.flatMap((r) => [r.mbhA!, r.mbhB!]), [4, 10]);
  const y = paddedExtent(placed.flatMap((r) => [r.eddA!, r.eddB!]), [-3, 2]);
  const left = rows.length - placed.length;
  const circles = placed.length <= SHIFT_CIRCLES_MAX;
  const raster = placed.length > SHIFT_RASTER_ABOVE && canDrawRaster(o.document ?? document);
  const arrowStyle = { stroke: PALETTE.population, strokeOpacity: 0.55, headLength: 5, insetEnd: 1 };
  const arrows = raster
    ? rasterArrows(
        { x1: placed.map((r) => r.mbhA!), y1: placed.map((r) => r.eddA!), x2: placed.map((r) => r.mbhB!), y2: placed.map((r) => r.eddB!) },
        { ...arrowStyle, strokeWidth: 1.5, ariaLabel: `${placed.length} arrows, one per object, drawn as an image` },
      )
    : Plot.arrow(placed, { x1: 'mbhA', y1: 'eddA', x2: 'mbhB', y2: 'eddB', ...arrowStyle });
  // The tip's text is written only for the arrow under the pointer (the title channel holds the ids).
  const tipText = (_id: string, i: number) => {
    const r = placed[i]!;
    return `${r.id}\nlog M: ${formatFixed(r.mbhA!, 2)} → ${formatFixed(r.mbhB!, 2)}\nlog λ: ${formatFixed(r.eddA!, 2)} → ${formatFixed(r.eddB!, 2)}`;
  };
  return Plot.plot({
    ...(o.document ? { document: o.document } : {}),
    width: o.width ?? 640,
    height: o.height ?? 440,
    marginLeft: 56,
    x: { domain: x, label: 'log M_BH / M☉' },
    y: { domain: y, label: 'log λ_Edd' },
    caption: `${o.sampleOf !== undefined ? `A sample of ${formatCount(rows.length)} of ${formatCount(o.sampleOf)} objects (the same for every pair); ${formatCount(placed.length)} drawn` : `${placed.length} objects`}: ${circles ? 'circles' : 'arrow tails'} under “${o.labelA}”, arrow heads under “${o.labelB}”${raster ? ' (the arrows drawn as one image)' : ''}.${left > 0 ? ` ${left} without a mass or Eddington ratio under one of them are not drawn.` : ''} Single-epoch masses carry 0.3–0.5 dex systematic uncertainty under every reading.`,
    marks: [
      Plot.ruleY([0], { stroke: PALETTE.guide, strokeDasharray: '5 4' }),
      arrows,
      ...(circles ? [Plot.dot(placed, { x: 'mbhA', y: 'eddA', r: 2.5, stroke: PALETTE.ink, fill: 'none', title: (r: ShiftRow) => r.id })] : []),
      Plot.tip(placed, Plot.pointer({ x: 'mbhB', y: 'eddB', title: 'id', format: { title: tipText } })),
    ],
  });
}
