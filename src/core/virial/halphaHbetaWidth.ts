import { powerLawLogX, powerLawLogY, type PowerLawRelation } from './powerLawRelation.ts';
import { log10, pow } from '../math/index.ts';

/** Greene & Ho 2005 (ApJ 630, 122) eq. 3: FWHM_Hβ = 1.07e3 (FWHM_Hα/1e3)^1.03 km s⁻¹. */
export const GH05_FWHM_HBETA_HALPHA: PowerLawRelation = {
  id: 'gh05_eq3',
  x: 'FWHM(broad Hα), km s^-1',
  y: 'FWHM(broad Hβ), km s^-1',
  norm: 1.07e3,
  pivot: 1e3,
  slope: 1.03,
  reference: 'Greene & Ho 2005, ApJ 630, 122, eq. 3',
  provenance: 'published',
};

/**
 * Hβ FWHM expected from the Hα FWHM (GH05 eq. 3), km s⁻¹.
 * @param fwhmHalphaKms - broad Hα FWHM, km s⁻¹ (> 0).
 */
export function fwhmHbetaFromHalphaKms(fwhmHalphaKms: number): number {
  return pow(10, powerLawLogY(GH05_FWHM_HBETA_HALPHA, log10(fwhmHalphaKms)));
}

/**
 * Hα FWHM expected from the Hβ FWHM (GH05 eq. 3 inverted), km s⁻¹.
 * @param fwhmHbetaKms - broad Hβ FWHM, km s⁻¹ (> 0).
 */
export function fwhmHalphaFromHbetaKms(fwhmHbetaKms: number): number {
  return pow(10, powerLawLogX(GH05_FWHM_HBETA_HALPHA, log10(fwhmHbetaKms)));
}
