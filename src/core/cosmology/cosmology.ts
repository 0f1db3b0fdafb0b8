import type { CosmologyParams } from './cosmologyParams.ts';
import type { DensityParameters } from './densityParameters.ts';

/**
 * An FLRW cosmology: distances in Mpc, times in Gyr, redshift z > −1. Distances and ages up
 * to z ≈ 1e4 come from tables built at first use (relative error ~1e-11); beyond, and for
 * z < 0, from direct integration. Same physics as astropy 5.2.1's LambdaCDM.
 */
export interface Cosmology {
  readonly params: CosmologyParams;
  /** Derived density parameters today (photons, neutrinos, Λ, curvature). */
  readonly densities: DensityParameters;
  /** Hubble time 1/H0, Gyr. */
  readonly hubbleTimeGyr: number;
  /** Hubble distance c/H0, Mpc. */
  readonly hubbleDistanceMpc: number;
  /** E(z) = H(z)/H0, dimensionless. */
  efunc(z: number): number;
  /** Line-of-sight comoving distance D_C, Mpc. */
  comovingDistanceMpc(z: number): number;
  /** Transverse comoving distance D_M (= D_C when flat; sinh/sin form when curved), Mpc. */
  transverseComovingDistanceMpc(z: number): number;
  /** Luminosity distance D_L = (1+z) D_M, Mpc. */
  luminosityDistanceMpc(z: number): number;
  /** Angular-diameter distance D_A = D_M/(1+z), Mpc. */
  angularDiameterDistanceMpc(z: number): number;
  /** Lookback time to z, Gyr. */
  lookbackTimeGyr(z: number): number;
  /** Age of the universe at z, Gyr (0 at z = ∞). */
  ageGyr(z: number): number;
  /**
   * Redshift at which the universe had age `tGyr` (0 < tGyr ≤ age today), the inverse of
   * {@link Cosmology.ageGyr}. Throws a RangeError outside that range.
   */
  redshiftAtAgeGyr(tGyr: number): number;
  /** Differential comoving volume dV_C/dz/dΩ = D_H D_M²/E(z), Mpc³ sr^-1 (per unit redshift). */
  differentialComovingVolumeMpc3Sr(z: number): number;
}
