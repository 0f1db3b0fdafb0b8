import { describe, it, expect } from 'vitest';
import { CALZETTI00, calzetti00K } from '../../../src/core/dust/calzetti00.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('Calzetti et al. 2000 curve', () => {
  it('reproduces k(Hα) and k(Hβ) of published-checks.md at the air wavelengths 6562.8 and 4861.3 Å', () => {
    // The check values reproduce with air wavelengths (vacuum 6564.61/4862.68 give 3.3248/4.5965).
    // published-checks.md, "computed" from Calzetti et al. 2000 eq. 4; 4 decimals given → atol 1e-4.
    expectClose(calzetti00K(6562.8), 3.3259, { atol: 1e-4, source: 'published-checks.md (computed, Calzetti 2000 eq. 4)' });
    expectClose(calzetti00K(4861.3), 4.5978, { atol: 1e-4, source: 'published-checks.md (computed, Calzetti 2000 eq. 4)' });
  });

  it('evaluates each piece of eq. 4 by hand at 0.3 µm and 1.0 µm', () => {
    // Hand evaluation of Calzetti et al. 2000 eq. 4 (computed with the formula, not the code).
    const short = 2.659 * (-2.156 + 1.509 / 0.3 - 0.198 / 0.09 + 0.011 / 0.027) + 4.05;
    const long = 2.659 * (-1.857 + 1.04 / 1.0) + 4.05;
    expectClose(calzetti00K(3000), short, { rtol: 1e-12, source: 'computed from Calzetti 2000 eq. 4' });
    expectClose(calzetti00K(10000), long, { rtol: 1e-12, source: 'computed from Calzetti 2000 eq. 4' });
  });

  it('gives about R_V = 4.05 at V (5500 Å), as the curve is normalised to', () => {
    // Calzetti 2000: k'(V) ≈ R'_V by construction; the polynomial gives 4.048 (computed), so atol 0.01.
    expectClose(calzetti00K(5500), CALZETTI00.rv, { atol: 0.01, source: 'Calzetti 2000 eq. 4–5 normalisation' });
  });

  it('has only the small published step (about 0.025) where the two pieces meet at 0.63 µm', () => {
    const step = Math.abs(calzetti00K(6299.999) - calzetti00K(6300));
    expect(step).toBeGreaterThan(0.02); // computed: the printed pieces differ by 0.0251 at 0.63 µm
    expect(step).toBeLessThan(0.03);
  });

  it('rejects wavelengths outside 0.12–2.2 µm with a message naming the curve and the wavelength', () => {
    expect(() => calzetti00K(1000)).toThrow(/calzetti00.*1000 Å/);
    expect(() => calzetti00K(30000)).toThrow(RangeError);
  });
});
