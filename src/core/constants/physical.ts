import type { CitedConstant } from './citedConstant.ts';

const CODATA_2018 = 'CODATA 2018 (Tiesinga et al. 2021, Rev. Mod. Phys. 93, 025010)';
const SI_2019 = 'SI definition (BIPM SI Brochure, 9th ed., 2019)';

/**
 * Physical constants (CODATA 2018) and astronomical nominal values (IAU 2012 B2, IAU 2015 B2/B3)
 * as cited records, in cgs. The plain `*_CM`, `*_G`, `*_S` exports below are read from here.
 */
export const PHYSICAL_CONSTANTS = {
  speedOfLight: { value: 2.99792458e10, unit: 'cm s^-1', reference: `${SI_2019}; exact` },
  gravitationalConstant: { value: 6.6743e-8, unit: 'cm^3 g^-1 s^-2', reference: CODATA_2018 },
  protonMass: { value: 1.67262192369e-24, unit: 'g', reference: CODATA_2018 },
  thomsonCrossSection: { value: 6.6524587321e-25, unit: 'cm^2', reference: CODATA_2018 },
  boltzmannEvPerK: { value: 8.617333262e-5, unit: 'eV K^-1', reference: `${CODATA_2018}; exact in the 2019 SI` },
  stefanBoltzmann: { value: 5.670374419e-5, unit: 'erg cm^-2 s^-1 K^-4', reference: `${CODATA_2018}; exact in the 2019 SI` },
  solarMassParameter: {
    value: 1.3271244e26,
    unit: 'cm^3 s^-2',
    reference: 'IAU 2015 Resolution B3 (Prša et al. 2016, AJ 152, 41): nominal solar mass parameter GM_sun',
  },
  solarLuminosity: {
    value: 3.828e33,
    unit: 'erg s^-1',
    reference: 'IAU 2015 Resolution B3 (Prša et al. 2016, AJ 152, 41): nominal solar luminosity 3.828e26 W',
  },
  astronomicalUnit: { value: 1.495978707e13, unit: 'cm', reference: 'IAU 2012 Resolution B2: exact' },
  julianYear: { value: 31557600, unit: 's', reference: 'IAU Julian year, 365.25 d of 86400 s: exact' },
} as const satisfies Record<string, CitedConstant>;

/** Speed of light in vacuum, cm s^-1 (exact). */
export const C_CM_S: number = PHYSICAL_CONSTANTS.speedOfLight.value;
/** Speed of light in vacuum, km s^-1 (exact). */
export const C_KM_S: number = C_CM_S / 1e5;
/** Newtonian constant of gravitation, cm^3 g^-1 s^-2 (CODATA 2018). */
export const G_CGS: number = PHYSICAL_CONSTANTS.gravitationalConstant.value;
/** Proton mass, g (CODATA 2018). */
export const M_P_G: number = PHYSICAL_CONSTANTS.protonMass.value;
/** Thomson cross-section, cm^2 (CODATA 2018). */
export const SIGMA_T_CM2: number = PHYSICAL_CONSTANTS.thomsonCrossSection.value;
/** Boltzmann constant, eV K^-1 (CODATA 2018, exact). */
export const K_B_EV_K: number = PHYSICAL_CONSTANTS.boltzmannEvPerK.value;
/** Stefan–Boltzmann constant, erg cm^-2 s^-1 K^-4 (CODATA 2018, exact). */
export const SIGMA_SB_CGS: number = PHYSICAL_CONSTANTS.stefanBoltzmann.value;
/** Nominal solar mass parameter GM_sun, cm^3 s^-2 (IAU 2015 B3). */
export const GM_SUN_CGS: number = PHYSICAL_CONSTANTS.solarMassParameter.value;
/** Solar mass, g: IAU 2015 B3 nominal GM_sun divided by CODATA 2018 G (≈ 1.98841e33 g). */
export const M_SUN_G: number = GM_SUN_CGS / G_CGS;
/** Nominal solar luminosity, erg s^-1 (IAU 2015 B3: 3.828e26 W). */
export const L_SUN_ERG_S: number = PHYSICAL_CONSTANTS.solarLuminosity.value;
/** Astronomical unit, cm (IAU 2012 B2, exact). */
export const AU_CM: number = PHYSICAL_CONSTANTS.astronomicalUnit.value;
/** Parsec, cm: au × 648000/π (IAU 2015 Resolution B2), ≈ 3.0856776e18 cm. */
export const PC_CM: number = (AU_CM * 648000) / Math.PI;
/** Kiloparsec, cm. */
export const KPC_CM: number = 1e3 * PC_CM;
/** Megaparsec, cm. */
export const MPC_CM: number = 1e6 * PC_CM;
/** Kilometre, cm. */
export const KM_CM = 1e5;
/** Megaparsec, km. */
export const MPC_KM: number = MPC_CM / KM_CM;
/** Ångström, cm. */
export const ANGSTROM_CM = 1e-8;
/** Day, s. */
export const DAY_S = 86400;
/** Julian year (365.25 d), s. */
export const YR_S: number = PHYSICAL_CONSTANTS.julianYear.value;
/** Megayear (Julian), s. */
export const MYR_S: number = 1e6 * YR_S;
/** Gigayear (Julian), s. */
export const GYR_S: number = 1e9 * YR_S;
/** Watt, erg s^-1 (SI definition). */
export const W_ERG_S = 1e7;
