import { MINUS } from './formatValue.ts';

/**
 * Right ascension in degrees as hours, minutes and seconds of time, `hh:mm:ss.ss` (0.01 s, i.e.
 * 0.15″ at the equator). Rounded once on the total, so 59.996 s carries into the minute; 360° and
 * anything that rounds to 24 h is written 00:00:00.00. Null for a value outside [0, 360] or not finite.
 * @param raDeg - right ascension (degrees, 0–360).
 */
export function formatRaHms(raDeg: number): string | null {
  if (!Number.isFinite(raDeg) || raDeg < 0 || raDeg > 360) return null;
  const centis = Math.round(raDeg * 24000) % (24 * 360000);
  const h = Math.floor(centis / 360000);
  const m = Math.floor((centis % 360000) / 6000);
  const cs = centis % 6000;
  return `${pad(h)}:${pad(m)}:${pad(Math.floor(cs / 100))}.${pad(cs % 100)}`;
}

/**
 * Declination in degrees as signed degrees, arcminutes and arcseconds, `±dd:mm:ss.s` (0.1″),
 * rounded once on the total. The sign is always written (+ or the minus sign U+2212, as every
 * number on the site); a value that rounds to zero is +00:00:00.0. Null outside [−90, 90] or not finite.
 * @param decDeg - declination (degrees, −90–90).
 */
export function formatDecDms(decDeg: number): string | null {
  if (!Number.isFinite(decDeg) || decDeg < -90 || decDeg > 90) return null;
  const tenths = Math.round(Math.abs(decDeg) * 36000);
  const d = Math.floor(tenths / 36000);
  const m = Math.floor((tenths % 36000) / 600);
  const ts = tenths % 600;
  const sign = decDeg < 0 && tenths > 0 ? MINUS : '+';
  return `${sign}${pad(d)}:${pad(m)}:${pad(Math.floor(ts / 10))}.${ts % 10}`;
}

const pad = (n: number): string => String(n).padStart(2, '0');
