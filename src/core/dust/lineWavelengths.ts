import type { LineId } from '../derive/types.ts';

/** A rest-frame line wavelength as a cited record. */
export interface LineWavelength {
  readonly line: LineId;
  /** Vacuum rest wavelength, Å. */
  readonly vacuumAngstrom: number;
  /** Where the value comes from. */
  readonly reference: string;
}

const VB01 =
  'Vanden Berk et al. 2001, AJ 122, 549, Table 2 (laboratory vacuum wavelengths of the SDSS composite; transcribed from memory, values agree with the SDSS spectroscopic line list)';

/**
 * Vacuum rest wavelengths of the broad lines, Å. Vacuum throughout: the dust curves are
 * evaluated at these, and the air values (Hα 6562.8, Hβ 4861.3) differ by 0.03 %, which
 * moves k(λ) by about 1e-3.
 */
export const LINE_WAVELENGTHS: Readonly<Record<LineId, LineWavelength>> = {
  halpha: { line: 'halpha', vacuumAngstrom: 6564.61, reference: VB01 },
  hbeta: { line: 'hbeta', vacuumAngstrom: 4862.68, reference: VB01 },
  mgii: { line: 'mgii', vacuumAngstrom: 2798.75, reference: `${VB01}; Mg II λλ2796,2803 doublet, blended` },
  civ: { line: 'civ', vacuumAngstrom: 1549.06, reference: `${VB01}; C IV λλ1548,1551 doublet, blended` },
};

/**
 * Vacuum rest wavelength of a broad line, Å.
 * @param line - the line id ('halpha' | 'hbeta' | 'mgii' | 'civ').
 */
export function lineWavelengthAngstrom(line: LineId): number {
  return LINE_WAVELENGTHS[line].vacuumAngstrom;
}
