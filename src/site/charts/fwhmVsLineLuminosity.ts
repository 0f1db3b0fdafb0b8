import type { ChartPoint } from './chartPoint.ts';
import { CAVEATS, countNote } from './captions.ts';
import { paddedExtent } from './extent.ts';
import { PALETTE } from './palette.ts';
import { pointsFromRows } from './pointsFromRows.ts';
import { renderScatter } from './renderScatter.ts';
import { isTrue, num } from './rowValues.ts';
import type { SeriesStyle } from './scatterLayers.ts';
import type { CatalogRow, ChartOptions } from './types.ts';

/** Options of {@link fwhmVsLineLuminosity}. */
export type FwhmVsLineLuminosityOptions = ChartOptions;

const FWHM_TICKS = [300, 500, 700, 1000, 1500, 2000, 3000, 4000, 5000, 7000, 10000, 15000, 20000, 30000];

/** Hα as circles, Hβ as triangles: told apart by shape as well as colour. */
export const LINE_SERIES: Record<'halpha' | 'hbeta', SeriesStyle> = {
  halpha: { symbol: 'circle', colour: PALETTE.halpha, label: 'Broad Hα' },
  hbeta: { symbol: 'triangle', colour: PALETTE.hbeta, label: 'Broad Hβ' },
};

/**
 * Broad-line FWHM (km s^-1, log axis) against line luminosity (log erg s^-1, after
 * magnification and dust corrections), one point per measured line: Hα circles, Hβ triangles.
 * Bars: ±1σ in FWHM; an Hα flux upper limit ('flux_halpha_is_limit') gives a leftward limit arrow.
 */
export function fwhmVsLineLuminosity(rows: readonly CatalogRow[], options: FwhmVsLineLuminosityOptions = {}): SVGSVGElement | HTMLElement {
  const { points, unplaced } = pointsFromRows(rows, options, (r) => {
    const out: Omit<ChartPoint, 'id' | 'role'>[] = [];
    for (const line of ['halpha', 'hbeta'] as const) {
      const x = num(r[`log_lum_${line}`]);
      const y = num(r[`fwhm_${line}`]);
      if (x === null || y === null || y <= 0) continue;
      const e = num(r[`fwhm_${line}_err`]);
      const limit = line === 'halpha' && isTrue(r.flux_halpha_is_limit);
      out.push({ x, y, xLo: null, xHi: null, yLo: e === null ? null : Math.max(y - e, y * 0.05), yHi: e === null ? null : y + e, xLimit: limit, yLimit: false, series: line });
    }
    return out;
  });
  const xDomain = paddedExtent(points.map((p) => p.x), [41, 43]);
  const logY = paddedExtent(points.map((p) => Math.log10(p.y)), [3, 3.7], 0.06, 0.15);
  const yDomain: [number, number] = [10 ** logY[0], 10 ** logY[1]];
  const shown = new Set(points.filter((p) => p.role !== 'extra').map((p) => p.id)).size;
  return renderScatter(
    {
      points,
      xDomain,
      yDomain,
      xLabel: 'log L_line / erg s⁻¹',
      yLabel: 'FWHM / km s⁻¹',
      y: { type: 'log', ticks: FWHM_TICKS.filter((t) => t >= yDomain[0] && t <= yDomain[1]), tickFormat: (v: number) => String(v) },
      series: LINE_SERIES,
      caption: [
        'Broad-line width against line luminosity, one point per measured line (Hα circles, Hβ triangles).',
        CAVEATS.lines,
        'Bars: ±1σ FWHM.',
        CAVEATS.limits,
        countNote(shown, unplaced, 'a broad Hα or Hβ measurement'),
      ].join(' '),
      ariaDescription: 'Scatter plot of broad-line FWHM against broad-line luminosity, H-alpha as circles and H-beta as triangles.',
      formatY: (v) => `${Math.round(v)}`,
    },
    options,
  );
}
