/**
 * Names of the INVENTED survey behind the demo catalog: the survey, its id prefix, its
 * fields (centres chosen away from well-known deep fields), its programme tags and the
 * short notes its team leaves on objects. None of these is a real survey, field, team,
 * instrument or person.
 */

/** The invented survey. */
export const DEMO_SURVEY = {
  name: 'Cinderwake Deep Near-Infrared Spectroscopic Survey',
  short: 'CINDERWAKE',
  idPrefix: 'CDW',
  group: 'Cinderwake Collaboration',
} as const;

/** An invented survey field: centre (deg, ICRS) and half side of the area covered (deg). */
export interface DemoField {
  name: string;
  raDeg: number;
  decDeg: number;
  halfSideDeg: number;
  /** Relative share of the un-lensed objects. */
  weight: number;
  /** True for the field behind a massive foreground cluster, where lensed objects live. */
  lensingCluster: boolean;
}

export const DEMO_FIELDS: readonly DemoField[] = [
  { name: 'QUILLMERE', raDeg: 47.318, decDeg: -21.774, halfSideDeg: 0.09, weight: 0.34, lensingCluster: false },
  { name: 'ASHFEN-DEEP', raDeg: 212.604, decDeg: 38.412, halfSideDeg: 0.08, weight: 0.28, lensingCluster: false },
  { name: 'TALLOWGATE', raDeg: 128.871, decDeg: 5.236, halfSideDeg: 0.07, weight: 0.26, lensingCluster: false },
  { name: 'HEARTHSTONE-CL', raDeg: 301.427, decDeg: -44.695, halfSideDeg: 0.035, weight: 0.12, lensingCluster: true },
];

/** Invented programme tags: survey tier and spectral resolution. */
export const DEMO_PROGRAMS = {
  deep: 'cdw-tier1-medres',
  wide: 'cdw-tier2-lowres',
  lens: 'cdw-lens-followup',
} as const;

/** Notes for any object. Some contain commas and double quotes on purpose (CSV quoting). */
export const NOTES_ANY: readonly string[] = [
  'compact, red continuum',
  'unresolved in the reddest imaging band',
  'v-shaped continuum; "kink" near the Balmer limit',
  'neighbour 0.6" to the north-east, deblended',
  'slit loss corrected, 12%',
  'two visits stacked',
  'near a detector gap, flux "approx." within 10%',
  'candidate pair, separation 1.1"',
  'X-ray weak (no detection in archival stack)',
  'narrow lines weak',
];

/** Notes for objects measured in broad Hα. */
export const NOTES_HALPHA: readonly string[] = [
  'broad Hα with narrow absorption on the blue side',
  'Hα broad "wing" stronger on the red side, fit with two Gaussians',
  'broad Hα; [N II] not resolved',
];

/** Notes for objects measured in broad Hβ (7 < z ≤ 9.8). */
export const NOTES_HBETA: readonly string[] = [
  'Hβ only; Hα beyond the red edge',
  'broad Hβ next to [O III] 4959, deblended',
];

/** Notes for objects measured in Mg II (z > 9.8). */
export const NOTES_MGII: readonly string[] = [
  'Mg II only; both Balmer lines beyond the red edge',
  'broad Mg II, absorption trough on the blue side',
];

/** Notes for objects whose broad flux is an upper limit. */
export const NOTES_LIMIT: readonly string[] = [
  'broad component tentative, 3σ limit',
  'broad wing below 3σ; FWHM from the stacked visits',
];

/** Notes for lensed objects. */
export const NOTES_LENSED: readonly string[] = [
  'image "a" of a triple, lens model v3',
  'magnified arc, counter-image faint',
  'lensed; μ from the cluster model, "b" image masked',
];

/** Share of objects that get no note at all. */
export const NOTE_EMPTY_FRACTION = 0.45;
