/** A published space density of compact broad-line AGN, for comparison with a catalog's own. */
export interface PublishedDensity {
  readonly id: string;
  /** Short label for charts, author–year first. */
  readonly label: string;
  /** Redshift range it applies to (upper end open when Infinity). */
  readonly zRange: readonly [number, number];
  /** Range of the total space density, comoving Mpc⁻³ (integrated over mass and luminosity, not per dex). */
  readonly nCmpc3: readonly [number, number];
  readonly reference: string;
}

/**
 * Published number densities. Ma et al. 2025 state "~1e-5–1e-4 cMpc^-3" at z > 4 for this population, about 100×
 * the extrapolated UV-selected quasar luminosity function (abstract).
 */
export const PUBLISHED_DENSITIES: readonly PublishedDensity[] = [
  {
    id: 'ma25',
    label: 'Ma et al. 2025, z > 4',
    zRange: [4, Infinity],
    nCmpc3: [1e-5, 1e-4],
    reference: 'Ma et al. 2025, arXiv:2509.02662, abstract',
  },
];
