/**
 * Flags a reading adds to an object's own flags in the readings table, with the sentence a
 * reader sees for each.
 */
export const READING_FLAG_DESCRIPTIONS = {
  width_from_core: 'Under this reading the mass uses the intrinsic core width of the line (fwhm_<line>_core).',
  core_width_fallback:
    'This reading calls for a core width but the catalog has none for the mass line: the measured width divided by the reading\'s deflation factor was used.',
  width_deflated: 'Under this reading the mass uses the measured width divided by the reading\'s deflation factor.',
  dust_off_by_reading: 'This reading applies no dust correction: Balmer ratios are taken as collisional, not as reddening.',
  lbol_route_unchanged:
    'This reading\'s bolometric correction does not apply to the route this object\'s L_bol takes (see lbol_method); that route was used unchanged.',
} as const;

export type ReadingFlagId = keyof typeof READING_FLAG_DESCRIPTIONS;
