/**
 * The forward physics of the demo population: from a black-hole mass and an Eddington ratio
 * to the luminosities, line widths and observed fluxes a spectroscopic survey would report,
 * by inverting the cited calibrations in demoRelations.ts. Everything is deterministic; the
 * noise is added elsewhere.
 */
import {
  BC3000,
  BC5100,
  CALZETTI00,
  CASE_B_BALMER,
  EDDINGTON_PER_MSUN,
  GH05_FWHM_HBETA,
  GH05_HALPHA_L5100,
  REST_WAVELENGTH_A,
  RV15_AGN_LOCAL,
  RV15_HALPHA,
  S11_MGII,
  VP06_HBETA,
  calzettiK,
} from './demoRelations.ts';
import { fluxFromLuminosity } from './demoCosmology.ts';

/** Intrinsic (de-magnified, dust-free) luminosities of one AGN, erg s^-1. */
export interface IntrinsicLuminosities {
  lbol: number;
  l5100: number;
  l3000: number;
  lHalpha: number;
  lHbeta: number;
}

/**
 * Luminosities implied by a mass and an Eddington ratio: L_bol = λ L_Edd,
 * λL5100 = L_bol / BC5100, λL3000 = L_bol / BC3000, L_Hα from Greene & Ho 2005 eq. 1, L_Hβ = L_Hα / 2.86 (case B).
 * @param logMbh log10 black-hole mass, M_sun
 * @param logEddRatio log10 Eddington ratio
 */
export function intrinsicLuminosities(logMbh: number, logEddRatio: number): IntrinsicLuminosities {
  const lbol = 10 ** (logMbh + logEddRatio) * EDDINGTON_PER_MSUN.valueErgS;
  const l5100 = lbol / BC5100.value;
  const g = GH05_HALPHA_L5100;
  const lHalpha = g.normErgS * (l5100 / g.l5100PivotErgS) ** g.slope;
  return { lbol, l5100, l3000: lbol / BC3000.value, lHalpha, lHbeta: lHalpha / CASE_B_BALMER.value };
}

/**
 * Broad-Hα FWHM that gives `logMbh` with the Reines & Volonteri 2015 Hα calibration.
 * @param logMbh log10 mass, M_sun
 * @param lHalpha intrinsic broad Hα luminosity, erg s^-1
 * @returns FWHM, km s^-1
 */
export function fwhmHalphaForMass(logMbh: number, lHalpha: number): number {
  const c = RV15_HALPHA;
  const logW = (logMbh - Math.log10(c.epsilon) - c.a - c.b * Math.log10(lHalpha / c.lumPivotErgS)) / c.c;
  return c.fwhmPivotKms * 10 ** logW;
}

/**
 * Broad-Hβ FWHM that gives `logMbh` with the Vestergaard & Peterson 2006 Hβ calibration.
 * @param logMbh log10 mass, M_sun
 * @param l5100 intrinsic λL5100, erg s^-1
 * @returns FWHM, km s^-1
 */
export function fwhmHbetaForMass(logMbh: number, l5100: number): number {
  const c = VP06_HBETA;
  const logW = (logMbh - c.a - c.b * Math.log10(l5100 / c.lumPivotErgS)) / c.c;
  return c.fwhmPivotKms * 10 ** logW;
}

/**
 * Mg II FWHM that gives `logMbh` with the Shen et al. 2011 Mg II calibration.
 * @param logMbh log10 mass, M_sun
 * @param l3000 intrinsic λL3000, erg s^-1
 * @returns FWHM, km s^-1
 */
export function fwhmMgiiForMass(logMbh: number, l3000: number): number {
  const c = S11_MGII;
  const logW = (logMbh - c.a - c.b * Math.log10(l3000 / c.lumPivotErgS)) / c.c;
  return c.fwhmPivotKms * 10 ** logW;
}

/**
 * FWHM of the line an object's mass is measured from, by inverting that line's calibration.
 * @param line 'halpha' (RV15), 'hbeta' (VP06 with λL5100) or 'mgii' (S11 with λL3000)
 * @returns km s^-1
 */
export function fwhmForMass(line: 'halpha' | 'hbeta' | 'mgii', logMbh: number, lum: IntrinsicLuminosities): number {
  if (line === 'halpha') return fwhmHalphaForMass(logMbh, lum.lHalpha);
  return line === 'hbeta' ? fwhmHbetaForMass(logMbh, lum.l5100) : fwhmMgiiForMass(logMbh, lum.l3000);
}

/**
 * Hβ width expected from the Hα width (Greene & Ho 2005 eq. 3).
 * @param fwhmHalphaKms km s^-1
 * @returns km s^-1
 */
export function fwhmHbetaFromHalpha(fwhmHalphaKms: number): number {
  const g = GH05_FWHM_HBETA;
  return g.normKms * (fwhmHalphaKms / g.fwhmPivotKms) ** g.slope;
}

/**
 * Host stellar mass that puts `logMbh` at `deltaLocal` dex above the RV15 local AGN relation.
 * @returns log10 M*, M_sun
 */
export function logMstarForOffset(logMbh: number, deltaLocal: number): number {
  const r = RV15_AGN_LOCAL;
  return Math.log10(r.mstarPivotMsun) + (logMbh - deltaLocal - r.alpha) / r.beta;
}

/** Calzetti et al. 2000 attenuation at Hα and Hβ per unit E(B−V). */
export const K_HALPHA = calzettiK(REST_WAVELENGTH_A.halpha / 1e4);
export const K_HBETA = calzettiK(REST_WAVELENGTH_A.hbeta / 1e4);
export const DUST_CURVE_REFERENCE = CALZETTI00.reference;

/**
 * Observed broad Hα/Hβ for a colour excess: 2.86 × 10^(0.4 E (k_Hβ − k_Hα)).
 * @param ebv E(B−V) of the broad-line region, mag
 */
export function balmerDecrementForEbv(ebv: number): number {
  return CASE_B_BALMER.value * 10 ** (0.4 * ebv * (K_HBETA - K_HALPHA));
}

/** Line fluxes and continuum as observed (magnified, attenuated), cgs. */
export interface ObservedLines {
  fluxHalphaCgs: number;
  fluxHbetaCgs: number;
  /** Observed λL5100 and λL3000 (before magnification correction), erg s^-1. Dust-free by construction. */
  lamL5100ErgS: number;
  lamL3000ErgS: number;
}

/**
 * What a telescope would see from intrinsic luminosities at redshift z.
 * @param lum intrinsic luminosities
 * @param z redshift
 * @param mu magnification (1 when not lensed)
 * @param ebv colour excess of the broad lines (0 when dust-free), mag
 */
export function observeLines(lum: IntrinsicLuminosities, z: number, mu: number, ebv: number): ObservedLines {
  const aHalpha = K_HALPHA * ebv;
  const aHbeta = K_HBETA * ebv;
  return {
    fluxHalphaCgs: mu * fluxFromLuminosity(lum.lHalpha, z) * 10 ** (-0.4 * aHalpha),
    fluxHbetaCgs: mu * fluxFromLuminosity(lum.lHbeta, z) * 10 ** (-0.4 * aHbeta),
    lamL5100ErgS: mu * lum.l5100,
    lamL3000ErgS: mu * lum.l3000,
  };
}
