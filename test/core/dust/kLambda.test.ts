import { describe, it, expect } from 'vitest';
import { attenuationMag, DUST_CURVES, getDustCurve, kLambda } from '../../../src/core/dust/kLambda.ts';
import { calzetti00K } from '../../../src/core/dust/calzetti00.ts';
import { ccm89K } from '../../../src/core/dust/ccm89.ts';
import { smcGordon03K } from '../../../src/core/dust/smcGordon03.ts';
import type { DustCurveId } from '../../../src/core/derive/types.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('kLambda and attenuationMag', () => {
  it('dispatches each id to its curve', () => {
    expect(kLambda('calzetti00', 5000)).toBe(calzetti00K(5000));
    expect(kLambda('ccm89', 5000)).toBe(ccm89K(5000));
    expect(kLambda('smc', 5000)).toBe(smcGordon03K(5000));
  });

  it('gives A_λ = A_V at λ = 5500 Å for the SMC curve, whose V anchor is there', () => {
    expectClose(attenuationMag('smc', 5500, 1.3), 1.3, { rtol: 1e-12, source: 'A_λ = A_V k/R_V with k(V) = R_V' });
  });

  it('scales linearly with A_V: A_λ = A_V k(λ)/R_V', () => {
    const k = kLambda('calzetti00', 2798.75);
    expectClose(attenuationMag('calzetti00', 2798.75, 0.8), (0.8 * k) / 4.05, { rtol: 1e-12, source: 'definition' });
    expect(attenuationMag('ccm89', 6564.61, 0)).toBe(0);
  });

  it('names an unknown curve id in its error', () => {
    expect(() => kLambda('lmc' as DustCurveId, 5000)).toThrow(/unknown dust curve 'lmc'/);
  });

  it('lists R_V 4.05, 3.1, 2.74 and a reference for every curve', () => {
    expect(getDustCurve('calzetti00').rv).toBe(4.05); // Calzetti et al. 2000 eq. 5
    expect(getDustCurve('ccm89').rv).toBe(3.1); // CCM89, diffuse ISM
    expect(getDustCurve('smc').rv).toBe(2.74); // Gordon et al. 2003 SMC bar (from memory)
    for (const c of Object.values(DUST_CURVES)) expect(c.reference.length).toBeGreaterThan(10);
  });
});

describe('dust curve ranges and errors', () => {
  it('accept both ends of the Calzetti et al. 2000 range, 0.12 and 2.20 µm', () => {
    // Calzetti et al. 2000 eq. 4, evaluated by hand.
    expectClose(kLambda('calzetti00', 1200), 2.659 * (-2.156 + 1.509 / 0.12 - 0.198 / 0.12 ** 2 + 0.011 / 0.12 ** 3) + 4.05, { rtol: 1e-12, source: 'Calzetti 2000 eq. 4 at 0.12 µm' });
    expectClose(kLambda('calzetti00', 22000), 2.659 * (-1.857 + 1.04 / 2.2) + 4.05, { rtol: 1e-12, source: 'Calzetti 2000 eq. 4 at 2.20 µm' });
  });

  it('list the known curves, comma-separated, for an unknown id', () => {
    expect(() => kLambda('lmc' as DustCurveId, 5000)).toThrow("unknown dust curve 'lmc' (known: calzetti00, ccm89, smc)");
  });
});
