import type { ReadingSummary, SummaryFraction } from '../../core/readings/readingSummary.ts';
import { formatCount } from './formatting.ts';

/** "k of n (p %)", or "none with it" when no object has the quantity. */
function fraction(f: SummaryFraction): string {
  if (f.n === 0 || f.fraction === null) return 'none with it';
  const pct = Math.round(f.fraction * 100);
  return `${formatCount(f.k)} of ${formatCount(f.n)} (${pct} %)`;
}

/**
 * The headline numbers of each reading as a plain-text table for the terminal: the fractions a
 * paper quotes (super-Eddington at P > 0.84, more than 1 dex above the local relation, needing
 * λ > 1 from a light seed) and the median log M_BH, one line per reading, with the caveat that
 * goes with them. Empty when there is no reading.
 * @param summaries - the readings' summaries, in the config's order.
 * @param lightSeedMsun - the light seed mass of the settings, M☉.
 */
export function readingsTable(summaries: readonly ReadingSummary[], lightSeedMsun: number): string[] {
  if (summaries.length === 0) return [];
  const header = ['reading', 'super-Eddington', '> 1 dex above local', `λ > 1 from a ${formatCount(lightSeedMsun)} M☉ seed`, 'median log M_BH'];
  const rows = summaries.map((s) => [
    s.reading,
    fraction(s.superEddington),
    fraction(s.overMassive),
    fraction(s.needsSuperEddingtonLight),
    s.medianLogMbh === null ? '—' : s.medianLogMbh.toFixed(2),
  ]);
  const widths = header.map((h, c) => Math.max(h.length, ...rows.map((r) => (r[c] as string).length)));
  const line = (cells: string[]) => `  ${cells.map((x, c) => x.padEnd(widths[c] as number)).join('   ')}`.trimEnd();
  return [
    'Under each reading (super-Eddington: P(λ_Edd > 1) > 0.84; fractions of the objects that have the quantity, upper-limit masses left out):',
    line(header),
    ...rows.map(line),
    '  Single-epoch virial masses carry 0.3–0.5 dex systematic uncertainty, and the calibrations are local ones extrapolated.',
  ];
}
