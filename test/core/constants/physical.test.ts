import { describe, expect, it } from 'vitest';
import { expectClose } from '../../helpers/expectClose.ts';
import { GYR_S, L_SUN_ERG_S, M_SUN_G, MPC_CM, PC_CM, PHYSICAL_CONSTANTS, YR_S } from '../../../src/core/constants/index.ts';

describe('physical constants', () => {
  it('give the solar mass as IAU 2015 nominal GM_sun over CODATA 2018 G', () => {
    // 1.98840987e33 g: GM_sun 1.3271244e20 m^3 s^-2 (IAU 2015 B3) / G 6.67430e-11 (CODATA 2018), computed;
    // astropy 5.2.1 constants.M_sun = 1.988409870698051e30 kg (same definition).
    expectClose(M_SUN_G, 1.988409870698051e33, { rtol: 1e-15, source: 'astropy 5.2.1 constants.M_sun (IAU 2015 B3 / CODATA 2018)' });
  });

  it('define the parsec from the au as in IAU 2015 Resolution B2', () => {
    // 1 pc = 3.0856775814913673e16 m (IAU 2015 B2: au × 648000/π; 17 significant digits quoted there).
    expectClose(PC_CM, 3.0856775814913673e18, { rtol: 1e-15, source: 'IAU 2015 Resolution B2' });
    expectClose(MPC_CM, 3.0856775814913673e24, { rtol: 1e-15, source: 'IAU 2015 Resolution B2' });
  });

  it('use the Julian year for yr and Gyr', () => {
    expect(YR_S).toBe(365.25 * 86400); // IAU Julian year, exact
    expect(GYR_S).toBe(1e9 * 365.25 * 86400);
  });

  it('take the nominal solar luminosity from IAU 2015 B3', () => {
    expect(L_SUN_ERG_S).toBe(3.828e33); // IAU 2015 B3: 3.828e26 W, exact nominal value
  });

  it('carry a reference on every record', () => {
    for (const [name, rec] of Object.entries(PHYSICAL_CONSTANTS)) {
      expect(rec.reference.length, name).toBeGreaterThan(10);
      expect(Number.isFinite(rec.value), name).toBe(true);
    }
  });
});
