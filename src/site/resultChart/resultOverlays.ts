/**
 * Reference overlays a chart of a query result can carry, and when: the local black-hole–host
 * relations where x is the stellar mass and y the black-hole mass, and lines of constant
 * Eddington ratio where x is the black-hole mass and y the bolometric luminosity. Both need
 * linear axes of the log quantities (the catalog's own units), since that is what the
 * relations are written in.
 */
import { percentileStem } from './intervalColumns.ts';

export type OverlayKind = 'local-relations' | 'eddington-lines';

/** The overlay the axes allow, or null. */
export function overlayFor(x: string, y: string, xLog: boolean, yLog: boolean): OverlayKind | null {
  if (xLog || yLog) return null;
  const sx = percentileStem(x);
  const sy = percentileStem(y);
  if (sx === 'log_mstar' && sy === 'log_mbh') return 'local-relations';
  if (sx === 'log_mbh' && sy === 'log_lbol') return 'eddington-lines';
  return null;
}

/** Words for the overlay, for the control and the caption. */
export const OVERLAY_TEXT: Record<OverlayKind, string> = {
  'local-relations': 'local black-hole–host relations (bands: intrinsic scatter)',
  'eddington-lines': 'lines of constant Eddington ratio λ',
};
