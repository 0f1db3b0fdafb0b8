import { describe, it, expect } from 'vitest';
import { ccm89AB, ccm89K } from '../../../src/core/dust/ccm89.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('Cardelli, Clayton & Mathis 1989 curve', () => {
  it('reproduces k(Hα) and k(Hβ) of published-checks.md at the air wavelengths 6562.8 and 4861.3 Å', () => {
    // published-checks.md (computed, CCM89 eq. 3, R_V = 3.1); reproduced with air wavelengths; atol 1e-4 (4 decimals).
    expectClose(ccm89K(6562.8), 2.5351, { atol: 1e-4, source: 'published-checks.md (computed, CCM89 R_V = 3.1)' });
    expectClose(ccm89K(4861.3), 3.6089, { atol: 1e-4, source: 'published-checks.md (computed, CCM89 R_V = 3.1)' });
  });

  it('returns exactly R_V at x = 1.82 µm⁻¹, where eq. 3 has a = 1 and b = 0', () => {
    expectClose(ccm89K(1e4 / 1.82), 3.1, { rtol: 1e-12, source: 'CCM89 eq. 3 at y = 0 (a = 1, b = 0)' });
  });

  it('gives k(B) − k(V) ≈ 1 between 4400 and 5500 Å, the definition of E(B−V)', () => {
    // Common practice, no source: effective B/V wavelengths 4400/5500 Å; 0.02 allows for band-averaging.
    expectClose(ccm89K(4400) - ccm89K(5500), 1, { atol: 0.02, source: 'definition of E(B−V); common practice' });
  });

  it('joins its IR, optical, UV and far-UV pieces without large jumps', () => {
    for (const x of [1.1, 3.3, 8]) {
      const lo = ccm89AB(x - 1e-9);
      const hi = ccm89AB(x + 1e-9);
      expect(Math.abs(lo.a * 3.1 + lo.b - (hi.a * 3.1 + hi.b)), `jump at x = ${x}`).toBeLessThan(0.1);
    }
  });

  it('peaks in the 2175 Å bump between 2100 and 2250 Å', () => {
    const k2175 = ccm89K(2175);
    expect(k2175).toBeGreaterThan(ccm89K(2500));
    expect(k2175).toBeGreaterThan(ccm89K(1900));
  });

  it('gives A(λ)/A(V) ≈ 3.19 at the bump centre x = 4.6 µm⁻¹ (hand evaluation of eq. 4)', () => {
    const x = 4.6;
    const a = 1.752 - 0.316 * x - 0.104 / ((x - 4.67) ** 2 + 0.341);
    const b = -3.09 + 1.825 * x + 1.206 / ((x - 4.62) ** 2 + 0.263);
    expectClose(ccm89K(1e4 / x) / 3.1, a + b / 3.1, { rtol: 1e-12, source: 'computed from CCM89 eq. 4' });
  });

  it('rejects wavelengths outside 0.1–3.33 µm', () => {
    expect(() => ccm89K(900)).toThrow(/ccm89/);
    expect(() => ccm89K(40000)).toThrow(RangeError);
  });
});
