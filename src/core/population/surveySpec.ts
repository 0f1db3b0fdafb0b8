import type { LineId } from '../derive/types.ts';

/**
 * The limiting broad-line flux of a field for one line: one value, or a table against observed
 * wavelength (a spectrograph's sensitivity curve, interpolated linearly; undetectable outside it).
 * Fluxes in erg s⁻¹ cm⁻², wavelengths in Å.
 */
export type FluxLimit =
  | { readonly kind: 'constant'; readonly fluxCgs: number }
  | { readonly kind: 'table'; readonly lamObsAngstrom: readonly number[]; readonly fluxCgs: readonly number[] };

/** One field of a survey. */
export interface SurveyField {
  readonly name: string;
  /** Image-plane area, arcmin². */
  readonly areaArcmin2: number;
  /**
   * Source-plane area behind a lensing cluster, arcmin² (smaller than the image-plane area).
   * When given, volumes use it: the common first-order lensing treatment of number counts.
   */
  readonly sourcePlaneAreaArcmin2?: number;
  /** Limiting flux per line; a line without one is not searched in this field. */
  readonly limits: Partial<Record<LineId, FluxLimit>>;
}

/** What a survey counts as a detection, and where it could see each line. */
export interface SurveySpec {
  readonly fields: readonly SurveyField[];
  /** Observed wavelength range of the spectrograph, Å. */
  readonly lamObsRangeAngstrom: readonly [number, number];
  /** Smallest broad-line FWHM counted as broad, km s⁻¹. */
  readonly minFwhmKms: number;
  /** Smallest broad-line S/N counted as a detection. */
  readonly minSnr: number;
}

const ARCMIN_PER_RAD = (180 * 60) / Math.PI;

/**
 * Solid angle of an area on the sky, steradian.
 * @param areaArcmin2 - area, arcmin².
 */
export function arcmin2ToSr(areaArcmin2: number): number {
  return areaArcmin2 / (ARCMIN_PER_RAD * ARCMIN_PER_RAD);
}

/**
 * The area a field's volumes are computed over: the source-plane area where given, else the image-plane area; sr.
 * @param field - the field.
 */
export function fieldSolidAngleSr(field: SurveyField): number {
  return arcmin2ToSr(field.sourcePlaneAreaArcmin2 ?? field.areaArcmin2);
}
