import { lineWavelengthAngstrom } from '../dust/lineWavelengths.ts';
import type { LineId } from '../derive/types.ts';

/**
 * The redshifts at which a broad line falls inside a spectrograph's observed range:
 * λ_obs = λ_rest (1 + z). `null` when the range misses the line at every z ≥ 0.
 * @param line - the line.
 * @param lamObsRangeAngstrom - observed wavelength range [min, max], Å (vacuum).
 */
export function lineRedshiftWindow(line: LineId, lamObsRangeAngstrom: readonly [number, number]): { zMin: number; zMax: number } | null {
  const rest = lineWavelengthAngstrom(line);
  const zMin = Math.max(0, lamObsRangeAngstrom[0] / rest - 1);
  const zMax = lamObsRangeAngstrom[1] / rest - 1;
  return zMax > zMin ? { zMin, zMax } : null;
}
