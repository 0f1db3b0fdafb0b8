import * as Plot from '@observablehq/plot';
import type { LocalRelationId } from '../../core/derive/types.ts';
import type { RelationBandPoint } from '../../core/population/relationBand.ts';
import { authorYear } from './authorYear.ts';
import { CAVEATS, countNote } from './captions.ts';
import { paddedExtent } from './extent.ts';
import { LEGEND_BAND, LEGEND_LINE, type LegendItem } from './legend.ts';
import { tag } from './markTag.ts';
import { PALETTE } from './palette.ts';
import { pointsFromRows } from './pointsFromRows.ts';
import { relationCurves } from './relationLines.ts';
import { renderScatter } from './renderScatter.ts';
import { hasFlag, num } from './rowValues.ts';
import type { CatalogRow, ChartOptions } from './types.ts';

/** Colours of the two fits: the selection-aware relation (blue-green) and the naive fit (orange), apart for colour-blind readers and dashed differently. */
export const FIT_COLOURS = { intrinsic: '#1b7f79', naive: '#c4621b' } as const;

/** Options of {@link relationBehindSelection}. */
export interface RelationBehindSelectionOptions extends ChartOptions {
  /** The intrinsic (selection-aware) relation's mean: 16th, 50th and 84th percentiles over the posterior at each log M*. */
  band: readonly RelationBandPoint[];
  /** The naive fit's median parameters: log M_BH = alpha + beta (log M* − pivot). */
  naive: { alpha: number; beta: number } | null;
  /** log M* at which alpha is read (10 for dawn-census population). */
  pivotLogMstar: number;
  /** The local relation the catalog compares with (drawn with its scatter band when it takes a mass). */
  localRelation: LocalRelationId;
}

/**
 * Black-hole mass against host stellar mass for the objects the survey counts, with three relations: the naive fit
 * to the observed points (dashed), the intrinsic relation recovered with the selection inside the likelihood (solid,
 * with the 68 % band of its mean over the posterior), and the local relation (grey, with its intrinsic scatter).
 * The gap between the naive fit and the intrinsic relation is what the selection alone puts there.
 */
export function relationBehindSelection(rows: readonly CatalogRow[], options: RelationBehindSelectionOptions): SVGSVGElement | HTMLElement {
  const { points, unplaced } = pointsFromRows(rows, options, (r) => {
    const x = num(r.log_mstar);
    const y = num(r.log_mbh);
    if (x === null || y === null) return null;
    const xe = num(r.log_mstar_err);
    return { x, y, xLo: xe === null ? null : x - xe, xHi: xe === null ? null : x + xe, yLo: num(r.log_mbh_p16), yHi: num(r.log_mbh_p84), xLimit: false, yLimit: hasFlag(r, 'mbh_upper_limit') };
  });
  const xDomain = paddedExtent([...points.map((p) => p.x), ...options.band.map((b) => b.x)], [8, 11]);
  const naiveLine = options.naive ? xDomain.map((x) => ({ x, y: options.naive!.alpha + options.naive!.beta * (x - options.pivotLogMstar) })) : [];
  const local = relationCurves(options.localRelation, [], xDomain).filter((c) => c.chosen);
  const yDomain = paddedExtent([...points.map((p) => p.y), ...options.band.flatMap((b) => [b.lo, b.hi]), ...naiveLine.map((l) => l.y)], [5, 10]);
  const under: Plot.Markish[] = [];
  const over: Plot.Markish[] = [];
  const legend: LegendItem[] = [];
  for (const c of local) {
    under.push(
      Plot.areaY(c.band, { x: 'x', y1: 'lo', y2: 'hi', fill: PALETTE.relationChosen, fillOpacity: 0.08, clip: true, ...tag('local relation band') }),
      Plot.line(c.line, { x: 'x', y: 'y', stroke: PALETTE.relationChosen, strokeWidth: 1.5, strokeDasharray: '2 3', clip: true, ...tag('local relation') }),
    );
    legend.push({ label: `Local: ${authorYear(c.relation.label)} ± ${c.relation.scatterDex.toFixed(2)} dex`, symbol: LEGEND_LINE, stroke: PALETTE.relationChosen, strokeDasharray: '2 3', strokeWidth: 1.5 });
  }
  if (options.band.length) {
    under.push(Plot.areaY(options.band, { x: 'x', y1: 'lo', y2: 'hi', fill: FIT_COLOURS.intrinsic, fillOpacity: 0.22, clip: true, ...tag('intrinsic relation band') }));
    over.push(Plot.line(options.band, { x: 'x', y: 'mid', stroke: FIT_COLOURS.intrinsic, strokeWidth: 2.5, clip: true, ...tag('intrinsic relation') }));
    legend.push({ label: 'Intrinsic relation, selection-aware (68 % band)', symbol: LEGEND_BAND, fill: FIT_COLOURS.intrinsic, fillOpacity: 0.4, stroke: FIT_COLOURS.intrinsic });
  }
  if (naiveLine.length) {
    over.push(Plot.line(naiveLine, { x: 'x', y: 'y', stroke: FIT_COLOURS.naive, strokeWidth: 2, strokeDasharray: '8 4', clip: true, ...tag('naive fit') }));
    legend.push({ label: 'Naive fit to the points', symbol: LEGEND_LINE, stroke: FIT_COLOURS.naive, strokeWidth: 2, strokeDasharray: '8 4' });
  }
  const shown = new Set(points.filter((p) => p.role !== 'extra').map((p) => p.id)).size;
  return renderScatter(
    {
      points,
      xDomain,
      yDomain,
      xLabel: 'log M* / M☉',
      yLabel: 'log M_BH / M☉',
      under,
      over,
      legend,
      caption: [
        'Black-hole mass against host stellar mass for the objects the survey counts (those with a V_max).',
        'Dashed orange: a straight fit to the points as observed. Solid with band: the relation of the whole population once the survey’s flux and width limits are modelled (median and 68 % band of its mean; the intrinsic scatter is not in the band).',
        local.length ? 'Dotted grey: the local relation with its scatter.' : 'The catalog’s local relation does not take a stellar mass and is not drawn.',
        CAVEATS.mass,
        CAVEATS.bars,
        countNote(shown, unplaced, 'a stellar or black-hole mass'),
      ].join(' '),
      ariaDescription: 'Scatter plot of log black-hole mass against log host stellar mass with the naive fit, the selection-aware intrinsic relation and the local relation.',
    },
    options,
  );
}
