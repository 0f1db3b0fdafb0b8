/**
 * Fitting function for the energy density of massive neutrinos relative to massless ones,
 * f(y) = (1 + (k y)^p)^(1/p), with y = m_ν c² / (k_B T_ν) scaled by a = 1/(1+z).
 */
import { pow } from '../math/index.ts';
export const KOMATSU11_NEUTRINO_FIT = {
  p: 1.83,
  /** 1/p as written in astropy. */
  invP: 0.54644808743,
  k: 0.3173,
  /** 7/8 (4/11)^(4/3): energy density of one massless neutrino species over that of photons. */
  perSpeciesOverPhotons: 0.22710731766,
  /** (4/11)^(1/3): T_ν / T_CMB after e+e− annihilation. */
  tnuOverTcmb: 0.7137658555036082,
  reference: 'Komatsu et al. 2011, ApJS 192, 18, eq. 26; constants as in astropy 5.2.1 FLRW.nu_relative_density',
} as const;

/** Neutrino content of a cosmology, as used by {@link neutrinoOverPhotonDensity}. */
export interface NeutrinoContent {
  /** Neff / floor(Neff): each species' share of Neff. */
  readonly neffPerSpecies: number;
  /** Number of massless species. */
  readonly nMassless: number;
  /** m_ν / (k_B T_ν0) of each massive species (dimensionless). */
  readonly nuY: readonly number[];
}

/**
 * Neutrino energy density over photon energy density at scale factor `a` (dimensionless,
 * 0 < a ≤ 1 or beyond), summing the fitting function over massive species and counting
 * massless ones as 1 each. Same as astropy's `nu_relative_density(1/a − 1)`.
 */
export function neutrinoOverPhotonDensity(nu: NeutrinoContent, a: number): number {
  const { p, invP, k, perSpeciesOverPhotons } = KOMATSU11_NEUTRINO_FIT;
  let sum = nu.nMassless;
  for (const y of nu.nuY) sum += pow(1 + pow(k * y * a, p), invP);
  return perSpeciesOverPhotons * nu.neffPerSpecies * sum;
}
