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

describe('CCM89 pieces at their edges', () => {
  // Cardelli, Clayton & Mathis 1989, ApJ 345, 245, evaluated by hand from the printed equations.
  const uv = (x: number) => {
    const d = x - 5.9;
    const fa = d > 0 ? -0.04473 * d ** 2 - 0.009779 * d ** 3 : 0;
    const fb = d > 0 ? 0.213 * d ** 2 + 0.1207 * d ** 3 : 0;
    return { a: 1.752 - 0.316 * x - 0.104 / ((x - 4.67) ** 2 + 0.341) + fa, b: -3.09 + 1.825 * x + 1.206 / ((x - 4.62) ** 2 + 0.263) + fb };
  };

  it('uses the infrared power law (eq. 2) below x = 1.1 µm⁻¹', () => {
    const p = 0.5 ** 1.61;
    expectClose(ccm89AB(0.5).a, 0.574 * p, { rtol: 1e-12, source: 'CCM89 eq. 2a' });
    expectClose(ccm89AB(0.5).b, -0.527 * p, { rtol: 1e-12, source: 'CCM89 eq. 2b' });
  });

  it('uses the optical polynomial (eq. 3) from x = 1.1 and the ultraviolet form (eq. 4) from x = 3.3 through x = 8', () => {
    const y = 1.1 - 1.82;
    const aOpt = 1 + 0.17699 * y - 0.50447 * y ** 2 - 0.02427 * y ** 3 + 0.72085 * y ** 4 + 0.01979 * y ** 5 - 0.7753 * y ** 6 + 0.32999 * y ** 7;
    expectClose(ccm89AB(1.1).a, aOpt, { rtol: 1e-12, source: 'CCM89 eq. 3a at x = 1.1' });
    for (const x of [3.3, 8]) {
      expectClose(ccm89AB(x).a, uv(x).a, { rtol: 1e-12, source: `CCM89 eq. 4a at x = ${x}` });
      expectClose(ccm89AB(x).b, uv(x).b, { rtol: 1e-12, source: `CCM89 eq. 4b at x = ${x}` });
    }
  });

  it('uses the far-ultraviolet cubics (eq. 5) above x = 8', () => {
    const u = 9 - 8;
    expectClose(ccm89AB(9).a, -1.073 - 0.628 * u + 0.137 * u ** 2 - 0.07 * u ** 3, { rtol: 1e-12, source: 'CCM89 eq. 5a' });
    expectClose(ccm89AB(9).b, 13.67 + 4.257 * u - 0.42 * u ** 2 + 0.374 * u ** 3, { rtol: 1e-12, source: 'CCM89 eq. 5b' });
  });
});
