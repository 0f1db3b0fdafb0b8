/**
 * Parameters of an FLRW cosmology with matter, a cosmological constant, curvature, photons
 * and (massive) neutrinos, as in astropy's `LambdaCDM`/`FlatLambdaCDM` (astropy 5.x).
 */
export interface CosmologyParams {
  /** Short name, e.g. 'Planck18'. */
  readonly name: string;
  /** Hubble constant today, km s^-1 Mpc^-1 (> 0). */
  readonly H0: number;
  /** Non-relativistic matter density today over critical (dark matter + baryons; excludes massive neutrinos). */
  readonly Om0: number;
  /**
   * Dark-energy (Λ) density today over critical. Omitted for a flat universe, where it is
   * 1 − Om0 − Ogamma0 − Onu0.
   */
  readonly Ode0?: number;
  /** Baryon density today over critical (informational: it does not change distances or ages). */
  readonly Ob0?: number;
  /** CMB temperature today, K. 0 means no photons and no neutrinos (no radiation at all). */
  readonly Tcmb0: number;
  /** Effective number of neutrino species (shared equally over floor(Neff) species). */
  readonly Neff: number;
  /**
   * Neutrino masses, eV, one per species (floor(Neff) entries); omitted or all 0 means
   * massless neutrinos, counted as radiation.
   */
  readonly mNuEv?: readonly number[];
  /** Where the parameter set comes from. */
  readonly reference: string;
}
