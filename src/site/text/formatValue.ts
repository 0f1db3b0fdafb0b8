/**
 * How a catalog value is printed: numbers to the precision the quantity deserves (logs to
 * 0.01 dex, redshifts to 0.001, fluxes in scientific notation), text as it is, missing as an
 * em dash. Pure: the build (object pages) and the browser (result table) both use it.
 */

/** The text shown for a missing value. */
export const MISSING = '—';

/** Logarithmic quantities (dex) and their percentiles, also under names a query gives them (median_log_x, p16). */
const isLog = (c: string) => /(^|_)log(_|$)/.test(c) || /(^|_)p(16|50|84)$/.test(c);

/** `value` of column `column` as display text. */
export function formatValue(column: string, value: unknown): string {
  if (value === null || value === undefined || value === '') return MISSING;
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'bigint') return value.toString();
  if (typeof value === 'string' && column.toLowerCase() === 'flags') return value.split(',').filter(Boolean).join(', ');
  if (typeof value !== 'number') return String(value);
  if (!Number.isFinite(value)) return Number.isNaN(value) ? MISSING : value > 0 ? '∞' : '−∞';
  const c = column.toLowerCase();
  if (c === 'row' || /(^|_)(count|n|objects|rows)$/.test(c)) return Number.isInteger(value) ? String(value) : value.toFixed(1);
  if (c === 'z' || c.startsWith('z_') || c.endsWith('_z')) return value.toFixed(3);
  if (c === 'ra' || c === 'dec') return value.toFixed(5);
  if (isLog(c) || c.startsWith('p_') || c === 'local_offset_sigma' || c === 'age_gyr' || c === 'mu') return fixed(value, 2);
  return general(value);
}

function fixed(v: number, digits: number): string {
  const s = v.toFixed(digits);
  return /^-0\.0*$/.test(s) ? s.slice(1) : s;
}

/** Three significant figures; scientific notation outside 10^-3 … 10^5; integers above 100 without decimals. */
function general(v: number): string {
  const a = Math.abs(v);
  if (a === 0) return '0';
  if (Number.isInteger(v) && a < 1e7) return String(v);
  if (a >= 1e5 || a < 1e-3) return v.toExponential(2).replace('e+', 'e');
  if (a >= 100) return v.toFixed(0);
  return String(Number(v.toPrecision(3)));
}

/** True when the column's values are numbers (right-aligned in tables). */
export function isNumericType(type: string): boolean {
  return /float|double|int|decimal|real|numeric/i.test(type);
}
