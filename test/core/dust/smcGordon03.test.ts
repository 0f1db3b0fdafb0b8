import { describe, it, expect } from 'vitest';
import { SMC_GORDON03, smcGordon03K } from '../../../src/core/dust/smcGordon03.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('Gordon et al. 2003 SMC-bar curve', () => {
  it('passes through its optical anchors: k(V) = R_V = 2.74 and k(B) = 1.374 R_V', () => {
    // Anchor values transcribed from memory of Gordon et al. 2003 Table 4 (confirm against the paper);
    // the spline must interpolate them exactly.
    expectClose(smcGordon03K(5500), 2.74, { rtol: 1e-12, source: 'Gordon 2003 R_V (from memory)' });
    expectClose(smcGordon03K(4400), 1.374 * 2.74, { rtol: 1e-12, source: 'Gordon 2003 Table 4 B anchor (from memory)' });
  });

  it('uses the FM90 form in the UV: hand evaluation at 1500 Å', () => {
    const x = 1e4 / 1500;
    const p = SMC_GORDON03.fm;
    const d = x - 5.9;
    const e = p.c1 + p.c2 * x + (p.c3 * x * x) / ((x * x - p.x0 ** 2) ** 2 + x * x * p.gamma ** 2) + p.c4 * (0.5392 * d * d + 0.05644 * d ** 3);
    expectClose(smcGordon03K(1500), e + 2.74, { rtol: 1e-12, source: 'computed from the FM90 form (Fitzpatrick & Massa 1990)' });
  });

  it('is continuous where the spline hands over to the FM form at 2700 Å', () => {
    expectClose(smcGordon03K(2700.0001), smcGordon03K(2699.9999), { atol: 1e-4, source: 'continuity by construction' });
  });

  it('rises monotonically from 3000 to 1200 Å (no 2175 Å bump in the SMC)', () => {
    let prev = smcGordon03K(3000);
    for (let lam = 2950; lam >= 1200; lam -= 50) {
      const k = smcGordon03K(lam);
      expect(k, `k(${lam})`).toBeGreaterThan(prev);
      prev = k;
    }
  });

  it('gives k(Hα) = 2.1649 and k(Hβ) = 3.2718 at the vacuum wavelengths (internal regression)', () => {
    // Internal regression: values of this implementation on first commit, not a published check.
    expectClose(smcGordon03K(6564.61), 2.1649, { atol: 1e-4, source: 'internal regression' });
    expectClose(smcGordon03K(4862.68), 3.2718, { atol: 1e-4, source: 'internal regression' });
  });
});

describe('Gordon et al. 2003 SMC curve at its ultraviolet cut', () => {
  it('uses the Fitzpatrick & Massa 1990 form from 2700 Å (x = 3.7037 µm⁻¹) on', () => {
    // FM90 with the Gordon et al. 2003 SMC bar parameters (c1 = −4.959, c2 = 2.264, c3 = 0.389, x0 = 4.6,
    // γ = 1.0, R_V = 2.74; from memory, as in src/core/dust): k = c1 + c2 x + c3 D(x) + R_V, no far-UV term below 5.9.
    const x = 1e4 / 2700;
    const drude = x ** 2 / ((x ** 2 - 4.6 ** 2) ** 2 + x ** 2 * 1.0 ** 2);
    expectClose(smcGordon03K(2700), -4.959 + 2.264 * x + 0.389 * drude + 2.74, { rtol: 1e-12, source: 'FM90 form, Gordon et al. 2003 SMC bar (from memory)' });
  });
});
