import { formatScientific } from '../text/formatValue.ts';
import * as Plot from '@observablehq/plot';
import { CAVEATS, countNote } from './captions.ts';
import { EDDINGTON_RATIOS, eddingtonSegments, formatLambda } from './eddingtonLines.ts';
import { paddedExtent } from './extent.ts';
import { LEGEND_LINE } from './legend.ts';
import { PALETTE } from './palette.ts';
import { pointsFromRows } from './pointsFromRows.ts';
import { renderScatter } from './renderScatter.ts';
import { hasFlag, num } from './rowValues.ts';
import type { CatalogRow, ChartSettings, ChartOptions } from './types.ts';
import { tag } from './markTag.ts';

/** Options of {@link lbolVsMass}: only the Eddington luminosity per solar mass is needed from the settings. */
export interface LbolVsMassOptions extends ChartOptions {
  settings: Pick<ChartSettings, 'eddingtonPerMsun'>;
}

/**
 * Bolometric luminosity (log erg s^-1) against black-hole mass (log M_sun), with dashed lines
 * of constant Eddington ratio 0.01, 0.1, 1 and 10 for the catalog's L_Edd per solar mass.
 * Bars: 16th–84th percentiles on both axes; 'mbh_upper_limit' rows get a leftward limit arrow,
 * 'lbol_upper_limit' rows a downward one.
 */
export function lbolVsMass(rows: readonly CatalogRow[], options: LbolVsMassOptions): SVGSVGElement | HTMLElement {
  const { points, unplaced } = pointsFromRows(rows, options, (r) => {
    const x = num(r.log_mbh);
    const y = num(r.log_lbol);
    if (x === null || y === null) return null;
    return {
      x,
      y,
      xLo: num(r.log_mbh_p16),
      xHi: num(r.log_mbh_p84),
      yLo: num(r.log_lbol_p16),
      yHi: num(r.log_lbol_p84),
      xLimit: hasFlag(r, 'mbh_upper_limit'),
      yLimit: hasFlag(r, 'lbol_upper_limit'),
    };
  });
  const xDomain = paddedExtent(points.map((p) => p.x), [5, 10]);
  const yDomain = paddedExtent(points.map((p) => p.y), [43, 47]);
  const lEdd = options.settings.eddingtonPerMsun;
  const segments = eddingtonSegments(EDDINGTON_RATIOS, lEdd, xDomain, yDomain);
  const width = options.width ?? 640;
  const height = options.height ?? 440;
  // on-screen angle of a slope-1 line, for the labels
  const pxPerX = (width - 80) / (xDomain[1] - xDomain[0]);
  const pxPerY = (height - 60) / (yDomain[1] - yDomain[0]);
  const angle = (-Math.atan(pxPerY / pxPerX) * 180) / Math.PI;
  const under: Plot.Markish[] = [
    Plot.link(segments, { x1: 'x1', y1: 'y1', x2: 'x2', y2: 'y2', stroke: PALETTE.guide, strokeDasharray: '5 4', strokeWidth: 1.2, ...tag('constant Eddington ratio') }),
  ];
  const over: Plot.Markish[] = [
    Plot.text(segments, {
      x: 'labelX',
      y: 'labelY',
      text: (s: { lambda: number }) => formatLambda(s.lambda),
      rotate: angle,
      dy: -6,
      fill: PALETTE.guide,
      stroke: 'white',
      strokeWidth: 3,
      fontSize: 11,
      ...tag('Eddington ratio label'),
    }),
  ];
  const shown = new Set(points.filter((p) => p.role !== 'extra').map((p) => p.id)).size;
  return renderScatter(
    {
      points,
      xDomain,
      yDomain,
      xLabel: 'log M_BH / M☉',
      yLabel: 'log L_bol / erg s⁻¹',
      under,
      over,
      legend: [{ label: `Constant Eddington ratio (L_Edd = ${formatScientific(lEdd, 2)} erg s⁻¹ M☉⁻¹)`, symbol: LEGEND_LINE, stroke: PALETTE.guide, strokeDasharray: '5 4', strokeWidth: 1.2 }],
      caption: [
        'Bolometric luminosity against black-hole mass; dashed lines: constant Eddington ratio.',
        CAVEATS.mass,
        CAVEATS.lbol,
        CAVEATS.bars,
        CAVEATS.limits,
        countNote(shown, unplaced, 'both values'),
      ].join(' '),
      ariaDescription: 'Scatter plot of log bolometric luminosity against log black-hole mass with lines of constant Eddington ratio.',
    },
    options,
  );
}
