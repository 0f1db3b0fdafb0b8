/**
 * Galaxy stellar mass functions as cited records: Schechter (1976) functions in log M*,
 * Φ(m) dm = ln 10 · φ* · 10^{(m − m*)(1 + α)} · exp(−10^{m − m*}) dm, per comoving Mpc³ per dex.
 * The selection-aware fit uses only their shape (α, m*): the normalisation cancels in a
 * likelihood conditioned on detection.
 */
export interface StellarMassFunction {
  readonly id: string;
  readonly label: string;
  /** Redshift the fit describes. */
  readonly z: number;
  /** log10 of the characteristic mass, M_sun. */
  readonly logMchar: number;
  /** Low-mass slope. */
  readonly alpha: number;
  /** log10 φ*, Mpc⁻³ dex⁻¹. */
  readonly logPhiStar: number;
  readonly reference: string;
  readonly provenance: 'published' | 'from memory';
  readonly notes?: string;
}

const SONG16 = 'Song et al. 2016, ApJ 825, 5, Table 2 (Schechter fits; Salpeter-to-Chabrier conventions as in the paper)';

/**
 * Song et al. 2016 at z = 4–8. The low-mass slopes at z = 4 (−1.55) and z = 8 (−2.25) are stated in the paper's
 * abstract; the other values are transcribed from memory of its Table 2 and must be confirmed against it.
 */
export const STELLAR_MASS_FUNCTIONS: readonly StellarMassFunction[] = [
  { id: 'song16_z4', label: 'Song et al. 2016, z = 4', z: 4, logMchar: 10.5, alpha: -1.55, logPhiStar: -3.94, reference: SONG16, provenance: 'from memory', notes: 'α published in the abstract; m* and φ* from memory.' },
  { id: 'song16_z5', label: 'Song et al. 2016, z = 5', z: 5, logMchar: 10.97, alpha: -1.7, logPhiStar: -4.78, reference: SONG16, provenance: 'from memory' },
  { id: 'song16_z6', label: 'Song et al. 2016, z = 6', z: 6, logMchar: 10.72, alpha: -1.91, logPhiStar: -5.09, reference: SONG16, provenance: 'from memory' },
  { id: 'song16_z7', label: 'Song et al. 2016, z = 7', z: 7, logMchar: 10.78, alpha: -1.95, logPhiStar: -5.73, reference: SONG16, provenance: 'from memory' },
  { id: 'song16_z8', label: 'Song et al. 2016, z = 8', z: 8, logMchar: 10.72, alpha: -2.25, logPhiStar: -5.77, reference: SONG16, provenance: 'from memory', notes: 'α published in the abstract; m* and φ* from memory.' },
];

/**
 * The record whose redshift is nearest to z (ties go to the lower redshift).
 * @param z - redshift.
 * @param set - records to choose from (default: Song et al. 2016).
 */
export function stellarMassFunctionAt(z: number, set: readonly StellarMassFunction[] = STELLAR_MASS_FUNCTIONS): StellarMassFunction {
  let best = set[0] as StellarMassFunction;
  for (const r of set) if (Math.abs(r.z - z) < Math.abs(best.z - z)) best = r;
  return best;
}

/**
 * Schechter number density per dex at log M* = m, Mpc⁻³ dex⁻¹.
 * @param smf - the record.
 * @param m - log10 M*, M_sun.
 */
export function schechterPerDex(smf: StellarMassFunction, m: number): number {
  const x = 10 ** (m - smf.logMchar);
  return Math.LN10 * 10 ** smf.logPhiStar * x ** (1 + smf.alpha) * Math.exp(-x);
}
