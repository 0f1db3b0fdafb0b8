import type { Cosmology } from '../cosmology/cosmology.ts';
import { integrateAdaptive } from '../cosmology/gaussKronrod.ts';

/**
 * Comoving volume per steradian between two redshifts, Mpc³ sr⁻¹:
 * ∫ D_H D_M² / E(z) dz. In a flat universe this is (D_M(z2)³ − D_M(z1)³)/3 exactly
 * (Hogg 1999, astro-ph/9905116, eq. 29), which is used there; curved universes integrate.
 * @param cosmo - the cosmology.
 * @param z1 - lower redshift (≥ 0).
 * @param z2 - upper redshift (≥ z1).
 */
export function comovingVolumeMpc3Sr(cosmo: Cosmology, z1: number, z2: number): number {
  if (!(z2 > z1)) return 0;
  if (cosmo.densities.Ok0 === 0) {
    const a = cosmo.transverseComovingDistanceMpc(z1);
    const b = cosmo.transverseComovingDistanceMpc(z2);
    return (b * b * b - a * a * a) / 3;
  }
  return integrateAdaptive((z) => cosmo.differentialComovingVolumeMpc3Sr(z), z1, z2, 1e-10);
}
