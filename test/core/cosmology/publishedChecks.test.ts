import { describe, it } from 'vitest';
import { expectClose } from '../../helpers/expectClose.ts';
import { getCosmology } from '../../../src/core/cosmology/index.ts';

// Values from ../shared/reference/published-checks.md. The "computed" ones were computed with
// astropy 5.2.1's Planck18 (photons and massive neutrinos included) and are quoted there to
// the digits below; each tolerance is half a unit in the last quoted digit.
const planck18 = getCosmology('planck18');

describe('Planck18 against published and reference values', () => {
  it('gives an age today within the Planck 2018 VI 1σ range 13.787 ± 0.020 Gyr', () => {
    expectClose(planck18.ageGyr(0), 13.787, { atol: 0.02, source: 'Planck 2018 VI (A&A 641, A6) Table 2, published ± 1σ' });
  });

  it.each([
    [0, 13.78689],
    [5, 1.17071],
    [6, 0.92926],
    [7, 0.76058],
    [10, 0.47141],
    [20, 0.17811],
  ])('gives the age at z = %d as astropy 5.2.1 (%f Gyr)', (z, expected) => {
    expectClose(planck18.ageGyr(z), expected, { atol: 5e-6, source: 'computed with astropy 5.2.1 Planck18 (published-checks.md), 5 decimals' });
  });

  it.each([
    [1, 6791.27],
    [2, 15924.57],
    [3, 26016.02],
    [5, 47677.76],
    [8, 82187.08],
    [10, 105999.14],
  ])('gives the luminosity distance at z = %d as astropy 5.2.1 (%f Mpc)', (z, expected) => {
    expectClose(planck18.luminosityDistanceMpc(z), expected, {
      atol: 0.005,
      source: 'computed with astropy 5.2.1 Planck18 (published-checks.md), 2 decimals',
    });
  });

  it('gives the comoving distance at z = 1 as astropy 5.2.1 (3395.63 Mpc)', () => {
    expectClose(planck18.comovingDistanceMpc(1), 3395.63, { atol: 0.005, source: 'computed with astropy Planck18 (published-checks.md), 2 decimals' });
  });

  it('puts z ≈ 11 at about 3 % of the present age (about 0.4 Gyr)', () => {
    // Common practice, no source: a rule of thumb, so only a loose 20 % check.
    expectClose(planck18.ageGyr(11), 0.4, { rtol: 0.2, source: 'common practice, no source (published-checks.md)' });
    expectClose(planck18.ageGyr(11) / planck18.ageGyr(0), 0.03, { rtol: 0.2, source: 'common practice, no source (published-checks.md)' });
  });
});
