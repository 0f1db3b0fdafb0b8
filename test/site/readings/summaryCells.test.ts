import { describe, expect, it } from 'vitest';
import type { ReadingSummary } from '../../../src/core/readings/readingSummary.ts';
import { summaryRowCells } from '../../../src/site/readings/summaryCells.ts';

const frac = (k: number, n: number, lo: number | null = null, hi: number | null = null) => ({ k, n, fraction: n ? k / n : null, lo, hi });

const standard: ReadingSummary = {
  reading: 'standard', objects: 400,
  superEddington: frac(0, 359, 0, 0.003), overMassive: frac(235, 334, 0.678, 0.728), needsSuperEddingtonLight: frac(59, 400, 0.131, 0.166),
  medianLogMbh: 7.05, medianLogEddRatio: -0.31,
};
const scattering: ReadingSummary = {
  reading: 'scattering_core', objects: 400,
  superEddington: frac(356, 359, 0.985, 0.995), overMassive: frac(5, 334, 0.01, 0.023), needsSuperEddingtonLight: frac(0, 0),
  medianLogMbh: 5.01, medianLogEddRatio: null,
};

describe('the cells of a row of the readings summary', () => {
  it('write each fraction with its count, its interval and its shift from the standard reading in points', () => {
    const { fractions } = summaryRowCells(scattering, standard);
    expect(fractions.superEddington).toEqual({ value: '99.2 %', count: '(356 of 359)', interval: '98.5 % – 99.5 %', shift: '+99.2 pts' });
    expect(fractions.overMassive.shift).toBe('−68.9 pts');
    // No objects with the quantity: no fraction, no interval, no shift.
    expect(fractions.needsSuperEddingtonLight).toEqual({ value: '—', count: '(0 of 0)', interval: '', shift: '' });
  });

  it('write each median with its shift in dex, with a true minus sign, and a dash for a missing one', () => {
    const { medians } = summaryRowCells(scattering, standard);
    expect(medians.medianLogMbh).toEqual({ value: '5.01', shift: '−2.04 dex' });
    expect(medians.medianLogEddRatio).toEqual({ value: '—', shift: '' });
  });

  it('give the standard reading no shifts, and a reading without a standard one none either', () => {
    const own = summaryRowCells(standard, standard);
    expect(own.fractions.overMassive.shift).toBe('');
    expect(own.medians.medianLogMbh).toEqual({ value: '7.05', shift: '' });
    expect(summaryRowCells(scattering).medians.medianLogMbh.shift).toBe('');
  });
});
