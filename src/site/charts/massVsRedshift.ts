import { formatValue } from '../text/formatValue.ts';
import * as Plot from '@observablehq/plot';
import { getCosmology } from '../../core/cosmology/index.ts';
import { CAVEATS, countNote } from './captions.ts';
import { cosmicTimeTicks } from './cosmicTimeTicks.ts';
import { paddedExtent } from './extent.ts';
import { growthTracks } from './growthTracks.ts';
import { LEGEND_LINE, type LegendItem } from './legend.ts';
import { PALETTE } from './palette.ts';
import { pointsFromRows } from './pointsFromRows.ts';
import { renderScatter } from './renderScatter.ts';
import { hasFlag, num } from './rowValues.ts';
import type { CatalogRow, SettingsChartOptions } from './types.ts';
import { tag } from './markTag.ts';

/** Options of {@link massVsRedshift}. */
export type MassVsRedshiftOptions = SettingsChartOptions;

const superscript = (n: number): string => String(n).replace(/[0-9-]/g, (c) => '⁰¹²³⁴⁵⁶⁷⁸⁹'['0123456789'.indexOf(c)] ?? '⁻');

/**
 * Black-hole mass (log M_sun) against redshift, redshift decreasing to the right (time runs
 * left to right), with the age of the universe along the top (the catalog's cosmology) and
 * Eddington-limited growth tracks (λ = 1, duty cycle 1, the catalog's ε) from the light and
 * heavy seeds placed at z_seed. Bars: 16th–84th percentiles; 'mbh_upper_limit' rows get a
 * downward limit arrow.
 */
export function massVsRedshift(rows: readonly CatalogRow[], options: MassVsRedshiftOptions): SVGSVGElement | HTMLElement {
  const s = options.settings;
  const cosmology = getCosmology(s.cosmology);
  const { points, unplaced } = pointsFromRows(rows, options, (r) => {
    const x = num(r.z);
    const y = num(r.log_mbh);
    if (x === null || y === null) return null;
    return { x, y, xLo: null, xHi: null, yLo: num(r.log_mbh_p16), yHi: num(r.log_mbh_p84), xLimit: false, yLimit: hasFlag(r, 'mbh_upper_limit') };
  });
  const dataZ = paddedExtent(points.map((p) => p.x), [4, 10], 0.04);
  const zLow = Math.max(0, dataZ[0]);
  const zHigh = Math.max(dataZ[1], s.zSeed + 0.5);
  const xDomain: [number, number] = [zLow, zHigh];
  const tracks = growthTracks(cosmology, s, zLow);
  const logLight = Math.log10(s.lightSeedMsun);
  const logHeavy = Math.log10(s.heavySeedMsun);
  // room under the light seed for its label
  const yDomain = paddedExtent([...points.map((p) => p.y), logLight - 0.7, logHeavy], [2, 10]);
  // an age label is about 48 px wide: keep ticks at least 56 px apart on the plotted width
  const plotWidth = (options.width ?? 640) - 80;
  const ticks = cosmicTimeTicks(cosmology, xDomain, 8, 56 / plotWidth);
  const trackColour = { light: PALETTE.seedLight, heavy: PALETTE.seedHeavy } as const;
  const trackDash = { light: '8 3', heavy: '3 2' } as const;
  const under: Plot.Markish[] = [
    Plot.axisX({ anchor: 'bottom', label: 'Redshift z', labelAnchor: 'center', labelArrow: 'none', labelOffset: 32 }),
    Plot.axisX(
      ticks.map((t) => t.z),
      { anchor: 'top', tickFormat: (z: number) => ticks.find((t) => t.z === z)?.label ?? '', label: 'Age of the universe', labelAnchor: 'center', labelArrow: 'none', ...tag('cosmic time axis') },
    ),
    Plot.ruleX([s.zSeed], { stroke: PALETTE.guide, strokeDasharray: '2 3', ...tag('seed redshift') }),
    ...tracks.map((t) =>
      Plot.line(t.points, { x: 'z', y: 'logM', stroke: trackColour[t.seed], strokeWidth: 1.8, strokeDasharray: trackDash[t.seed], clip: true, ...tag(`growth track ${t.seed}`) }),
    ),
  ];
  const over: Plot.Markish[] = tracks.map((t) =>
    Plot.text([t.points[0]!], { x: 'z', y: 'logM', text: () => `${t.seed} seed 10${superscript(Math.round(t.logMseed))} M☉`, textAnchor: 'start', dx: 4, dy: 14, fill: trackColour[t.seed], stroke: 'white', strokeWidth: 3, fontSize: 11, ...tag('growth track label') }),
  );
  const legend: LegendItem[] = tracks.map((t) => ({
    label: `Eddington-limited growth from a ${t.seed} seed (${t.seed === 'light' ? s.lightSeedMsun : s.heavySeedMsun} M☉ at z = ${s.zSeed})`,
    symbol: LEGEND_LINE,
    stroke: trackColour[t.seed],
    strokeWidth: 1.8,
    strokeDasharray: trackDash[t.seed],
  }));
  const shown = new Set(points.filter((p) => p.role !== 'extra').map((p) => p.id)).size;
  return renderScatter(
    {
      points,
      xDomain,
      yDomain,
      xLabel: 'Redshift z',
      yLabel: 'log M_BH / M☉',
      x: { reverse: true },
      marginTop: 46,
      under,
      over,
      legend,
      caption: [
        `Black-hole mass against redshift; top axis: age of the universe (${cosmology.params.name}).`,
        `Lines: continuous growth at the Eddington limit (λ = 1, duty cycle 1, radiative efficiency ε = ${s.efficiency}) from seeds at z = ${s.zSeed}; slower or intermittent growth lies below them.`,
        CAVEATS.mass,
        CAVEATS.bars,
        CAVEATS.limits,
        countNote(shown, unplaced, 'a black-hole mass'),
      ].join(' '),
      ariaDescription: 'Scatter plot of log black-hole mass against redshift with the age of the universe on the top axis and growth tracks from light and heavy seeds.',
      formatX: (z) => formatValue('z', z),
    },
    options,
  );
}
