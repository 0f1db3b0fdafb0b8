import type { Rng } from './rng.ts';
import { standardNormal } from './standardNormal.ts';

/**
 * A deviate of the split (two-piece) normal with mode `mode`: a half-normal of width `sigmaLo`
 * below the mode and one of width `sigmaHi` above, joined continuously at the mode, so a
 * fraction σlo/(σlo+σhi) falls below it (e.g. John 1982, Commun. Stat. Theory Methods 11, 879).
 * Used for asymmetric errors `value −errLo +errHi`. σ ≥ 0 in the units of `mode`.
 */
export function splitNormal(rng: Rng, mode: number, sigmaLo: number, sigmaHi: number): number {
  // Symmetric (or exact) values: one deviate, no branch draw; keeps the common case fast.
  if (sigmaLo === sigmaHi) return sigmaLo === 0 ? mode : mode + sigmaLo * standardNormal(rng);
  const z = Math.abs(standardNormal(rng));
  return rng.next() * (sigmaLo + sigmaHi) < sigmaLo ? mode - sigmaLo * z : mode + sigmaHi * z;
}
