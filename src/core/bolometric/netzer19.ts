import type { ContinuumBand } from './fixedCorrections.ts';
import { log10 } from '../math/index.ts';

/** A Netzer 2019 luminosity-dependent correction k = c (λL_λ / 1e42)^d as a record. */
export interface Netzer19Correction {
  readonly band: ContinuumBand;
  /** Wavelength the correction was derived at, Å. */
  readonly lambdaAngstrom: number;
  readonly c: number;
  readonly d: number;
  readonly reference: string;
  readonly notes: string;
}

const REF = 'Netzer 2019, MNRAS 488, 5185, Table 1';
const CONFIRM = 'Coefficients from a code transcription: confirm against the paper.';

/**
 * Netzer 2019 bolometric corrections at 5100, 3000 and 1400 Å. The 1400 Å one is applied to
 * λL1350, the nearest band this project measures, without a correction (λL1350 and λL1400
 * differ by ~2 % for a typical quasar UV slope α_ν ≈ −0.44, well below the scatter of k).
 */
export const NETZER19: Readonly<Record<ContinuumBand, Netzer19Correction>> = {
  l5100: { band: 'l5100', lambdaAngstrom: 5100, c: 40, d: -0.2, reference: REF, notes: CONFIRM },
  l3000: { band: 'l3000', lambdaAngstrom: 3000, c: 19, d: -0.2, reference: REF, notes: CONFIRM },
  l1350: { band: 'l1350', lambdaAngstrom: 1400, c: 7, d: -0.1, reference: REF, notes: `${CONFIRM} Derived at 1400 Å, applied to λL1350.` },
};

/** log10 of the luminosity pivot of Netzer 2019's form, erg s⁻¹. */
export const NETZER19_LOG_PIVOT = 42;

/**
 * log10 L_bol with Netzer 2019's correction: log λL + log c + d (log λL − 42).
 * @param band - which continuum λL_λ is given.
 * @param logLamL - log10 λL_λ, erg s⁻¹.
 * @returns log10 L_bol, erg s⁻¹.
 */
export function logLbolNetzer19(band: ContinuumBand, logLamL: number): number {
  const k = NETZER19[band];
  return logLamL + log10(k.c) + k.d * (logLamL - NETZER19_LOG_PIVOT);
}
