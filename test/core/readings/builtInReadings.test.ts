import { describe, expect, it } from 'vitest';
import {
  BUILT_IN_READINGS,
  DENSE_GAS_READING,
  SCATTERING_CORE_READING,
  SCATTERING_DEFLATION,
  SMALL_BOLOMETRIC_READING,
  STANDARD_READING,
  isIdentityReading,
} from '../../../src/core/readings/index.ts';
import { GREENE25_L5100_RATIO, YANAGISAWA26_LINE_FACTORS } from '../../../src/core/bolometric/smallCorrections.ts';

describe('the built-in readings', () => {
  it('are standard, scattering_core, dense_gas and small_bolometric, in that order, each with a premise and a reference', () => {
    expect(BUILT_IN_READINGS.map((r) => r.id)).toEqual(['standard', 'scattering_core', 'dense_gas', 'small_bolometric']);
    for (const r of BUILT_IN_READINGS) {
      expect(r.premise.length).toBeGreaterThan(20);
      expect(r.references.length).toBeGreaterThan(0);
    }
  });

  it('leave the standard reading as the run itself', () => {
    expect(isIdentityReading(STANDARD_READING)).toBe(true);
    for (const r of BUILT_IN_READINGS.slice(1)) expect(isIdentityReading(r)).toBe(false);
  });

  it('take L_bol/L5100 = 5 in the small bolometric reading', () => {
    // Greene et al. 2025, arXiv:2509.05434, abstract: L_bol/L5100 = 5.
    expect(GREENE25_L5100_RATIO.ratio).toBe(5);
    expect(SMALL_BOLOMETRIC_READING.bolometric).toMatchObject({ mode: 'l5100_ratio', ratio: 5 });
    expect(SMALL_BOLOMETRIC_READING.width.mode).toBe('measured');
  });

  it('lower the line-based L_bol by 40 for broad Hα and 10 for broad Hβ, and switch dust off, in the dense gas reading', () => {
    // Yanagisawa et al. 2026, arXiv:2606.09726, abstract: ~40 (Hα) and ~10 (Hβ).
    expect(YANAGISAWA26_LINE_FACTORS.halpha).toBe(40);
    expect(YANAGISAWA26_LINE_FACTORS.hbeta).toBe(10);
    expect(DENSE_GAS_READING.bolometric).toMatchObject({ mode: 'line_factors', halpha: 40, hbeta: 10 });
    // Torralba et al. 2025 (arXiv:2510.00103, abstract): Balmer ratios far above 2.86 need not mean dust.
    expect(DENSE_GAS_READING.dust).toBe('none');
  });

  it('take core widths in the scattering reading, deflating by at most 10 where none is measured', () => {
    // Brazzini et al. 2025, MNRAS Letters 544, L167, abstract: scattering would make masses "up to two
    // orders of magnitude smaller"; with FWHM exponent 2 that is a width factor of 10.
    expect(SCATTERING_DEFLATION.factor).toBe(10);
    expect(SCATTERING_DEFLATION.range).toEqual([1, 10]);
    expect(SCATTERING_CORE_READING.width).toMatchObject({ mode: 'core', fallbackDeflation: 10 });
  });
});
