/**
 * Published relations the demo population model inverts, as cited data records. The demo
 * generator keeps its own copies (rather than importing src/core) so that the invented data
 * is an independent check on the science core: a derivation that recovers the model's
 * masses from these files tests the core against the papers, not against itself.
 */

/** Reines & Volonteri 2015 Hα virial mass: log M = log ε + a + b log(L_Hα/1e42) + c log(FWHM/1e3). */
export const RV15_HALPHA = {
  epsilon: 1.075,
  a: 6.57,
  b: 0.47,
  c: 2.06,
  lumPivotErgS: 1e42,
  fwhmPivotKms: 1e3,
  reference: 'Reines & Volonteri 2015, ApJ 813, 82, Hα single-epoch mass with virial factor ε = 1.075',
} as const;

/** Vestergaard & Peterson 2006 Hβ mass: log M = a + b log(λL5100/1e44) + c log(FWHM/1e3). */
export const VP06_HBETA = {
  a: 6.91,
  b: 0.5,
  c: 2,
  lumPivotErgS: 1e44,
  fwhmPivotKms: 1e3,
  reference: 'Vestergaard & Peterson 2006, ApJ 641, 689, Hβ + λL5100 single-epoch calibration',
} as const;

/** Shen et al. 2011 Mg II mass: log M = a + b log(λL3000/1e44) + c log(FWHM/1e3). */
export const S11_MGII = {
  a: 6.74,
  b: 0.62,
  c: 2,
  lumPivotErgS: 1e44,
  fwhmPivotKms: 1e3,
  reference: 'Shen et al. 2011, ApJS 194, 45, fiducial Mg II + λL3000 calibration',
} as const;

/** Greene & Ho 2005 eq. 1: L_Hα = norm (λL5100/1e44)^slope, erg s^-1. */
export const GH05_HALPHA_L5100 = {
  normErgS: 5.25e42,
  slope: 1.157,
  l5100PivotErgS: 1e44,
  reference: 'Greene & Ho 2005, ApJ 630, 122, eq. 1',
} as const;

/** Greene & Ho 2005 eq. 3: FWHM_Hβ = norm (FWHM_Hα/1e3)^slope, km s^-1. */
export const GH05_FWHM_HBETA = {
  normKms: 1.07e3,
  slope: 1.03,
  fwhmPivotKms: 1e3,
  reference: 'Greene & Ho 2005, ApJ 630, 122, eq. 3',
} as const;

/** Bolometric correction at 5100 Å used with L5100 inferred from broad Hα. */
export const BC5100 = {
  value: 10.33,
  reference: 'Richards et al. 2006, ApJS 166, 470 (mean quasar SED), as used for broad-Hα AGN at high redshift',
} as const;

/** Bolometric correction at 3000 Å. */
export const BC3000 = {
  value: 5.15,
  reference: 'Richards et al. 2006, ApJS 166, 470 (mean quasar SED), as used by Shen et al. 2011, ApJS 194, 45',
} as const;

/** Eddington luminosity per solar mass (hydrogen), erg s^-1. */
export const EDDINGTON_PER_MSUN = {
  valueErgS: 1.26e38,
  reference: 'conventional rounded value, e.g. Shen et al. 2011, ApJS 194, 45',
} as const;

/** Reines & Volonteri 2015 local AGN relation: log M_BH = alpha + beta log(M_star/1e11). */
export const RV15_AGN_LOCAL = {
  alpha: 7.45,
  beta: 1.05,
  mstarPivotMsun: 1e11,
  reference: 'Reines & Volonteri 2015, ApJ 813, 82, fit to their broad-line AGN sample',
} as const;

/** Case B intrinsic Hα/Hβ at T = 1e4 K, n_e = 100 cm^-3. */
export const CASE_B_BALMER = {
  value: 2.86,
  reference: 'Osterbrock & Ferland 2006, Astrophysics of Gaseous Nebulae and Active Galactic Nuclei, case B',
} as const;

/** Calzetti et al. 2000 attenuation curve (their eq. 4), λ in µm. */
export const CALZETTI00 = {
  rv: 4.05,
  scale: 2.659,
  blue: { c0: -2.156, c1: 1.509, c2: -0.198, c3: 0.011, lamMinUm: 0.12, lamMaxUm: 0.63 },
  red: { c0: -1.857, c1: 1.04, lamMinUm: 0.63, lamMaxUm: 2.2 },
  reference: 'Calzetti et al. 2000, ApJ 533, 682, eq. 4',
} as const;

/**
 * Vacuum rest wavelengths of the broad lines, Å (vacuum, like the science core's dust
 * correction; the air values move k(λ) by about 1e-3).
 */
export const REST_WAVELENGTH_A = {
  halpha: 6564.61,
  hbeta: 4862.68,
  mgii: 2798.75,
  reference: 'Vanden Berk et al. 2001, AJ 122, 549, Table 2 (vacuum laboratory wavelengths; Mg II doublet blended)',
} as const;

/**
 * Calzetti et al. 2000 k(λ) = A_λ / E(B−V).
 * @param lamUm rest wavelength, µm, 0.12–2.2
 * @returns k(λ), dimensionless
 */
export function calzettiK(lamUm: number): number {
  const c = CALZETTI00;
  if (lamUm < c.blue.lamMinUm || lamUm > c.red.lamMaxUm) {
    throw new Error(`calzettiK: wavelength ${lamUm} µm is outside 0.12–2.2 µm`);
  }
  const x = 1 / lamUm;
  const poly =
    lamUm < c.blue.lamMaxUm
      ? c.blue.c0 + c.blue.c1 * x + c.blue.c2 * x * x + c.blue.c3 * x * x * x
      : c.red.c0 + c.red.c1 * x;
  return c.scale * poly + c.rv;
}

/**
 * Scatter of true black-hole masses about the single-epoch (virial) masses of each calibration, dex: the demo's
 * virial mass is the true mass plus this scatter. The same values the science core's calibration records carry
 * (src/core/virial/calibrations.ts; there marked common practice / from memory).
 */
export const VIRIAL_SCATTER_DEX = {
  halpha: 0.4,
  hbeta: 0.43,
  mgii: 0.4,
  reference: 'common practice for single-epoch masses (RV15 discuss ~0.3–0.5 dex; VP06 quote ~0.43 dex about the RM masses, from memory)',
} as const;

/**
 * Galaxy stellar mass functions the demo draws its hosts from: Schechter shapes (low-mass slope, log M*_char) of
 * Song et al. 2016, ApJ 825, 5, Table 2 at z = 4–8 (slopes at z = 4 and 8 from the abstract; the other values
 * from memory, as in the science core's records). The record nearest in redshift is used (z > 8 uses z = 8).
 */
export const SONG16_SMF = {
  records: [
    { z: 4, logMchar: 10.5, alpha: -1.55 },
    { z: 5, logMchar: 10.97, alpha: -1.7 },
    { z: 6, logMchar: 10.72, alpha: -1.91 },
    { z: 7, logMchar: 10.78, alpha: -1.95 },
    { z: 8, logMchar: 10.72, alpha: -2.25 },
  ],
  reference: 'Song et al. 2016, ApJ 825, 5, Table 2 (Schechter fits; α at z = 4 and 8 from the abstract, the rest from memory)',
} as const;
