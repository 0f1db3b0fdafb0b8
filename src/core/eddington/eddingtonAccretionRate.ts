import { L_EDD_PER_MSUN_CONVENTIONAL } from '../constants/eddington.ts';
import { C_CM_S, M_SUN_G, YR_S } from '../constants/physical.ts';

/**
 * Eddington accretion rate Ṁ_Edd = L_Edd / (ε c²), M_sun yr⁻¹ (the rate that radiates L_Edd
 * at radiative efficiency ε; ≈ 2.2 M_sun/yr for 1e8 M_sun at ε = 0.1).
 * @param m - black-hole mass, M_sun (linear, ≥ 0).
 * @param efficiency - radiative efficiency ε, 0 < ε < 1.
 * @param perMsun - Eddington luminosity per solar mass, erg s⁻¹ (default 1.26e38).
 */
export function eddingtonAccretionRateMsunYr(
  m: number,
  efficiency: number,
  perMsun: number = L_EDD_PER_MSUN_CONVENTIONAL,
): number {
  if (!(efficiency > 0 && efficiency < 1)) throw new RangeError(`radiative efficiency must be in (0, 1), got ${efficiency}`);
  const gramsPerSecond = (m * perMsun) / (efficiency * C_CM_S * C_CM_S);
  return (gramsPerSecond * YR_S) / M_SUN_G;
}
