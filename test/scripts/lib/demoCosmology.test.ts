import { describe, expect, it } from 'vitest';
import { fluxFromLuminosity, luminosityDistanceMpc, luminosityFromFlux } from '../../../scripts/lib/demoCosmology.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('demo generator Planck18 luminosity distance', () => {
  // Computed with astropy 5.2.1's Planck18 (photons and massive neutrinos included), as listed in
  // shared/reference/published-checks.md. Given to 0.01 Mpc, i.e. 7 significant digits: rtol 1e-6.
  const ASTROPY_PLANCK18_DL_MPC: ReadonlyArray<[number, number]> = [
    [1, 6791.27],
    [2, 15924.57],
    [3, 26016.02],
    [5, 47677.76],
    [8, 82187.08],
    [10, 105999.14],
  ];

  for (const [z, dl] of ASTROPY_PLANCK18_DL_MPC) {
    it(`matches astropy's Planck18 at z = ${z}`, () => {
      expectClose(luminosityDistanceMpc(z), dl, { rtol: 1e-6, source: "computed with astropy 5.2.1 Planck18 (published-checks.md)" });
    });
  }

  it('is zero at z = 0', () => {
    expect(luminosityDistanceMpc(0)).toBe(0);
  });

  it('rejects a negative redshift with a message naming it', () => {
    expect(() => luminosityDistanceMpc(-1)).toThrow(/redshift must be ≥ 0, got -1/);
  });

  it('turns a luminosity into a flux and back', () => {
    const f = fluxFromLuminosity(1e42, 6);
    // Round trip of two exact operations: only floating-point rounding (common practice, no source).
    expectClose(luminosityFromFlux(f, 6), 1e42, { rtol: 1e-12, source: 'round trip, common practice' });
  });

  it('gives about 3.7e-18 erg/s/cm2 for 1e42 erg/s at z = 5', () => {
    // 1e42 / (4π (47677.76 Mpc × 3.0857e24 cm/Mpc)²) = 3.6767e-18 (computed with Python from the
    // astropy distance above); 5 digits: rtol 1e-4.
    expectClose(fluxFromLuminosity(1e42, 5), 3.6767e-18, { rtol: 1e-4, source: 'computed from the astropy Planck18 D_L at z = 5' });
  });
});
