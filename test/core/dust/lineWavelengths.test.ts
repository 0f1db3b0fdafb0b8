import { describe, it, expect } from 'vitest';
import { LINE_WAVELENGTHS, lineWavelengthAngstrom } from '../../../src/core/dust/lineWavelengths.ts';
import { expectClose } from '../../helpers/expectClose.ts';

/** Vacuum → air, Morton 2000 (ApJS 130, 403) eq. 8 refractive index (from memory). */
function vacToAir(lam: number): number {
  const s2 = (1e4 / lam) ** 2;
  return lam / (1 + 8.34254e-5 + 2.406147e-2 / (130 - s2) + 1.5998e-4 / (38.9 - s2));
}

describe('broad-line wavelengths', () => {
  it('are vacuum values that convert to the usual air wavelengths of Hα and Hβ', () => {
    // Air Hα 6562.80, Hβ 4861.33 Å (common practice; NIST ASD, from memory); atol 0.05 Å covers the
    // spread of quoted air values and of the refractive-index formula.
    expectClose(vacToAir(LINE_WAVELENGTHS.halpha.vacuumAngstrom), 6562.8, { atol: 0.05, source: 'NIST air Hα (from memory)' });
    expectClose(vacToAir(LINE_WAVELENGTHS.hbeta.vacuumAngstrom), 4861.33, { atol: 0.05, source: 'NIST air Hβ (from memory)' });
  });

  it('put the doublets at their 2:1 weighted mean (C IV 1548.20/1550.77, Mg II 2796.35/2803.53 vacuum)', () => {
    // Doublet components: NIST ASD vacuum wavelengths, from memory; statistical weights 2:1. 2 decimals → atol 0.02.
    expectClose(lineWavelengthAngstrom('civ'), (2 * 1548.2 + 1550.77) / 3, { atol: 0.02, source: 'NIST (from memory), weighted mean' });
    expectClose(lineWavelengthAngstrom('mgii'), (2 * 2796.35 + 2803.53) / 3, { atol: 0.02, source: 'NIST (from memory), weighted mean' });
  });

  it('carry a reference for every line', () => {
    for (const w of Object.values(LINE_WAVELENGTHS)) expect(w.reference).toMatch(/Vanden Berk/);
  });
});
