import { DEFAULT_SETTINGS } from '../../core/derive/defaultSettings.ts';
import type { DeriveSettings } from '../../core/derive/types.ts';
import type { CensusConfig } from './CensusConfig.ts';

/**
 * The derivation settings used when there is no config, and for keys a config leaves out: a
 * fresh, changeable copy of the core's DEFAULT_SETTINGS (Planck18; Hα from rv15_halpha, Hβ
 * vp06_hbeta (vp06_hbeta_line without a continuum), Mg II s11_mgii, C IV vp06_civ; bolometric
 * luminosity from Hα via L5100 with BC5100 = 9.26 (fallbacks BC3000 = 5.15, BC1350 = 3.81: Shen
 * et al. 2011's one set); L_Edd = 1.26e38 erg/s per Msun; ε = 0.1; seeds at z = 20 growing at λ = 1
 * with duty cycle 1 from 1e2 (light) or 1e5 (heavy) Msun; the rv15_agn local relation;
 * Calzetti (2000) dust with intrinsic Hα/Hβ = 2.86; 2000 draws, seed 1; line priority Hα, Hβ,
 * Mg II, C IV).
 */
export function defaultSettings(): DeriveSettings {
  return { ...DEFAULT_SETTINGS, calibrations: { ...DEFAULT_SETTINGS.calibrations }, linePriority: [...DEFAULT_SETTINGS.linePriority] };
}

/** The config used when there is no config file: no metadata, no column mapping, default settings, site base '/'. */
export function defaultConfig(): CensusConfig {
  return { columns: {}, settings: defaultSettings(), site: { base: '/' } };
}
