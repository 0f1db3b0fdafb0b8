import type { DeriveSettings } from '../../core/derive/types.ts';
import type { CensusConfig } from './CensusConfig.ts';

/**
 * The derivation settings used when there is no config, and for keys a config leaves out:
 * Planck18; Hα from rv15_halpha, Hβ vp06_hbeta, Mg II s11_mgii, C IV vp06_civ; bolometric
 * luminosity from Hα via L5100 with BC5100 = 10.33; L_Edd = 1.26e38 erg/s per Msun; ε = 0.1;
 * seeds at z = 20 growing at λ = 1 with duty cycle 1 from 1e2 (light) or 1e5 (heavy) Msun;
 * the rv15_agn local relation; Calzetti (2000) dust with intrinsic Hα/Hβ = 2.86; 2000 draws,
 * seed 1; line priority Hα, Hβ, Mg II, C IV.
 */
export function defaultSettings(): DeriveSettings {
  return {
    cosmology: 'planck18',
    calibrations: { halpha: 'rv15_halpha', hbeta: 'vp06_hbeta', mgii: 's11_mgii', civ: 'vp06_civ' },
    linePriority: ['halpha', 'hbeta', 'mgii', 'civ'],
    bolometric: 'halpha_gh05_bc5100',
    // Richards et al. 2006, ApJS 166, 470 (mean BC at 5100 Å = 10.33); common practice.
    bc5100: 10.33,
    // Shen et al. 2011, ApJS 194, 45.
    eddingtonPerMsun: 1.26e38,
    efficiency: 0.1,
    zSeed: 20,
    lambdaSeed: 1,
    dutyCycle: 1,
    lightSeedMsun: 1e2,
    heavySeedMsun: 1e5,
    localRelation: 'rv15_agn',
    dustCurve: 'calzetti00',
    // Osterbrock & Ferland 2006, case B at 10^4 K.
    intrinsicBalmer: 2.86,
    draws: 2000,
    seed: 1,
  };
}

/** The config used when there is no config file: no metadata, no column mapping, default settings, site base '/'. */
export function defaultConfig(): CensusConfig {
  return { columns: {}, settings: defaultSettings(), site: { base: '/' } };
}
