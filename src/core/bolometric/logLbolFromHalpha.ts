import { logL5100FromLogLHalpha } from '../virial/lineContinuumRelations.ts';
import { BC5100_RICHARDS06, logLbolFixedBC } from './fixedCorrections.ts';

export { logL5100FromLogLHalpha } from '../virial/lineContinuumRelations.ts';

/**
 * log10 L_bol from the broad Hα luminosity: λL5100 from Greene & Ho 2005 eq. 1 inverted,
 * times BC5100 (default 10.33, Richards et al. 2006), as in recent high-redshift papers.
 * @param logLHalpha - log10 L(broad Hα), erg s⁻¹, corrected for dust and magnification.
 * @param bc5100 - bolometric correction at 5100 Å (default 10.33).
 * @returns log10 L_bol, erg s⁻¹.
 */
export function logLbolFromHalpha(logLHalpha: number, bc5100: number = BC5100_RICHARDS06.bc): number {
  return logLbolFixedBC(logL5100FromLogLHalpha(logLHalpha), bc5100);
}
