import type { DensityBin } from '../../core/population/binnedDensity.ts';
import * as Plot from '@observablehq/plot';
import { LEGEND_LINE, LEGEND_OFFSET, LEGEND_ROW, legendMarks, legendRows, type LegendItem } from './legend.ts';
import { LIMIT_DOWN } from './limitSymbols.ts';
import { tag } from './markTag.ts';
import { PALETTE } from './palette.ts';
import type { ChartOptions } from './types.ts';

/** One bin of a binned space density in one redshift range (per comoving Mpc³ per dex; see the core's DensityBin). */
export interface DensityBinRow extends DensityBin {
  zLo: number;
  zHi: number;
}

/** Options of {@link spaceDensityFunction}. */
export interface SpaceDensityFunctionOptions extends ChartOptions {
  quantity: 'log_mbh' | 'log_lbol';
}

/** Colours and symbols of up to six redshift ranges, in order (never colour alone: each has its own symbol). */
export const Z_RANGE_STYLES = [
  { colour: '#2f6a86', symbol: 'circle' },
  { colour: '#c4621b', symbol: 'square' },
  { colour: '#6a4c93', symbol: 'diamond' },
  { colour: '#4f7f2a', symbol: 'triangle' },
  { colour: '#9a7410', symbol: 'cross' },
  { colour: '#b0226b', symbol: 'star' },
] as const;

const LABELS = { log_mbh: 'log M_BH / M☉', log_lbol: 'log L_bol / erg s⁻¹' } as const;
const zLabel = (r: { zLo: number; zHi: number }) => `${r.zLo} ≤ z < ${r.zHi}`;
const sci = (v: number): string => v.toExponential(1).replace('e+', 'e');

/**
 * A black-hole mass function or bolometric luminosity function (1/V_max, per comoving Mpc³ per dex, log axis) with
 * one series per redshift range, offset slightly in x so their bars stay apart: points at Φ, thin bars for the
 * Poisson 1σ interval of the bin's count (Gehrels 1986), wide pale bars for the 16th–84th percentiles over the Monte
 * Carlo redraws of each object's value, and a downward arrow at the upper limit of an empty bin.
 */
