/**
 * The charts' own colours. Chosen so that the roles stay apart for the common colour-vision
 * deficiencies (blue against orange, dark against light) and never carried by colour alone:
 * every role also has its own symbol, size, outline or dash.
 */
export const PALETTE = {
  /** Text, axes, outlines. */
  ink: '#20262c',
  /** Catalog objects. */
  population: '#2f6a86',
  /** Highlighted catalog objects (drawn larger, with an ink outline). */
  highlight: '#e4572e',
  /** New objects from the compare page (star symbol). */
  extra: '#b0226b',
  /** The catalog's chosen local relation and its scatter band. */
  relationChosen: '#3a3a3a',
  /** Other local relations shown for comparison. */
  relationOther: '#9a7410',
  /** Reference lines (constant Eddington ratio). */
  guide: '#7c858d',
  /** Growth from a light seed. */
  seedLight: '#4f7f2a',
  /** Growth from a heavy seed. */
  seedHeavy: '#7a4b9c',
  /** Broad Hα points (circles). */
  halpha: '#2f6a86',
  /** Broad Hβ points (triangles). */
  hbeta: '#b08a1e',
  /** Density: from few to many objects per cell. */
  densityLow: '#e6eef2',
  densityHigh: '#143f55',
} as const;
