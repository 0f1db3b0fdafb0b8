import type { Expansion } from './expansion.ts';
import { integrateAdaptive } from './gaussKronrod.ts';
import { exp, expm1, log1p } from '../math/index.ts';

// Direct integrals in units of the Hubble time t_H = 1/H0 and Hubble distance D_H = c/H0.
// High-redshift ones use s = √a: with a⁴E² = P(a) finite at a = 0, dt = 2s³ ds/√P(s²) and
// dD_C = 2s ds/√P(s²) are smooth in s both with radiation (P(0) = Ω_r) and without
// (P ≈ Ωm s², where a plain-a integrand would have a √a cusp).

/** Age at scale factor a (0 ≤ a ≤ 1), in Hubble times: ∫_0^a da/(a E). */
export function ageInHubbleTimes(expansion: Expansion, a: number): number {
  if (a <= 0) return 0;
  // The Kronrod nodes never touch the ends, so s = 0 (0/0 without radiation) is not evaluated.
  return integrateAdaptive((s) => (2 * s * s * s) / Math.sqrt(expansion.a4E2(s * s)), 0, Math.sqrt(a));
}

/** Comoving distance between scale factors aLo < aHi, in Hubble distances: ∫ da/(a² E). */
export function comovingBetweenInHubbleDistances(expansion: Expansion, aLo: number, aHi: number): number {
  return integrateAdaptive((s) => (2 * s) / Math.sqrt(expansion.a4E2(s * s)), Math.sqrt(aLo), Math.sqrt(aHi));
}

/** Lookback time to redshift z (any z > −1; negative for z < 0), in Hubble times: ∫_0^ln(1+z) du/E. */
export function lookbackInHubbleTimes(expansion: Expansion, z: number): number {
  return integrateAdaptive((u) => 1 / expansion.efunc(expm1(u)), 0, log1p(z));
}

/** Line-of-sight comoving distance to z (any z > −1), in Hubble distances: ∫_0^ln(1+z) e^u du/E. */
export function comovingInHubbleDistances(expansion: Expansion, z: number): number {
  return integrateAdaptive((u) => exp(u) / expansion.efunc(expm1(u)), 0, log1p(z));
}
