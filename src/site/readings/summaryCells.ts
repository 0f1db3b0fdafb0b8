/**
 * The texts of one row of the Readings page's summary table: each fraction with its count, its
 * 68 % interval and its shift from the standard reading; each median with its shift. The build
 * (src/components/ReadingsSummary.astro) and the page's own reading (mountReadingsPage.ts)
 * write their rows from it, so both read alike.
 */
import { formatFixed } from '../text/formatValue.ts';
import type { ReadingSummary, SummaryFraction } from '../../core/readings/readingSummary.ts';

/** The fractions of the summary, in the table's order. */
export const SUMMARY_FRACTIONS = ['superEddington', 'overMassive', 'needsSuperEddingtonLight'] as const;
/** The medians of the summary, in the table's order. */
export const SUMMARY_MEDIANS = ['medianLogMbh', 'medianLogEddRatio'] as const;

/** One fraction's cell: `value` (e.g. "70.4 %"), `count` ("(235 of 334)"), `interval` ("67.8 % – 72.8 %"), `shift` ("−68.9 pts" or ""). */
export interface FractionCell {
  value: string;
  count: string;
  interval: string;
  shift: string;
}

/** One median's cell: `value` ("7.05") and `shift` ("−2.04 dex" or ""). */
export interface MedianCell {
  value: string;
  shift: string;
}

const pct = (x: number | null) => (x === null ? '—' : `${(100 * x).toFixed(1)} %`);

/** A signed shift with a true minus sign, e.g. "+0.0 pts", "−2.04 dex". */
function shift(x: number | null, ref: number | null | undefined, digits: number, unit: string): string {
  if (x === null || ref === null || ref === undefined) return '';
  const d = x - ref;
  return `${d >= 0 ? '+' : '−'}${Math.abs(d).toFixed(digits)} ${unit}`;
}

/** The cell of fraction `f`; `ref`: the same fraction under the standard reading (no shift without it). */
export function fractionCell(f: SummaryFraction, ref?: SummaryFraction): FractionCell {
  return {
    value: pct(f.fraction),
    count: `(${f.k} of ${f.n})`,
    interval: f.lo === null || f.hi === null ? '' : `${pct(f.lo)} – ${pct(f.hi)}`,
    shift: ref && f.fraction !== null && ref.fraction !== null ? shift(100 * f.fraction, 100 * ref.fraction, 1, 'pts') : '',
  };
}

/** The cell of median `x` (log10), with its shift from `ref`. */
export function medianCell(x: number | null, ref?: number | null): MedianCell {
  return { value: x === null ? '—' : formatFixed(x, 2), shift: shift(x, ref, 2, 'dex') };
}

/** Every cell of `s`'s row; shifts from `standard` unless `s` is the standard reading itself. */
export function summaryRowCells(s: ReadingSummary, standard?: ReadingSummary): { fractions: Record<(typeof SUMMARY_FRACTIONS)[number], FractionCell>; medians: Record<(typeof SUMMARY_MEDIANS)[number], MedianCell> } {
  const ref = s.reading === 'standard' ? undefined : standard;
  return {
    fractions: Object.fromEntries(SUMMARY_FRACTIONS.map((k) => [k, fractionCell(s[k], ref?.[k])])) as Record<(typeof SUMMARY_FRACTIONS)[number], FractionCell>,
    medians: Object.fromEntries(SUMMARY_MEDIANS.map((k) => [k, medianCell(s[k], ref ? ref[k] : undefined)])) as Record<(typeof SUMMARY_MEDIANS)[number], MedianCell>,
  };
}
