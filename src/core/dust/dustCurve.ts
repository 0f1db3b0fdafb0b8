import type { DustCurveId } from '../derive/types.ts';

/** What every dust curve record carries, whatever its functional form. */
export interface DustCurveInfo {
  readonly id: DustCurveId;
  /** Short human-readable name. */
  readonly label: string;
  /** Total-to-selective ratio R_V = A_V / E(B−V) of the curve (dimensionless). */
  readonly rv: number;
  /** Wavelength range over which the curve is defined, Å (inclusive). */
  readonly validityAngstrom: readonly [number, number];
  /** Paper, journal, volume, page and equation/table. */
  readonly reference: string;
  /** Caveats: what is transcribed from memory, what was adapted. */
  readonly notes?: string;
}

/**
 * Throws a one-line RangeError when `lambdaAngstrom` lies outside the curve's range.
 * @param curve - the curve record.
 * @param lambdaAngstrom - rest wavelength, Å.
 */
export function assertInCurveRange(curve: DustCurveInfo, lambdaAngstrom: number): void {
  const [lo, hi] = curve.validityAngstrom;
  if (!(lambdaAngstrom >= lo && lambdaAngstrom <= hi)) {
    throw new RangeError(
      `dust curve '${curve.id}': wavelength ${lambdaAngstrom} Å is outside its range ${lo}–${hi} Å`,
    );
  }
}
