import { describe, expect, it } from 'vitest';
import { readingsTable } from '../../../src/catalog/cli/readingsTable.ts';
import type { ReadingSummary, SummaryFraction } from '../../../src/core/readings/readingSummary.ts';

const frac = (k: number, n: number): SummaryFraction => ({ k, n, fraction: n > 0 ? k / n : null, lo: null, hi: null });
const summary = (reading: string, over: SummaryFraction, median: number | null): ReadingSummary => ({
  reading,
  objects: 12,
  superEddington: frac(3, 10),
  overMassive: over,
  needsSuperEddingtonLight: frac(1234, 2000),
  medianLogMbh: median,
  medianLogEddRatio: null,
});

describe('readingsTable', () => {
  const lines = readingsTable([summary('standard', frac(7, 8), 7.046), summary('scattering_core', frac(0, 0), null)], 100);

  it('writes one aligned line per reading under a header, with the counts, percentages and the median mass', () => {
    expect(lines[1]).toMatch(/^ {2}reading +super-Eddington +> 1 dex above local +λ > 1 from a 100 M☉ seed +median log M_BH$/);
    expect(lines[2]).toMatch(/^ {2}standard +3 of 10 \(30 %\) +7 of 8 \(88 %\) +1,234 of 2,000 \(62 %\) +7\.05$/);
    // Columns start at the same place on every line.
    const at = (s: string, x: string) => s.indexOf(x);
    expect(at(lines[2]!, '3 of 10')).toBe(at(lines[1]!, 'super-Eddington'));
    expect(at(lines[3]!, '3 of 10')).toBe(at(lines[1]!, 'super-Eddington'));
  });

  it('says so when no object has the quantity, and writes a dash for a missing median', () => {
    expect(lines[3]).toMatch(/^ {2}scattering_core +3 of 10 \(30 %\) +none with it +1,234 of 2,000 \(62 %\) +—$/);
  });

  it('states the definition above and the systematic uncertainty of virial masses below', () => {
    expect(lines[0]).toContain('P(λ_Edd > 1) > 0.84');
    expect(lines.at(-1)).toContain('0.3–0.5 dex systematic uncertainty');
  });

  it('writes nothing without readings', () => {
    expect(readingsTable([], 100)).toEqual([]);
  });
});
