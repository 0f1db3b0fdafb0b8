import type { Cosmology } from '../cosmology/cosmology.ts';
import { lineWavelengthAngstrom } from '../dust/lineWavelengths.ts';
import type { LineId } from '../derive/types.ts';
import { fluxLimitAt } from './fluxLimitAt.ts';
import type { FluxLimit } from './surveySpec.ts';

/** One object's detection-line measurement, as the survey saw it (observed: before magnification and dust corrections). */
export interface DetectionLine {
  readonly z: number;
  readonly line: LineId;
  /** Observed broad-line flux, erg s⁻¹ cm⁻². */
  readonly fluxObsCgs: number;
  /** Its 1σ error, erg s⁻¹ cm⁻² (sets the S/N criterion; 0 or absent: no S/N criterion). */
  readonly fluxErrCgs?: number;
}

/** Grid used to find where a tabulated limit crosses the object's flux curve. */
const SCAN_STEPS = 256;

/**
 * The redshift intervals, inside [zMin, zMax], over which the same object (same luminosity,
 * same attenuation and magnification) would still pass a field's detection threshold:
 * F(z') = F_obs (D_L(z)/D_L(z'))² ≥ max(F_lim(λ_rest (1+z')), minSnr·σ_F). The noise σ_F is
 * held fixed (a background-limited spectrum), so the S/N criterion is a flux floor.
 * @param cosmo - the cosmology (D_L in Mpc).
 * @param obj - the object's detection line.
 * @param limit - the field's limit for that line.
 * @param window - the line's redshift window in the spectrograph.
 * @param minSnr - smallest S/N counted as a detection.
 */
export function detectableIntervals(
  cosmo: Cosmology,
  obj: DetectionLine,
  limit: FluxLimit,
  window: { zMin: number; zMax: number },
  minSnr: number,
): Array<[number, number]> {
  const rest = lineWavelengthAngstrom(obj.line);
  const floor = minSnr * (obj.fluxErrCgs ?? 0);
  const dl = cosmo.luminosityDistanceMpc(obj.z);
  // g(z') > 0 where detectable; ln form keeps it smooth for bisection.
  const g = (zp: number): number => {
    const lim = Math.max(fluxLimitAt(limit, rest * (1 + zp)), floor);
    if (!Number.isFinite(lim)) return -Infinity;
    const ratio = dl / cosmo.luminosityDistanceMpc(zp);
    return Math.log(obj.fluxObsCgs * ratio * ratio) - Math.log(lim);
  };
  const { zMin, zMax } = window;
  // zMin = 0 would put D_L = 0 in a denominator: start just above it (no volume is lost).
  const lo = Math.max(zMin, 1e-8);
  if (!(zMax > lo)) return [];
  const crossing = (a: number, b: number): number => {
    let ga = g(a);
    for (let i = 0; i < 80 && b - a > 1e-12 * b; i++) {
      const m = 0.5 * (a + b);
      const gm = g(m);
      if (gm > 0 === ga > 0) { a = m; ga = gm; } else b = m;
    }
    return 0.5 * (a + b);
  };
  // A constant limit makes g strictly decreasing: one crossing at most, found directly.
  const steps = limit.kind === 'constant' ? 1 : SCAN_STEPS;
  const out: Array<[number, number]> = [];
  let a = lo;
  let ga = g(a);
  let start: number | null = ga > 0 ? a : null;
  for (let i = 1; i <= steps; i++) {
    const b = lo + ((zMax - lo) * i) / steps;
    const gb = g(b);
    if (ga > 0 !== gb > 0) {
      const c = crossing(a, b);
      if (gb > 0) start = c;
      else if (start !== null) { out.push([start, c]); start = null; }
    }
    a = b;
    ga = gb;
  }
  if (start !== null) out.push([start, zMax]);
  return out;
}
