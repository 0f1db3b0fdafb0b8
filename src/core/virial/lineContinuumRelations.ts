import { powerLawLogX, powerLawLogY, type PowerLawRelation } from './powerLawRelation.ts';

/** Greene & Ho 2005 (ApJ 630, 122) eq. 1: L_Hα = 5.25e42 (λL5100/1e44)^1.157 erg s⁻¹. */
export const GH05_LHALPHA_L5100: PowerLawRelation = {
  id: 'gh05_eq1',
  x: 'λL5100, erg s^-1',
  y: 'L(broad Hα), erg s^-1',
  norm: 5.25e42,
  pivot: 1e44,
  slope: 1.157,
  reference: 'Greene & Ho 2005, ApJ 630, 122, eq. 1',
  provenance: 'published',
};

/**
 * Greene & Ho 2005 eq. 2: L_Hβ = 1.425e42 (λL5100/1e44)^1.133 erg s⁻¹.
 * Transcribed from memory: confirm against the paper before relying on it.
 */
export const GH05_LHBETA_L5100: PowerLawRelation = {
  id: 'gh05_eq2',
  x: 'λL5100, erg s^-1',
  y: 'L(broad Hβ), erg s^-1',
  norm: 1.425e42,
  pivot: 1e44,
  slope: 1.133,
  reference: 'Greene & Ho 2005, ApJ 630, 122, eq. 2',
  provenance: 'from memory',
  notes: 'Coefficients from memory; confirm against the paper.',
};

/**
 * log10 broad-Hα luminosity expected from the continuum (GH05 eq. 1).
 * @param logL5100 - log10 λL5100, erg s⁻¹.
 * @returns log10 L(Hα), erg s⁻¹.
 */
export function logLHalphaFromLogL5100(logL5100: number): number {
  return powerLawLogY(GH05_LHALPHA_L5100, logL5100);
}

/**
 * log10 λL5100 from the broad-Hα luminosity (GH05 eq. 1 inverted), used for L_bol from Hα
 * and for Hβ/5100 calibrations when no continuum is measured (the AGN continuum of
 * high-redshift objects is often not separable from the host).
 * @param logLHalpha - log10 L(broad Hα), erg s⁻¹.
 * @returns log10 λL5100, erg s⁻¹.
 */
export function logL5100FromLogLHalpha(logLHalpha: number): number {
  return powerLawLogX(GH05_LHALPHA_L5100, logLHalpha);
}

/**
 * log10 broad-Hβ luminosity expected from the continuum (GH05 eq. 2, from memory).
 * @param logL5100 - log10 λL5100, erg s⁻¹.
 */
export function logLHbetaFromLogL5100(logL5100: number): number {
  return powerLawLogY(GH05_LHBETA_L5100, logL5100);
}

/**
 * log10 λL5100 from the broad-Hβ luminosity (GH05 eq. 2 inverted, from memory). For an
 * Hβ-only object without a continuum measurement; the caller should flag masses built on it.
 * @param logLHbeta - log10 L(broad Hβ), erg s⁻¹.
 */
export function logL5100FromLogLHbeta(logLHbeta: number): number {
  return powerLawLogX(GH05_LHBETA_L5100, logLHbeta);
}
