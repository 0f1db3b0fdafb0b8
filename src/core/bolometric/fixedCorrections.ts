/** The continuum bands a bolometric correction applies to (λL_λ at 5100, 3000, 1350 Å). */
import { log10 } from '../math/index.ts';
export type ContinuumBand = 'l5100' | 'l3000' | 'l1350';

/** A constant bolometric correction L_bol = BC · λL_λ as a cited record. */
export interface FixedBolometricCorrection {
  readonly id: string;
  readonly band: ContinuumBand;
  /** BC = L_bol / λL_λ (dimensionless). */
  readonly bc: number;
  readonly reference: string;
}

const SHEN11 = 'Shen et al. 2011, ApJS 194, 45 (bolometric luminosities; section not rechecked): from the Richards et al. 2006 (ApJS 166, 470) mean quasar SED';

/** Shen et al. 2011's corrections from the Richards et al. 2006 mean SED: 9.26, 5.15, 3.81. */
export const BC_SHEN11: Readonly<Record<ContinuumBand, FixedBolometricCorrection>> = {
  l5100: { id: 'shen11_bc5100', band: 'l5100', bc: 9.26, reference: SHEN11 },
  l3000: { id: 'shen11_bc3000', band: 'l3000', bc: 5.15, reference: SHEN11 },
  l1350: { id: 'shen11_bc1350', band: 'l1350', bc: 3.81, reference: SHEN11 },
};

/**
 * BC5100 = 10.33 (Richards et al. 2006 mean quasar SED), the value recent high-redshift
 * broad-Hα papers multiply the Hα-derived λL5100 by (e.g. Matthee et al. 2024, ApJ 963, 129).
 */
export const BC5100_RICHARDS06: FixedBolometricCorrection = {
  id: 'richards06_bc5100',
  band: 'l5100',
  bc: 10.33,
  reference: 'Richards et al. 2006, ApJS 166, 470 (mean quasar SED), as adopted by Matthee et al. 2024, ApJ 963, 129',
};

/**
 * log10 L_bol for a constant correction: log λL_λ + log10 BC.
 * @param logLamL - log10 λL_λ, erg s⁻¹.
 * @param bc - bolometric correction (> 0).
 * @returns log10 L_bol, erg s⁻¹.
 */
export function logLbolFixedBC(logLamL: number, bc: number): number {
  if (!(bc > 0)) throw new RangeError(`bolometric correction must be > 0, got ${bc}`);
  return logLamL + log10(bc);
}
