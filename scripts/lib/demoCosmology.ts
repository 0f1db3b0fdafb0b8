/**
 * A small, self-contained Planck18 luminosity distance for the demo generator, so the
 * generator does not depend on the science core it is meant to exercise. It follows the
 * flat FLRW model of astropy.cosmology (BSD-3-Clause): photons from T_cmb, neutrinos with
 * the Komatsu et al. 2011 (ApJS 192, 18, eq. 26) fitting function for the massive species,
 * dark energy as a cosmological constant closing the budget.
 */

/** Planck 2018 parameters (flat ΛCDM). */
export const PLANCK18 = {
  h0KmsMpc: 67.66,
  om0: 0.30966,
  tcmbK: 2.7255,
  neff: 3.046,
  /** Neutrino masses, eV: two massless, one of 0.06 eV. */
  mNuEv: [0, 0, 0.06],
  reference: 'Planck Collaboration 2020, A&A 641, A6, Table 2 (TT,TE,EE+lowE+lensing+BAO)',
} as const;

/** Physical constants (CODATA 2018), cgs unless stated. */
const CONST = {
  cKms: 299792.458,
  cCms: 2.99792458e10,
  sigmaSb: 5.670374419e-5,
  gravity: 6.6743e-8,
  kbEvK: 8.617333262e-5,
  kmPerMpc: 3.0856775814913673e19,
  cmPerMpc: 3.0856775814913673e24,
  reference: 'CODATA 2018 (Tiesinga et al. 2021, RMP 93, 025010); IAU 2012 B2 for the parsec',
} as const;

/** Komatsu et al. 2011 eq. 26 fit: p, k, and 7/8 (4/11)^(4/3). */
const NU_FIT = { p: 1.83, k: 0.3173, prefac: 0.22710731766 } as const;

const tnu0K = Math.cbrt(4 / 11) * PLANCK18.tcmbK;
const nuY = PLANCK18.mNuEv.filter((m) => m > 0).map((m) => m / (CONST.kbEvK * tnu0K));
const nMassless = PLANCK18.mNuEv.filter((m) => m === 0).length;
const neffPerNu = PLANCK18.neff / PLANCK18.mNuEv.length;

const h0PerS = PLANCK18.h0KmsMpc / CONST.kmPerMpc;
const critDens0 = (3 * h0PerS * h0PerS) / (8 * Math.PI * CONST.gravity);
const ogamma0 = ((4 * CONST.sigmaSb) / CONST.cCms ** 3) * PLANCK18.tcmbK ** 4 / critDens0;

/** Neutrino energy density relative to photons at redshift z. */
function nuRelativeDensity(z: number): number {
  let rel = nMassless;
  for (const y of nuY) rel += (1 + (NU_FIT.k * y / (1 + z)) ** NU_FIT.p) ** (1 / NU_FIT.p);
  return NU_FIT.prefac * neffPerNu * rel;
}

const onu0 = ogamma0 * nuRelativeDensity(0);
const ode0 = 1 - PLANCK18.om0 - ogamma0 - onu0;

/** 1/E(z) = H0/H(z) for Planck18 including radiation. */
function invE(z: number): number {
  const a1 = 1 + z;
  const e2 = PLANCK18.om0 * a1 ** 3 + ogamma0 * (1 + nuRelativeDensity(z)) * a1 ** 4 + ode0;
  return 1 / Math.sqrt(e2);
}

/** Composite Simpson intervals: the integrand is smooth, 512 intervals reach ~1e-10 to z = 20. */
const SIMPSON_INTERVALS = 512;
const cache = new Map<number, number>();

/**
 * Planck18 luminosity distance.
 * @param z redshift, ≥ 0
 * @returns D_L in Mpc
 */
export function luminosityDistanceMpc(z: number): number {
  if (!(z >= 0)) throw new Error(`luminosityDistanceMpc: redshift must be ≥ 0, got ${z}`);
  const hit = cache.get(z);
  if (hit !== undefined) return hit;
  const h = z / SIMPSON_INTERVALS;
  let sum = invE(0) + invE(z);
  for (let i = 1; i < SIMPSON_INTERVALS; i++) sum += (i % 2 === 1 ? 4 : 2) * invE(i * h);
  const dcMpc = (CONST.cKms / PLANCK18.h0KmsMpc) * (h / 3) * sum;
  const dl = (1 + z) * dcMpc;
  // The catalog's redshifts are rounded to 4 decimals, so the cache stays small.
  if (cache.size < 200_000) cache.set(z, dl);
  return dl;
}

/**
 * Converts a luminosity to the flux seen at redshift z (no magnification, no dust).
 * @param lumErgS luminosity, erg s^-1
 * @param z redshift
 * @returns flux, erg s^-1 cm^-2
 */
export function fluxFromLuminosity(lumErgS: number, z: number): number {
  const dlCm = luminosityDistanceMpc(z) * CONST.cmPerMpc;
  return lumErgS / (4 * Math.PI * dlCm * dlCm);
}

/**
 * Inverse of {@link fluxFromLuminosity}.
 * @param fluxCgs flux, erg s^-1 cm^-2
 * @param z redshift
 * @returns luminosity, erg s^-1
 */
export function luminosityFromFlux(fluxCgs: number, z: number): number {
  const dlCm = luminosityDistanceMpc(z) * CONST.cmPerMpc;
  return fluxCgs * 4 * Math.PI * dlCm * dlCm;
}
