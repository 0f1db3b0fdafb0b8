import { L_EDD_PER_MSUN_CONVENTIONAL } from '../constants/eddington.ts';

/**
 * log10 Eddington luminosity, erg s⁻¹: log M + log10(perMsun).
 * @param logM - log10 black-hole mass, M_sun.
 * @param perMsun - Eddington luminosity per solar mass, erg s⁻¹ (default 1.26e38, Shen et al. 2011;
 *   see EDDINGTON_CONSTANTS for 1.2571e38 computed and 1.3e38).
 */
export function logEddingtonLuminosity(logM: number, perMsun: number = L_EDD_PER_MSUN_CONVENTIONAL): number {
  if (!(perMsun > 0)) throw new RangeError(`Eddington luminosity per solar mass must be > 0 erg/s, got ${perMsun}`);
  return logM + Math.log10(perMsun);
}

/**
 * log10 Eddington ratio λ_Edd = L_bol / L_Edd (dimensionless).
 * @param logLbol - log10 bolometric luminosity, erg s⁻¹.
 * @param logM - log10 black-hole mass, M_sun.
 * @param perMsun - Eddington luminosity per solar mass, erg s⁻¹ (default 1.26e38).
 */
export function logEddingtonRatio(logLbol: number, logM: number, perMsun: number = L_EDD_PER_MSUN_CONVENTIONAL): number {
  return logLbol - logEddingtonLuminosity(logM, perMsun);
}
