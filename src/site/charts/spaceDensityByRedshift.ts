import * as Plot from '@observablehq/plot';
import type { PublishedDensity } from '../../core/population/publishedDensities.ts';
import { LEGEND_BAND, LEGEND_LINE, LEGEND_OFFSET, LEGEND_ROW, legendMarks, legendRows, type LegendItem } from './legend.ts';
import { LIMIT_DOWN } from './limitSymbols.ts';
import { tag } from './markTag.ts';
import { PALETTE } from './palette.ts';
import type { ChartOptions } from './types.ts';

/** The sample's total space density in one redshift range. */
export interface DensityTotalRow {
  zLo: number;
  zHi: number;
  count: number;
  /** Σ 1/V_max, comoving Mpc⁻³. */
  n: number;
  /** Poisson 1σ limits on it (Gehrels 1986); nHi null when unknown. */
  nLo: number;
  nHi: number | null;
}

/** Options of {@link spaceDensityByRedshift}. */
export interface SpaceDensityByRedshiftOptions extends ChartOptions {
  /** Published ranges drawn as bands over their redshift ranges. */
  published: readonly PublishedDensity[];
}

const BAND_COLOUR = '#9a7410';
const sci = (v: number): string => v.toExponential(1).replace('e+', 'e');

/**
 * The sample's total space density (Σ 1/V_max over every object the survey counts, comoving Mpc⁻³, log axis) per
 * redshift range, against published ranges drawn as bands: points at the range's centre with a horizontal bar over
 * the range and a vertical bar for the Poisson 1σ interval of the count; an empty range is an upper limit.
 */
export function spaceDensityByRedshift(rows: readonly DensityTotalRow[], options: SpaceDensityByRedshiftOptions): SVGSVGElement | HTMLElement {
  const width = options.width ?? 640;
  const height = options.height ?? 360;
  const placed = rows.map((r) => ({ ...r, z: (r.zLo + r.zHi) / 2 }));
  const counted = placed.filter((r) => r.count > 0 && r.n > 0);
  const empty = placed.filter((r) => r.count === 0 && r.nHi !== null && r.nHi > 0);
  const zMax = Math.max(...rows.map((r) => r.zHi), 5);
  const zMin = Math.min(...rows.map((r) => r.zLo), 4);
  const bands = options.published.map((p) => ({ ...p, z1: Math.max(p.zRange[0], zMin), z2: Math.min(p.zRange[1], zMax), lo: p.nCmpc3[0], hi: p.nCmpc3[1] })).filter((b) => b.z2 > b.z1);
  const ys = [...counted.flatMap((r) => [r.n, r.nLo, r.nHi ?? r.n]), ...empty.map((r) => r.nHi!), ...bands.flatMap((b) => [b.lo, b.hi])].filter((v) => v > 0);
  const yDomain: [number, number] = ys.length ? [Math.min(...ys) / 3, Math.max(...ys) * 3] : [1e-7, 1e-3];
  const legend: LegendItem[] = [
    { label: 'This catalog (Σ 1/V_max; Poisson 1σ)', symbol: 'circle', fill: PALETTE.population, stroke: PALETTE.population, r: 4 },
    ...bands.map((b) => ({ label: `Published: ${b.label}`, symbol: LEGEND_BAND, fill: BAND_COLOUR, fillOpacity: 0.25, stroke: BAND_COLOUR })),
  ];
  if (empty.length) legend.push({ label: 'Upper limit (no objects)', symbol: LEGEND_LINE, stroke: PALETTE.population });
  const available = width - 16;
  const rowsNeeded = legendRows(legend, available);
  const hover = [
    ...counted.map((r) => ({ x: r.z, y: r.n, text: `${r.zLo} ≤ z < ${r.zHi}\n${r.count} objects\nn = ${sci(r.n)} cMpc⁻³${r.nHi !== null ? `\nPoisson: ${sci(r.nLo)} – ${sci(r.nHi)}` : ''}` })),
    ...empty.map((r) => ({ x: r.z, y: r.nHi!, text: `${r.zLo} ≤ z < ${r.zHi}\nno objects\nn < ${sci(r.nHi!)} cMpc⁻³` })),
  ];
  return Plot.plot({
    document: options.document,
    width,
    height: height + rowsNeeded * LEGEND_ROW,
    marginLeft: 64,
    marginRight: 24,
    marginTop: 20,
    marginBottom: LEGEND_OFFSET + rowsNeeded * LEGEND_ROW,
    style: { color: PALETTE.ink, fontSize: '11px', background: 'white' },
    x: { domain: [zMin, zMax], label: 'Redshift z', labelAnchor: 'center', labelArrow: 'none', labelOffset: 32 },
    y: { type: 'log', domain: yDomain, label: 'n / cMpc⁻³', labelAnchor: 'center', labelArrow: 'none', grid: true, tickFormat: (v: number) => (Number.isInteger(Math.log10(v)) ? `1e${Math.log10(v)}` : '') },
    title: options.title,
    caption: options.noCaption
      ? undefined
      : [
          'Total space density of the objects the survey counts, per redshift range (Σ 1/V_max, Schmidt 1968), with the Poisson 1σ interval of the count (Gehrels 1986).',
          bands.length ? `Band: the published range (${bands.map((b) => `${b.reference}: ${sci(b.lo)}–${sci(b.hi)} cMpc⁻³`).join('; ')}), a total over all masses, so compare it with these totals rather than with the per-dex functions.` : '',
          'Densities count only what the survey as described would have selected.',
        ].filter(Boolean).join(' '),
    ariaDescription: 'Total space density per redshift range with its Poisson interval, against the published range.',
    marks: [
      Plot.frame({ stroke: PALETTE.ink, strokeOpacity: 0.25 }),
      Plot.rect(bands, { x1: 'z1', x2: 'z2', y1: 'lo', y2: 'hi', fill: BAND_COLOUR, fillOpacity: 0.18, stroke: BAND_COLOUR, strokeOpacity: 0.5, ...tag('published density band') }),
      Plot.ruleY(counted, { y: 'n', x1: 'zLo', x2: 'zHi', stroke: PALETTE.population, strokeWidth: 1.2, ...tag('redshift range') }),
      Plot.ruleX(counted.filter((r) => r.nHi !== null), { x: 'z', y1: (r: DensityTotalRow) => Math.max(r.nLo, yDomain[0]), y2: 'nHi', stroke: PALETTE.population, strokeWidth: 1.6, ...tag('poisson interval') }),
      Plot.dot(counted, { x: 'z', y: 'n', r: 4.5, fill: PALETTE.population, stroke: 'white', strokeWidth: 0.8, ...tag('total density') }),
      Plot.dot(empty, { x: 'z', y: 'nHi', r: 5, symbol: LIMIT_DOWN, stroke: PALETTE.population, fill: 'none', strokeWidth: 1.4, ...tag('upper limit') }),
      ...legendMarks(legend, available, 8 - 64),
      Plot.tip(hover, Plot.pointer({ x: 'x', y: 'y', title: 'text', ...tag('hover') })),
    ],
  });
}
