/**
 * Physical bounds a derived value must lie in to be written (common practice, no source):
 * black holes from 1e2 M_sun (below the lightest seeds) to 1e12 M_sun (above the most massive
 * known), bolometric luminosities from 1e38 erg/s (an Eddington-limited 1 M_sun star) to
 * 1e50 erg/s (far above the brightest quasars). Outside them the inputs are almost certainly
 * in the wrong units.
 */
export const PLAUSIBLE = {
  /** log10 M_BH / M_sun. */
  logMbh: [2, 12],
  /** log10 L_bol / (erg s⁻¹). */
  logLbol: [38, 50],
} as const satisfies Record<string, readonly [number, number]>;
