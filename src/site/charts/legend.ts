import * as Plot from '@observablehq/plot';
import type { CustomSymbol } from './limitSymbols.ts';
import { PALETTE } from './palette.ts';
import { tag } from './markTag.ts';

/** One entry of a chart legend. */
export interface LegendItem {
  label: string;
  /** A Plot symbol name or a custom symbol (LEGEND_LINE and LEGEND_BAND for lines and bands). */
  symbol: string | CustomSymbol;
  fill?: string;
  stroke?: string;
  strokeWidth?: number;
  strokeDasharray?: string;
  fillOpacity?: number;
  r?: number;
}

/** A short horizontal line, for line entries. */
export const LEGEND_LINE: CustomSymbol = {
  draw(ctx) {
    ctx.moveTo(-9, 0);
    ctx.lineTo(9, 0);
  },
};
/** A filled bar, for band entries. */
export const LEGEND_BAND: CustomSymbol = {
  draw(ctx) {
    ctx.moveTo(-9, -4);
    ctx.lineTo(9, -4);
    ctx.lineTo(9, 4);
    ctx.lineTo(-9, 4);
    ctx.closePath();
  },
};

/** Height of one legend row, px. */
export const LEGEND_ROW = 18;
/** Distance from the bottom of the frame to the first legend row, px (below the x-axis label). */
export const LEGEND_OFFSET = 46;
/** Rough width of one character of the 11 px legend text, px. */
const CHAR_PX = 6.8;

/** Where each item goes: its row and its x offset from the left of the frame. */
export function legendLayout(items: readonly LegendItem[], availablePx: number, startPx: number): { row: number; dx: number }[] {
  let row = 0;
  let x = startPx;
  return items.map((item) => {
    const w = 16 + 2 * (item.r ?? 4) + item.label.length * CHAR_PX + 16;
    if (x + w > startPx + availablePx && x > startPx) {
      row += 1;
      x = startPx;
    }
    const at = { row, dx: x };
    x += w;
    return at;
  });
}

/** Number of legend rows the items need. */
export function legendRows(items: readonly LegendItem[], availablePx: number): number {
  if (!items.length) return 0;
  return Math.max(...legendLayout(items, availablePx, 0).map((p) => p.row)) + 1;
}

/**
 * The legend as Plot marks laid out in rows under the x axis (in the bottom margin, so it never
 * hides data and is part of a downloaded SVG). The plot's bottom margin must leave
 * LEGEND_OFFSET + LEGEND_ROW·rows px for it.
 */
export function legendMarks(items: readonly LegendItem[], availablePx: number, startPx: number): Plot.Markish[] {
  const layout = legendLayout(items, availablePx, startPx);
  return items.flatMap((item, i) => {
    const { row, dx } = layout[i]!;
    const dy = LEGEND_OFFSET + row * LEGEND_ROW;
    return [
      Plot.dot([item], {
        frameAnchor: 'bottom-left',
        dx: dx + 6 + (item.r ?? 4),
        dy,
        symbol: item.symbol as Plot.SymbolType,
        r: item.r ?? 4,
        fill: item.fill ?? 'none',
        fillOpacity: item.fillOpacity ?? 1,
        stroke: item.stroke ?? 'none',
        strokeWidth: item.strokeWidth ?? 1,
        strokeDasharray: item.strokeDasharray,
        ...tag('legend symbol'),
      }),
      Plot.text([item.label], {
        frameAnchor: 'bottom-left',
        dx: dx + 14 + 2 * (item.r ?? 4),
        dy,
        text: (d: string) => d,
        textAnchor: 'start',
        fontSize: 11,
        fill: PALETTE.ink,
        ...tag('legend label'),
      }),
    ];
  });
}
