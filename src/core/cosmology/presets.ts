import type { CosmologyId } from '../derive/types.ts';
import type { CosmologyParams } from './cosmologyParams.ts';

/** Published parameter sets, keyed by the `CosmologyId`s of the derivation settings. All are flat. */
export const COSMOLOGY_PRESETS: Readonly<Record<CosmologyId, CosmologyParams>> = {
  planck18: {
    name: 'Planck18',
    H0: 67.66,
    Om0: 0.30966,
    Ob0: 0.04897,
    Tcmb0: 2.7255,
    Neff: 3.046,
    mNuEv: [0, 0, 0.06],
    reference:
      'Planck Collaboration 2020, A&A 641, A6 (Planck 2018 VI), Table 2, TT,TE,EE+lowE+lensing+BAO; as astropy Planck18',
  },
  planck15: {
    name: 'Planck15',
    H0: 67.74,
    Om0: 0.3075,
    Ob0: 0.0486,
    Tcmb0: 2.7255,
    Neff: 3.046,
    mNuEv: [0, 0, 0.06],
    reference: 'Planck Collaboration 2016, A&A 594, A13 (Planck 2015 XIII), Table 4, last column; as astropy Planck15',
  },
  wmap9: {
    name: 'WMAP9',
    H0: 69.32,
    Om0: 0.2865,
    Ob0: 0.04628,
    Tcmb0: 2.725,
    Neff: 3.04,
    mNuEv: [0, 0, 0],
    reference: 'Hinshaw et al. 2013, ApJS 208, 19 (WMAP nine-year); as astropy WMAP9',
  },
  flat70: {
    name: 'flat70',
    H0: 70,
    Om0: 0.3,
    Tcmb0: 0,
    Neff: 3.04,
    reference: 'Common practice, no source: flat, H0 = 70 km/s/Mpc, Ωm = 0.3, ΩΛ = 0.7, no radiation',
  },
};
