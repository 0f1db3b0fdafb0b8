/**
 * An object's position for its page: right ascension and declination in degrees, as stored
 * (every digit the catalog holds), and in sexagesimal (hh:mm:ss.ss, ±dd:mm:ss.s). Pure.
 */
import { formatDecDms, formatRaHms } from '../text/sexagesimal.ts';
import { withMinus } from '../text/formatValue.ts';
import type { CatalogRow } from './loadCatalog.ts';

export interface ObjectPosition {
  /** Degrees as stored, shortest round-trip decimal: '47.342485', '−21.696102'. */
  raDeg: string;
  decDeg: string;
  /** Sexagesimal: '03:09:22.20', '−21:41:46.0'. */
  raHms: string;
  decDms: string;
}

/** The position of `row` from its `ra` and `dec` columns (degrees); null unless both are numbers in range. */
export function objectPosition(row: CatalogRow): ObjectPosition | null {
  const { ra, dec } = row;
  if (typeof ra !== 'number' || typeof dec !== 'number') return null;
  const raHms = formatRaHms(ra);
  const decDms = formatDecDms(dec);
  if (raHms === null || decDms === null) return null;
  return { raDeg: withMinus(String(ra)), decDeg: withMinus(String(dec)), raHms, decDms };
}
