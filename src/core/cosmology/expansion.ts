import type { DensityParameters } from './densityParameters.ts';
import { neutrinoOverPhotonDensity } from './neutrinoDensity.ts';

/** The expansion rate of a cosmology in the two forms the integrals need. */
export interface Expansion {
  /** E(z) = H(z)/H0 (dimensionless), z > −1. */
  efunc(z: number): number;
  /**
   * a⁴ E(a)² = Ω_r(a) + Ωm a + Ωk a² + ΩΛ a⁴ (dimensionless), a > 0: finite at a → 0, which
   * keeps the high-redshift integrands free of overflow and of 0/0.
   */
  a4E2(a: number): number;
}

/** Builds E(z) = sqrt(Ω_r(z)(1+z)⁴ + Ωm(1+z)³ + Ωk(1+z)² + ΩΛ) for the given densities. */
export function createExpansion(d: DensityParameters): Expansion {
  const { Om0, Ode0, Ok0, Ogamma0, Onu0, massiveNeutrinos } = d;
  const radiation = massiveNeutrinos
    ? (a: number) => Ogamma0 * (1 + neutrinoOverPhotonDensity(massiveNeutrinos, a))
    : () => Ogamma0 + Onu0;
  return {
    efunc(z: number): number {
      const zp1 = 1 + z;
      const or = radiation(1 / zp1);
      return Math.sqrt(((or * zp1 + Om0) * zp1 + Ok0) * zp1 * zp1 + Ode0);
    },
    a4E2(a: number): number {
      const a2 = a * a;
      return radiation(a) + Om0 * a + Ok0 * a2 + Ode0 * a2 * a2;
    },
  };
}
