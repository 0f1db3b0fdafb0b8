import { T_EDD_GYR } from '../constants/eddington.ts';

/** The Eddington-limited exponential growth model as a cited record. */
export const SALPETER_GROWTH = {
  form: 'M(t) = M_seed exp[(1−ε)/ε · λ · f_duty · Δt / t_Edd], t_Edd = σ_T c / (4πG m_p)',
  reference: 'Salpeter 1964, ApJ 140, 796 (e-folding growth at the Eddington limit)',
  /** Eddington time, Gyr (from CODATA 2018 constants, src/core/constants/eddington.ts). */
  tEddGyr: T_EDD_GYR,
} as const;

function checkEfficiency(efficiency: number): void {
  if (!(efficiency > 0 && efficiency < 1)) throw new RangeError(`radiative efficiency must be in (0, 1), got ${efficiency}`);
}

/**
 * Salpeter (e-folding) time ε/(1−ε) · t_Edd / λ, Gyr (50.05 Myr at ε = 0.1, λ = 1).
 * @param efficiency - radiative efficiency ε, 0 < ε < 1.
 * @param lambda - Eddington ratio λ (> 0; 0 gives Infinity).
 */
export function salpeterTimeGyr(efficiency: number, lambda: number): number {
  checkEfficiency(efficiency);
  return ((efficiency / (1 - efficiency)) * SALPETER_GROWTH.tEddGyr) / lambda;
}

/**
 * Number of e-folds (1−ε)/ε · λ · f_duty · Δt / t_Edd.
 * @param dtGyr - growth time, Gyr; negative gives NaN (the seed would form after the object).
 * @param efficiency - ε, 0 < ε < 1.
 * @param lambda - constant Eddington ratio (≥ 0).
 * @param dutyCycle - fraction of Δt spent accreting, 0–1.
 */
export function eFolds(dtGyr: number, efficiency: number, lambda: number, dutyCycle: number): number {
  checkEfficiency(efficiency);
  if (dtGyr < 0) return NaN;
  return (((1 - efficiency) / efficiency) * lambda * dutyCycle * dtGyr) / SALPETER_GROWTH.tEddGyr;
}

/**
 * log10 mass after growing from a seed for Δt.
 * @param logMseed - log10 seed mass, M_sun.
 * @param dtGyr - growth time, Gyr (< 0 gives NaN).
 * @param efficiency - radiative efficiency ε, 0 < ε < 1.
 * @param lambda - constant Eddington ratio (≥ 0).
 * @param dutyCycle - fraction of Δt spent accreting, 0–1.
 * @returns log10 M, M_sun.
 */
export function logMassAfter(logMseed: number, dtGyr: number, efficiency: number, lambda: number, dutyCycle: number): number {
  return logMseed + eFolds(dtGyr, efficiency, lambda, dutyCycle) * Math.LOG10E;
}

/**
 * log10 seed mass needed at the start of Δt to reach log M at its end.
 * @param logM - log10 black-hole mass reached, M_sun.
 * @param dtGyr - growth time, Gyr (< 0 gives NaN).
 * @param efficiency - radiative efficiency ε, 0 < ε < 1.
 * @param lambda - constant Eddington ratio (≥ 0).
 * @param dutyCycle - fraction of Δt spent accreting, 0–1.
 * @returns log10 M_seed, M_sun.
 */
export function logSeedMassRequired(logM: number, dtGyr: number, efficiency: number, lambda: number, dutyCycle: number): number {
  return logM - eFolds(dtGyr, efficiency, lambda, dutyCycle) * Math.LOG10E;
}

/**
 * Constant Eddington ratio needed to grow from M_seed to M in Δt:
 * λ = ln(M/M_seed) · ε/(1−ε) · t_Edd / (f_duty Δt).
 * Edge cases: NaN in → NaN; Δt < 0 → NaN; M ≤ M_seed → 0 (no growth needed, even at Δt = 0);
 * Δt = 0 or f_duty = 0 with M > M_seed → Infinity.
 * @param logM - log10 final mass, M_sun.
 * @param logMseed - log10 seed mass, M_sun.
 * @param dtGyr - growth time, Gyr.
 * @param efficiency - ε, 0 < ε < 1.
 * @param dutyCycle - duty cycle, 0–1.
 */
export function lambdaRequired(logM: number, logMseed: number, dtGyr: number, efficiency: number, dutyCycle: number): number {
  checkEfficiency(efficiency);
  if (Number.isNaN(logM) || Number.isNaN(logMseed) || Number.isNaN(dtGyr) || Number.isNaN(dutyCycle)) return NaN;
  if (dtGyr < 0) return NaN;
  if (logM <= logMseed) return 0;
  if (dtGyr === 0 || dutyCycle === 0) return Infinity;
  return ((logM - logMseed) * Math.LN10 * (efficiency / (1 - efficiency)) * SALPETER_GROWTH.tEddGyr) / (dutyCycle * dtGyr);
}
