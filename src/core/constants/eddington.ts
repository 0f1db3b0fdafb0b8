import { C_CM_S, G_CGS, GYR_S, M_P_G, M_SUN_G, SIGMA_T_CM2 } from './physical.ts';

/** An Eddington-luminosity-per-solar-mass choice as a cited record. */
export interface EddingtonConstant {
  /** Eddington luminosity of one solar mass of hydrogen-fed accretor, erg s^-1 M_sun^-1. */
  readonly lEddPerMsun: number;
  /** Where the value comes from. */
  readonly reference: string;
}

/**
 * Eddington luminosity per solar mass for pure hydrogen, 4πG m_p c M_sun / σ_T, erg s^-1,
 * computed from CODATA 2018 constants and the IAU 2015 nominal solar mass (≈ 1.25707e38).
 */
export const L_EDD_PER_MSUN_COMPUTED: number = (4 * Math.PI * G_CGS * M_P_G * C_CM_S * M_SUN_G) / SIGMA_T_CM2;

/** Conventional rounded Eddington luminosity per solar mass, erg s^-1 (Shen et al. 2011, ApJS 194, 45). */
export const L_EDD_PER_MSUN_CONVENTIONAL = 1.26e38;

/** Eddington luminosity per solar mass rounded to 1.3e38 erg s^-1, as used by Harikane et al. 2023 (ApJ 959, 39). */
export const L_EDD_PER_MSUN_HARIKANE = 1.3e38;

/** The selectable Eddington-luminosity choices. */
export type EddingtonConstantId = 'computed' | 'conventional' | 'rounded13';

/** The Eddington-luminosity-per-solar-mass options, keyed by id, each with its source. */
export const EDDINGTON_CONSTANTS: Readonly<Record<EddingtonConstantId, EddingtonConstant>> = {
  computed: {
    lEddPerMsun: L_EDD_PER_MSUN_COMPUTED,
    reference: '4πG m_p c M_sun/σ_T from CODATA 2018 constants and IAU 2015 B3 nominal GM_sun (computed)',
  },
  conventional: {
    lEddPerMsun: L_EDD_PER_MSUN_CONVENTIONAL,
    reference: 'Shen et al. 2011, ApJS 194, 45 (L_Edd = 1.26e38 M/M_sun erg/s)',
  },
  rounded13: {
    lEddPerMsun: L_EDD_PER_MSUN_HARIKANE,
    reference: 'Harikane et al. 2023, ApJ 959, 39 (L_Edd = 1.3e38 M/M_sun erg/s)',
  },
};

/**
 * Eddington time σ_T c / (4πG m_p), Gyr (≈ 0.45049 Gyr from CODATA 2018): the mass e-folding
 * time at λ_Edd = 1 is ε/(1−ε) times this.
 */
export const T_EDD_GYR: number = (SIGMA_T_CM2 * C_CM_S) / (4 * Math.PI * G_CGS * M_P_G) / GYR_S;
