import * as Plot from '@observablehq/plot';
import type { LocalRelationId } from '../../core/derive/types.ts';
import { getLocalRelation, localLogMbh } from '../../core/local/index.ts';
import { authorYear } from './authorYear.ts';
import { CAVEATS, countNote } from './captions.ts';
import { paddedExtent } from './extent.ts';
import { LEGEND_LINE, type LegendItem } from './legend.ts';
import { PALETTE } from './palette.ts';
import { pointsFromRows } from './pointsFromRows.ts';
import { relationCurves, type RelationCurve } from './relationLines.ts';
import { renderScatter } from './renderScatter.ts';
import { hasFlag, num } from './rowValues.ts';
import type { CatalogRow, ChartOptions, ChartSettings } from './types.ts';
import { tag } from './markTag.ts';

/** Options of {@link massVsStellarMass}. */
export interface MassVsStellarMassOptions extends ChartOptions {
  settings: Pick<ChartSettings, 'localRelation'>;
  /** Local relations drawn beside the catalog's (default: Reines & Volonteri 2015 AGN and Kormendy & Ho 2013 M_bulge). */
  compareRelations?: readonly LocalRelationId[];
}

const OTHER_COLOURS = [PALETTE.relationOther, '#5d6aa8'];

function relationStyle(curves: readonly RelationCurve[]): Map<LocalRelationId, string> {
  const m = new Map<LocalRelationId, string>();
  let k = 0;
  for (const c of curves) m.set(c.relation.id, c.chosen ? PALETTE.relationChosen : OTHER_COLOURS[k++ % OTHER_COLOURS.length]!);
  return m;
}

/**
 * Black-hole mass (log M_sun) against host stellar mass (log M_sun), with the catalog's local
 * relation and the comparison relations as lines (dotted where extrapolated beyond their
 * calibrated range) and their intrinsic scatter as bands, labelled author–year. Bars: ±1σ in
 * M*, 16th–84th percentiles in M_BH; 'mbh_upper_limit' rows get a downward limit arrow.
 */
export function massVsStellarMass(rows: readonly CatalogRow[], options: MassVsStellarMassOptions): SVGSVGElement | HTMLElement {
  const { points, unplaced } = pointsFromRows(rows, options, (r) => {
    const x = num(r.log_mstar);
    const y = num(r.log_mbh);
    if (x === null || y === null) return null;
    const xe = num(r.log_mstar_err);
    return {
      x,
      y,
      xLo: xe === null ? null : x - xe,
      xHi: xe === null ? null : x + xe,
      yLo: num(r.log_mbh_p16),
      yHi: num(r.log_mbh_p84),
      xLimit: false,
      yLimit: hasFlag(r, 'mbh_upper_limit'),
    };
  });
  const xDomain = paddedExtent(points.map((p) => p.x), [8, 11]);
  const chosenId = options.settings.localRelation;
  const curves = relationCurves(chosenId, options.compareRelations ?? ['rv15_agn', 'kh13_mbulge'], xDomain);
  // the y range covers the points and the relations' lines, so the offset is visible
  const yDomain = paddedExtent([...points.map((p) => p.y), ...curves.flatMap((c) => c.line.map((l) => l.y))], [5, 10]);
  const colour = relationStyle(curves);
  const under: Plot.Markish[] = [];
  const over: Plot.Markish[] = [];
  const legend: LegendItem[] = [];
  for (const c of curves) {
    const stroke = colour.get(c.relation.id)!;
    under.push(
      Plot.areaY(c.band, { x: 'x', y1: 'lo', y2: 'hi', fill: stroke, fillOpacity: c.chosen ? 0.13 : 0.09, clip: true, ...tag(`scatter band ${c.relation.id}`) }),
    );
    for (const inRange of [true, false]) {
      const seg = c.line.filter((l) => l.inRange === inRange);
      for (let i = 0; i + 1 < seg.length; i += 2) {
        under.push(
          Plot.line(seg.slice(i, i + 2), {
            x: 'x',
            y: 'y',
            stroke,
            strokeWidth: c.chosen ? 2 : 1.5,
            strokeDasharray: inRange ? (c.chosen ? undefined : '7 3') : '2 3',
            clip: true,
            ...tag(`local relation ${c.relation.id}`),
          }),
        );
      }
    }
    const last = c.line[c.line.length - 1]!;
    if (last.y > yDomain[0] && last.y < yDomain[1]) {
      // the label goes on the side of the line with fewer objects, so it does not sit on the data,
      // and never past the top or bottom of the frame
      const above = points.filter((p) => p.y > localLogMbh(c.relation, p.x)).length;
      const nearTop = last.y > yDomain[1] - 0.08 * (yDomain[1] - yDomain[0]);
      const nearBottom = last.y < yDomain[0] + 0.08 * (yDomain[1] - yDomain[0]);
      const below = nearTop || (!nearBottom && above > points.length - above);
      over.push(
        Plot.text([last], { x: 'x', y: 'y', text: () => authorYear(c.relation.label), textAnchor: 'end', dx: -4, dy: below ? 13 : -9, fill: stroke, stroke: 'white', strokeWidth: 3, fontSize: 11, ...tag('relation label') }),
      );
    }
    legend.push({
      label: `${c.relation.label} ± ${c.relation.scatterDex.toFixed(2)} dex${c.chosen ? ' (catalog)' : ''}${c.relation.x === 'logMbulge' ? ', M* as bulge mass' : ''}`,
      symbol: LEGEND_LINE,
      stroke,
      strokeWidth: c.chosen ? 2 : 1.5,
      strokeDasharray: c.chosen ? undefined : '7 3',
    });
  }
  const chosen = getLocalRelation(chosenId);
  const notDrawn = curves.some((c) => c.chosen) ? '' : ` The catalog's relation (${chosen.label}) takes ${chosen.x === 'logSigma' ? 'the velocity dispersion' : 'another input'} and is not drawn here.`;
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
        'Black-hole mass against host stellar mass, with local relations (bands: intrinsic scatter; dotted: beyond the range they were fitted on).',
        CAVEATS.mass,
        CAVEATS.bars,
        CAVEATS.limits,
        countNote(shown, unplaced, 'a stellar or black-hole mass'),
      ].join(' ') + notDrawn,
      ariaDescription: 'Scatter plot of log black-hole mass against log host stellar mass with local scaling relations.',
    },
    options,
  );
}
