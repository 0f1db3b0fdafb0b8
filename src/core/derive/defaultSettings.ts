import type { DeriveSettings } from './types.ts';
import { L_EDD_PER_MSUN_CONVENTIONAL } from '../constants/eddington.ts';
import { BC_SHEN11 } from '../bolometric/fixedCorrections.ts';
import { INTRINSIC_BALMER_CASE_B } from '../dust/balmerDecrement.ts';

/**
 * The settings a derivation uses when a catalog has no config: Planck18; Hα masses from
 * Reines & Volonteri 2015 (ε = 1.075), Hβ from Vestergaard & Peterson 2006, Mg II from
 * Shen et al. 2011, C IV from Vestergaard & Peterson 2006 (Hβ without a continuum: its eq. 6
 * on L(Hβ)); L_bol from broad Hα through Greene & Ho 2005 eq. 1 and BC5100 = 9.26, with the
 * fallbacks BC3000 = 5.15 and BC1350 = 3.81: one set, Shen et al. 2011's corrections from the
 * Richards et al. 2006 mean quasar SED (the Hα papers' 10.33 is a config choice); L_Edd = 1.26e38 M/M_sun
 * erg/s; ε = 0.1; seeds at z = 20 grown at λ = 1 with duty cycle 1; light and heavy seeds of
 * 1e2 and 1e5 M_sun; Reines & Volonteri 2015 AGN relation; Calzetti et al. 2000 dust with
 * case-B Hα/Hβ = 2.86; 2000 draws; seed 1. The choices of recent high-redshift broad-line
 * papers (common practice, no single source).
 */
export const DEFAULT_SETTINGS: Readonly<DeriveSettings> = Object.freeze({
  cosmology: 'planck18',
  calibrations: { halpha: 'rv15_halpha', hbeta: 'vp06_hbeta', mgii: 's11_mgii', civ: 'vp06_civ' },
  linePriority: ['halpha', 'hbeta', 'mgii', 'civ'],
  hbetaWithoutContinuum: 'line',
  bolometric: 'halpha_gh05_bc5100',
  bc5100: BC_SHEN11.l5100.bc,
  eddingtonPerMsun: L_EDD_PER_MSUN_CONVENTIONAL,
  efficiency: 0.1,
  zSeed: 20,
  lambdaSeed: 1,
  dutyCycle: 1,
  lightSeedMsun: 1e2,
  heavySeedMsun: 1e5,
  localRelation: 'rv15_agn',
  dustCurve: 'calzetti00',
  intrinsicBalmer: INTRINSIC_BALMER_CASE_B.ratio,
  draws: 2000,
  seed: 1,
}) as DeriveSettings;
