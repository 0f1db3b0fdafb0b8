import { describe, it, expect } from 'vitest';
import { getCalibration } from '../../../src/core/virial/calibrations.ts';
import { virialLogMass } from '../../../src/core/virial/virialCalibration.ts';
import { logLbolFromHalpha } from '../../../src/core/bolometric/logLbolFromHalpha.ts';
import { logEddingtonRatio } from '../../../src/core/eddington/eddingtonLuminosity.ts';
import { L_EDD_PER_MSUN_HARIKANE } from '../../../src/core/constants/eddington.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const lg = Math.log10;

describe('Matthee et al. 2024 broad-Hα objects (Reines & Volonteri 2015, ε = 1.075)', () => {
  const rv15 = getCalibration('rv15_halpha');
  // Matthee et al. 2024 (ApJ 963, 129), table values as transcribed in published-checks.md.
  // Masses are published to 0.01 dex → atol 0.005.
  it('gives log M = 7.58 for GOODS-N-4014 (L_Hα = 4.6e42, FWHM = 2103 km/s)', () => {
    expectClose(virialLogMass(rv15, lg(4.6e42), lg(2103)), 7.58, { atol: 0.005, source: 'Matthee et al. 2024 (published-checks.md)' });
  });

  it('gives log M = 6.91 for J0148-12884 (L_Hα = 2.3e42, FWHM = 1166 km/s)', () => {
    expectClose(virialLogMass(rv15, lg(2.3e42), lg(1166)), 6.91, { atol: 0.005, source: 'Matthee et al. 2024 (published-checks.md)' });
  });

  it('needs ε = 1.075: with ε = 1 GOODS-N-4014 comes out 0.03 dex low and misses 7.58', () => {
    // published-checks.md: "With ε = 1 published high-redshift masses come out 0.03 dex low".
    const eps1 = virialLogMass({ ...rv15, logEps: 0 }, lg(4.6e42), lg(2103));
    expectClose(7.58 - eps1, 0.03, { atol: 0.005, source: 'published-checks.md' });
    expect(Math.abs(eps1 - 7.58)).toBeGreaterThan(0.005);
  });

  it('gives L_bol ≈ 9.3e44 erg/s for GOODS-N-4014 via Greene & Ho 2005 eq. 1 and BC5100 = 10.33', () => {
    // Matthee et al. 2024: L_bol = 9.3e44 (published, 2 digits: ±0.54 %). From the rounded input
    // L_Hα = 4.6e42 (2 digits: ±1.1 %, i.e. ±0.94 % in L_bol) the formula gives 9.22e44; rtol 0.015 is the
    // sum of the two roundings. The published value implies L_Hα ≈ 4.65e42 before rounding.
    expectClose(10 ** logLbolFromHalpha(lg(4.6e42)), 9.3e44, { rtol: 0.015, source: 'Matthee et al. 2024 (published-checks.md)' });
  });
});

describe('Harikane et al. 2023 broad-Hα objects (Greene & Ho 2005 eq. 6)', () => {
  const gh05 = getCalibration('gh05_halpha');
  // Harikane et al. 2023 (ApJ 959, 39), as transcribed in published-checks.md; masses to 2 digits →
  // atol of half the last digit.
  it('gives M = 3.2e7 M_sun for CEERS-01244 (L_Hα = 7.7e42, FWHM = 2228 km/s)', () => {
    expectClose(10 ** virialLogMass(gh05, lg(7.7e42), lg(2228)), 3.2e7, { atol: 0.05e7, source: 'Harikane et al. 2023 (published-checks.md)' });
  });

  it('gives M = 2.3e6 M_sun for GLASS-160133 (L_Hα = 1.2e42, FWHM = 1028 km/s)', () => {
    expectClose(10 ** virialLogMass(gh05, lg(1.2e42), lg(1028)), 2.3e6, { atol: 0.05e6, source: 'Harikane et al. 2023 (published-checks.md)' });
  });

  it('gives λ_Edd = 3.68 for GLASS-160133 from L_bol = 1.1e45, their M = 2.3e6 and 1.3e38', () => {
    // Harikane et al. 2023 (published-checks.md): 3.68 follows from the rounded published mass 2.3e6
    // (the unrounded 2.34e6 gives 3.61); 3 digits → atol 0.005.
    expectClose(10 ** logEddingtonRatio(lg(1.1e45), lg(2.3e6), L_EDD_PER_MSUN_HARIKANE), 3.68, {
      atol: 0.005, source: 'Harikane et al. 2023 (published-checks.md)',
    });
  });
});
