import type { LineId } from '../derive/types.ts';

/**
 * Which width the virial mass uses:
 * - `measured`: the FWHM as measured (`fwhm_<line>`);
 * - `core`: the intrinsic core width from `fwhm_<line>_core` where the catalog has it; objects
 *   without one fall back to the measured width divided by `fallbackDeflation` and are flagged;
 * - `deflated`: the measured width divided by `deflation` for every object.
 */
export type WidthChoice =
  | { readonly mode: 'measured' }
  | { readonly mode: 'core'; readonly fallbackDeflation: number; readonly deflationSource: string }
  | { readonly mode: 'deflated'; readonly deflation: number; readonly deflationSource: string };

/**
 * Which bolometric luminosity:
 * - `standard`: the configured method and corrections;
 * - `l5100_ratio`: L_bol = `ratio` × λL5100 wherever L_bol comes from λL5100 (measured or estimated from a broad line);
 * - `line_factors`: the broad-line routes divided by `halpha` (Hα) or `hbeta` (Hβ).
 */
export type BolometricChoice =
  | { readonly mode: 'standard' }
  | { readonly mode: 'l5100_ratio'; readonly ratio: number; readonly source: string }
  | { readonly mode: 'line_factors'; readonly halpha: number; readonly hbeta: number; readonly source: string };

/**
 * A reading of the broad lines as a cited data record: what it assumes about the physics, who
 * published it, and exactly what it changes in the derivation. Everything it does not name is
 * taken from the run's settings (the `standard` reading changes nothing).
 */
export interface Reading {
  /** Plain lower-case id: letters, digits and '_'. */
  readonly id: string;
  readonly label: string;
  /** One sentence: the physical premise. */
  readonly premise: string;
  readonly references: readonly string[];
  /** Virial calibration per line, where the reading names one (ids of src/core/virial/calibrations.ts). */
  readonly calibrations: Partial<Readonly<Record<LineId, string>>>;
  readonly width: WidthChoice;
  readonly bolometric: BolometricChoice;
  /** `standard`: A_V or the Balmer decrement as configured; `none`: no dust correction (collisional Balmer ratios are not dust). */
  readonly dust: 'standard' | 'none';
  /** Radiative efficiency ε and duty cycle, where the reading sets them. */
  readonly growth: { readonly efficiency?: number; readonly dutyCycle?: number };
}
