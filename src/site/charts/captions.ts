/** Caveats repeated in the chart captions and beside the compare page's result. */
export const CAVEATS = {
  mass: 'Black-hole masses are single-epoch virial estimates (±0.3–0.5 dex systematic, on top of the bars).',
  bars: 'Bars span the 16th–84th percentiles of the Monte Carlo (measurement errors and calibration scatter).',
  limits: 'Arrows mark upper limits.',
  lbol: 'L_bol comes from a bolometric correction, which adds its own systematic uncertainty.',
  lines: 'Line luminosities are corrected for magnification and dust as recorded in the catalog.',
} as const;

/** "Shows N objects" plus how many catalog rows lack the values to be placed. */
export function countNote(shown: number, unplaced: number, what: string): string {
  const s = `${shown} ${shown === 1 ? 'object' : 'objects'} shown`;
  return unplaced > 0 ? `${s}; ${unplaced} without ${what} not shown.` : `${s}.`;
}
