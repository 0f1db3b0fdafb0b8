import { describe, it } from 'vitest';
import { expectClose } from '../../helpers/expectClose.ts';
import { KOMATSU11_NEUTRINO_FIT, neutrinoOverPhotonDensity } from '../../../src/core/cosmology/index.ts';

describe('massive-neutrino density', () => {
  const nu = { neffPerSpecies: 3.046 / 3, nMassless: 2, nuY: [357.91212097] };

  it('counts every species as relativistic at early times (a → 0)', () => {
    // 7/8 (4/11)^(4/3) Neff when all species are relativistic (standard result).
    expectClose(neutrinoOverPhotonDensity(nu, 1e-12), KOMATSU11_NEUTRINO_FIT.perSpeciesOverPhotons * 3.046, { rtol: 1e-12, source: 'relativistic limit' });
  });

  it('matches astropy nu_relative_density for Planck18 today', () => {
    // astropy 5.2.1: Planck18.nu_relative_density(0) = Onu0/Ogamma0 = 0.0014396743040845242/5.402015137139352e-05.
    expectClose(neutrinoOverPhotonDensity(nu, 1), 0.0014396743040845242 / 5.402015137139352e-5, {
      rtol: 1e-10,
      source: 'computed with astropy 5.2.1 (Planck18.Onu0 / Planck18.Ogamma0)',
    });
  });

  it('grows like the mass for a non-relativistic species: f → k·y (Komatsu et al. 2011 eq. 26 limit)', () => {
    const one = { neffPerSpecies: 1, nMassless: 0, nuY: [1e6] };
    expectClose(neutrinoOverPhotonDensity(one, 1), KOMATSU11_NEUTRINO_FIT.perSpeciesOverPhotons * KOMATSU11_NEUTRINO_FIT.k * 1e6, {
      rtol: 1e-6,
      source: 'large-y limit of (1 + (ky)^p)^(1/p)',
    });
  });
});
