/**
 * One row of the invented demo catalog, with the canonical column names of the catalog build
 * and the pass-through columns. `null` is an empty cell. Units: FWHM km s^-1; fluxes
 * 1e-18 erg s^-1 cm^-2 (the config maps this unit); λL5100, λL3000 erg s^-1, observed (before the
 * magnification correction); log_mstar log10 M_sun (intrinsic); ra/dec degrees (ICRS).
 */
export interface DemoRow {
  id: string;
  z: number;
  fwhm_halpha: number | null;
  fwhm_halpha_err: number | null;
  flux_halpha: number | null;
  flux_halpha_err: number | null;
  flux_halpha_is_limit: boolean | null;
  fwhm_hbeta: number | null;
  fwhm_hbeta_err: number | null;
  flux_hbeta: number | null;
  flux_hbeta_err: number | null;
  fwhm_mgii: number | null;
  fwhm_mgii_err: number | null;
  lam_l_5100: number | null;
  lam_l_5100_err: number | null;
  lam_l_3000: number | null;
  lam_l_3000_err: number | null;
  mu: number | null;
  mu_err: number | null;
  log_mstar: number | null;
  log_mstar_err: number | null;
  balmer_decrement: number | null;
  balmer_decrement_err: number | null;
  ra: number;
  dec: number;
  field: string;
  spec_program: string;
  notes: string;
}

/** Column order of the written files: the canonical columns, then the pass-through ones. */
export const DEMO_COLUMNS = [
  'id',
  'z',
  'fwhm_halpha',
  'fwhm_halpha_err',
  'flux_halpha',
  'flux_halpha_err',
  'flux_halpha_is_limit',
  'fwhm_hbeta',
  'fwhm_hbeta_err',
  'flux_hbeta',
  'flux_hbeta_err',
  'fwhm_mgii',
  'fwhm_mgii_err',
  'lam_l_5100',
  'lam_l_5100_err',
  'lam_l_3000',
  'lam_l_3000_err',
  'mu',
  'mu_err',
  'log_mstar',
  'log_mstar_err',
  'balmer_decrement',
  'balmer_decrement_err',
  'ra',
  'dec',
  'field',
  'spec_program',
  'notes',
] as const satisfies readonly (keyof DemoRow)[];

/** A row with every measurement empty, to be filled in. */
export function emptyRow(id: string, z: number): DemoRow {
  return {
    id,
    z,
    fwhm_halpha: null,
    fwhm_halpha_err: null,
    flux_halpha: null,
    flux_halpha_err: null,
    flux_halpha_is_limit: null,
    fwhm_hbeta: null,
    fwhm_hbeta_err: null,
    flux_hbeta: null,
    flux_hbeta_err: null,
    fwhm_mgii: null,
    fwhm_mgii_err: null,
    lam_l_5100: null,
    lam_l_5100_err: null,
    lam_l_3000: null,
    lam_l_3000_err: null,
    mu: null,
    mu_err: null,
    log_mstar: null,
    log_mstar_err: null,
    balmer_decrement: null,
    balmer_decrement_err: null,
    ra: 0,
    dec: 0,
    field: '',
    spec_program: '',
    notes: '',
  };
}