export function spaceDensityFunction(rows: readonly DensityBinRow[], options: SpaceDensityFunctionOptions): SVGSVGElement | HTMLElement {
  const width = options.width ?? 640;
  const height = options.height ?? 400;
  const ranges = [...new Map(rows.map((r) => [zLabel(r), r])).values()].sort((a, b) => a.zLo - b.zLo);
  const index = new Map(ranges.map((r, i) => [zLabel(r), i]));
  const style = (r: DensityBinRow) => Z_RANGE_STYLES[(index.get(zLabel(r)) ?? 0) % Z_RANGE_STYLES.length]!;
  const step = Math.min(...rows.map((r) => r.hi - r.lo), 1);
  const offset = (r: DensityBinRow) => ((index.get(zLabel(r)) ?? 0) - (ranges.length - 1) / 2) * ((0.5 * step) / Math.max(ranges.length, 1));
  const placed = rows.map((r) => ({ ...r, x: (r.lo + r.hi) / 2 + offset(r), colour: style(r).colour, symbol: style(r).symbol, label: zLabel(r) }));
  const counted = placed.filter((r) => r.count > 0 && r.phi > 0);
  const empty = placed.filter((r) => r.count === 0 && r.phiHi > 0);
  const spread = counted.filter((r) => r.phiP16 !== null && r.phiP84 !== null && r.phiP16 > 0 && r.phiP84 > 0);
  const ys = [...counted.flatMap((r) => [r.phi, r.phiLo, r.phiHi]), ...spread.flatMap((r) => [r.phiP16!, r.phiP84!]), ...empty.map((r) => r.phiHi)].filter((v) => v > 0);
  const yMin = ys.length ? Math.min(...ys) / 3 : 1e-7;
  const yMax = ys.length ? Math.max(...ys) * 2 : 1e-3;
  const xs = rows.flatMap((r) => [r.lo, r.hi]);
  const xDomain: [number, number] = xs.length ? [Math.min(...xs), Math.max(...xs)] : [0, 1];
  const legend: LegendItem[] = ranges.map((r, i) => {
    const s = Z_RANGE_STYLES[i % Z_RANGE_STYLES.length]!;
    return { label: zLabel(r), symbol: s.symbol, fill: s.colour, stroke: s.colour, r: 4 };
  });
  legend.push({ label: 'Poisson 1σ', symbol: LEGEND_LINE, stroke: PALETTE.ink, strokeWidth: 1 });
  legend.push({ label: 'Monte Carlo 16–84 %', symbol: LEGEND_LINE, stroke: PALETTE.guide, strokeWidth: 6 });
  const available = width - 16;
  const legendRowsNeeded = legendRows(legend, available);
  const what = options.quantity === 'log_mbh' ? 'Black-hole mass function' : 'Bolometric luminosity function';
  const hover = [
    ...counted.map((r) => ({ x: r.x, y: r.phi, text: `${r.label}, ${r.lo}–${r.hi}\n${r.count} objects\nΦ = ${sci(r.phi)} cMpc⁻³ dex⁻¹\nPoisson: ${sci(r.phiLo)} – ${sci(r.phiHi)}` })),
    ...empty.map((r) => ({ x: r.x, y: r.phiHi, text: `${r.label}, ${r.lo}–${r.hi}\nno objects\nΦ < ${sci(r.phiHi)} cMpc⁻³ dex⁻¹` })),
  ];
  return Plot.plot({
    document: options.document,
    width,
    height: height + legendRowsNeeded * LEGEND_ROW,
    marginLeft: 64,
    marginRight: 24,
    marginTop: 20,
    marginBottom: LEGEND_OFFSET + legendRowsNeeded * LEGEND_ROW,
    style: { color: PALETTE.ink, fontSize: '11px', background: 'white' },
    x: { domain: xDomain, label: LABELS[options.quantity], labelAnchor: 'center', labelArrow: 'none', labelOffset: 32 },
    y: { type: 'log', domain: [yMin, yMax], label: 'Φ / cMpc⁻³ dex⁻¹', labelAnchor: 'center', labelArrow: 'none', grid: true, tickFormat: (v: number) => (Number.isInteger(Math.log10(v)) ? `1e${Math.log10(v)}` : '') },
    title: options.title,
    caption: options.noCaption
      ? undefined
      : [
          `${what} per redshift range from 1/V_max (Schmidt 1968), per comoving Mpc³ per dex.`,
          'Thin bars: Poisson 1σ interval of each bin’s count (Gehrels 1986); wide pale bars: 16th–84th percentiles when each object’s value is redrawn from its own interval; arrows: upper limits of empty bins over the survey’s whole volume.',
          'Only objects the survey as described would have selected count; the survey’s incompleteness below its limits is not corrected beyond V_max.',
          options.quantity === 'log_mbh' ? 'Black-hole masses are single-epoch virial estimates (±0.3–0.5 dex systematic): the function shifts with them.' : 'L_bol comes from a bolometric correction, which adds its own systematic uncertainty.',
        ].join(' '),
    ariaDescription: `${what} with Poisson and Monte Carlo intervals, one series per redshift range.`,
    marks: [
      Plot.frame({ stroke: PALETTE.ink, strokeOpacity: 0.25 }),
      Plot.ruleX(spread, { x: 'x', y1: 'phiP16', y2: 'phiP84', stroke: 'colour', strokeWidth: 7, strokeOpacity: 0.25, ...tag('monte carlo spread') }),
      Plot.ruleX(counted, { x: 'x', y1: (r: DensityBinRow) => Math.max(r.phiLo, yMin), y2: 'phiHi', stroke: 'colour', strokeWidth: 1.2, ...tag('poisson interval') }),
      Plot.dot(counted, { x: 'x', y: 'phi', fill: 'colour', stroke: 'white', strokeWidth: 0.6, symbol: 'symbol', r: 4, ...tag('density bin') }),
      Plot.dot(empty, { x: 'x', y: 'phiHi', stroke: 'colour', fill: 'none', strokeWidth: 1.2, symbol: LIMIT_DOWN, r: 4.5, ...tag('empty bin upper limit') }),
      ...legendMarks(legend, available, 8 - 64),
      Plot.tip(hover, Plot.pointer({ x: 'x', y: 'y', title: 'text', ...tag('hover') })),
    ],
  });
}
