import type { FluxLimit } from './surveySpec.ts';

/**
 * The limiting flux at an observed wavelength, erg s⁻¹ cm⁻²; +∞ where a table does not reach.
 * @param limit - a constant or a table against observed wavelength (linear interpolation).
 * @param lamObsAngstrom - observed wavelength, Å.
 */
export function fluxLimitAt(limit: FluxLimit, lamObsAngstrom: number): number {
  if (limit.kind === 'constant') return limit.fluxCgs;
  const xs = limit.lamObsAngstrom;
  const ys = limit.fluxCgs;
  const n = xs.length;
  if (!(lamObsAngstrom >= (xs[0] as number) && lamObsAngstrom <= (xs[n - 1] as number))) return Infinity;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((xs[mid] as number) <= lamObsAngstrom) lo = mid;
    else hi = mid;
  }
  const x0 = xs[lo] as number;
  const x1 = xs[hi] as number;
  const t = x1 === x0 ? 0 : (lamObsAngstrom - x0) / (x1 - x0);
  return (ys[lo] as number) + t * ((ys[hi] as number) - (ys[lo] as number));
}
