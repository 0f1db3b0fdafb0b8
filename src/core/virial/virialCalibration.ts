import type { LineId } from '../derive/types.ts';
import type { MassScale } from './massScale.ts';

/** Which luminosity a calibration takes: the line's own, or the continuum λL_λ at 5100, 3000 or 1350 Å. */
export type VirialLuminosityKind = 'line' | 'l5100' | 'l3000' | 'l1350';

/** Where a number came from, so a reader can weigh it. */
export type ValueProvenance = 'published' | 'from memory' | 'common practice';

/**
 * A single-epoch virial calibration as data, in the form
 * log M_BH = logEps + a + b·(log L − logLpivot) + c·(log FWHM − 3)
 * with M_BH in M_sun, L in erg s⁻¹ and FWHM in km s⁻¹.
 */
export interface VirialCalibration {
  readonly id: string;
  readonly line: LineId;
  readonly label: string;
  /** log10 of the virial factor folded in on top of `a` (0 when `a` already includes it). */
  readonly logEps: number;
  /** Zero point, dex. */
  readonly a: number;
  /** Luminosity slope. */
  readonly b: number;
  /** FWHM slope. */
  readonly c: number;
  readonly luminosity: VirialLuminosityKind;
  /** log10 of the luminosity pivot, erg s⁻¹. */
  readonly logLpivot: number;
  /** Intrinsic (systematic) scatter of the calibration, dex. */
  readonly scatterDex: number;
  readonly scatterProvenance: ValueProvenance;
  readonly reference: string;
  /** The mass scale the calibration's zero point rests on (compared with the local relation's). */
  readonly massScale: MassScale;
  /**
   * Where the calibration sample lies: log10 L in erg s⁻¹ (of the kind in `luminosity`) and
   * FWHM in km s⁻¹. Approximate ranges of the calibrating samples, not published limits.
   */
  readonly validity: { readonly logL: readonly [number, number]; readonly fwhmKms: readonly [number, number] };
  readonly notes?: string;
}

/**
 * Virial black-hole mass, log10 M_BH / M_sun. Takes logs so Monte Carlo loops stay in log space.
 * @param cal - the calibration record.
 * @param logL - log10 of the luminosity named by `cal.luminosity`, erg s⁻¹ (dust- and magnification-corrected).
 * @param logFwhmKms - log10 of the line FWHM, km s⁻¹.
 */
export function virialLogMass(cal: VirialCalibration, logL: number, logFwhmKms: number): number {
  return cal.logEps + cal.a + cal.b * (logL - cal.logLpivot) + cal.c * (logFwhmKms - 3);
}

/**
 * `out[k] = virialLogMass(cal, logL[k], logFwhmKms[k]) + scatter[k]` for every k, bit for bit:
 * the calibration's numbers are read once, not per draw (the optimizing compiler does not lift
 * property loads out of loops, and they made the Monte Carlo mass loop several times slower).
 * @param cal - the calibration record.
 * @param logL - log10 luminosities of the calibration's kind, erg s⁻¹, one per draw.
 * @param logFwhmKms - log10 FWHM, km s⁻¹, one per draw.
 * @param scatter - dex added to each mass (the calibration's intrinsic scatter drawn, or zeros).
 * @param out - receives log10 M_BH / M_sun; as long as `logL`.
 */
export function virialLogMassInto(cal: VirialCalibration, logL: Float64Array, logFwhmKms: Float64Array, scatter: Float64Array, out: Float64Array): void {
  // The same sums in the same order as virialLogMass: ((logEps + a) + b(L − pivot)) + c(log FWHM − 3).
  const zero = cal.logEps + cal.a;
  const b = cal.b;
  const pivot = cal.logLpivot;
  const c = cal.c;
  const n = out.length;
  const n4 = n - (n % 4);
  // Four draws per step: the compiler checks each array passed in at every access it cannot prove
  // repeated, so four accesses per array and step pay for those checks once (about twice as fast).
  for (let k = 0; k < n4; k += 4) {
    out[k] = zero + b * ((logL[k] as number) - pivot) + c * ((logFwhmKms[k] as number) - 3) + (scatter[k] as number);
    out[k + 1] = zero + b * ((logL[k + 1] as number) - pivot) + c * ((logFwhmKms[k + 1] as number) - 3) + (scatter[k + 1] as number);
    out[k + 2] = zero + b * ((logL[k + 2] as number) - pivot) + c * ((logFwhmKms[k + 2] as number) - 3) + (scatter[k + 2] as number);
    out[k + 3] = zero + b * ((logL[k + 3] as number) - pivot) + c * ((logFwhmKms[k + 3] as number) - 3) + (scatter[k + 3] as number);
  }
  for (let k = n4; k < n; k++) out[k] = zero + b * ((logL[k] as number) - pivot) + c * ((logFwhmKms[k] as number) - 3) + (scatter[k] as number);
}

/**
 * Whether (L, FWHM) lie inside the calibration sample's approximate range (inclusive).
 * @param cal - the calibration record.
 * @param logL - log10 luminosity of the calibration's kind, erg s⁻¹.
 * @param fwhmKms - FWHM, km s⁻¹ (linear).
 */
export function inCalibrationRange(cal: VirialCalibration, logL: number, fwhmKms: number): boolean {
  const { logL: l, fwhmKms: f } = cal.validity;
  return logL >= l[0] && logL <= l[1] && fwhmKms >= f[0] && fwhmKms <= f[1];
}
