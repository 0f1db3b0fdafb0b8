import type { BolometricMethodId } from '../derive/types.ts';
import { BC_SHEN11, logLbolFixedBC, type ContinuumBand } from './fixedCorrections.ts';
import { logLbolNetzer19 } from './netzer19.ts';

/** The bolometric methods that start from a continuum luminosity. */
export type ContinuumBolometricMethod = Exclude<BolometricMethodId, 'halpha_gh05_bc5100'>;

const METHOD_BAND: Readonly<Record<'bc5100' | 'bc3000' | 'bc1350', ContinuumBand>> = {
  bc5100: 'l5100',
  bc3000: 'l3000',
  bc1350: 'l1350',
};

/** Options of logLbolFromContinuum. */
export interface ContinuumBolometricOptions {
  /** Band of `logLamL`. Required for 'netzer19'; for the fixed methods it must match if given. */
  band?: ContinuumBand;
  /** BC5100 for 'bc5100' (default 9.26, Shen et al. 2011; DeriveSettings.bc5100 is passed here). */
  bc5100?: number;
}

/**
 * log10 L_bol from a continuum luminosity.
 * 'bc5100' | 'bc3000' | 'bc1350': constant corrections (9.26 or `bc5100`, 5.15, 3.81; Shen et al. 2011);
 * 'netzer19': Netzer 2019 luminosity-dependent correction for `opts.band`.
 * @param method - bolometric method (not 'halpha_gh05_bc5100': use logLbolFromHalpha).
 * @param logLamL - log10 λL_λ, erg s⁻¹.
 * @param opts - band and BC5100.
 * @returns log10 L_bol, erg s⁻¹.
 */
export function logLbolFromContinuum(
  method: ContinuumBolometricMethod,
  logLamL: number,
  opts: ContinuumBolometricOptions = {},
): number {
  if (method === 'netzer19') {
    if (!opts.band) throw new Error("bolometric method 'netzer19' needs the continuum band (l5100, l3000 or l1350)");
    return logLbolNetzer19(opts.band, logLamL);
  }
  const band = METHOD_BAND[method];
  if (!band) throw new Error(`unknown continuum bolometric method '${String(method)}' (known: bc5100, bc3000, bc1350, netzer19)`);
  if (opts.band && opts.band !== band) throw new Error(`bolometric method '${method}' needs ${band}, got ${opts.band}`);
  const bc = method === 'bc5100' ? (opts.bc5100 ?? BC_SHEN11.l5100.bc) : BC_SHEN11[band].bc;
  return logLbolFixedBC(logLamL, bc);
}
