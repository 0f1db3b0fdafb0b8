/**
 * The site's one number formatter. Every page, table, chart hover and legend prints catalog
 * values through it, so a quantity has the same digits everywhere: logs to 0.01 dex,
 * redshifts to 0.001, distances in whole Mpc, widths in whole km/s, fluxes and linear
 * luminosities as `2.35×10⁻¹⁸`, other numbers to three significant figures. Negative numbers
 * take the proper minus sign (U+2212). Text is returned as it is, missing as an em dash.
 * Pure: the build (object pages) and the browser (tables, charts) both use it.
 */

/** The text shown for a missing value. */
export const MISSING = '—';

/** The minus sign printed for negative numbers (U+2212, not the hyphen). */
export const MINUS = '−';

/** Logarithmic quantities (dex) and their percentiles, also under names a query gives them (median_log_x, p16). */
const isLog = (c: string) => /(^|_)log(_|$)/.test(c) || /(^|_)p(16|50|84)$/.test(c);

const SUPERSCRIPT: Record<string, string> = { '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '-': '⁻' };

/** `text` (a number printed by JavaScript) with the hyphen of a negative sign replaced by the minus sign. */
export function withMinus(text: string): string {
  return text.replace(/^-/, MINUS).replace(/([(\s=<>])-(?=\d)/g, `$1${MINUS}`);
}

/** `v` to `digits` decimals, with the minus sign, and never "−0.00". */
export function formatFixed(v: number, digits: number): string {
  const s = v.toFixed(digits);
  return /^-0\.?0*$/.test(s) ? s.slice(1) : withMinus(s);
}

/** `v` in scientific notation with `digits` decimals: 2.35×10⁻¹⁸. */
export function formatScientific(v: number, digits = 2): string {
  const [m, e] = v.toExponential(digits).split('e');
  const exp = String(Number(e));
  if (exp === '0') return withMinus(m!);
  return `${withMinus(m!)}×10${exp.replace(/[-0-9]/g, (c) => SUPERSCRIPT[c]!)}`;
}

/** Three significant figures; scientific notation outside 10⁻³ … 10⁵; integers as they are. */
export function formatGeneral(v: number): string {
  const a = Math.abs(v);
  if (a === 0) return '0';
  if (Number.isInteger(v) && a < 1e7) return withMinus(String(v));
  if (a >= 1e5 || a < 1e-3) return formatScientific(v, 2);
  if (a >= 100) return formatFixed(v, 0);
  return withMinus(String(Number(v.toPrecision(3))));
}

/** A count of things, grouped by thousands: 1,000,000. */
export function formatCount(n: number): string {
  return withMinus(n.toLocaleString('en'));
}

/** How a numeric column is printed, by its name. */
function numberFor(c: string, value: number): string {
  if (c === 'row' || /(^|_)(count|n|objects|rows)$/.test(c)) return Number.isInteger(value) ? withMinus(String(value)) : formatFixed(value, 1);
  if (c === 'z' || c.startsWith('z_') || c.endsWith('_z')) return formatFixed(value, 3);
  if (c === 'ra' || c === 'dec') return formatFixed(value, 5);
  if (c === 'dl_mpc' || c.endsWith('_mpc')) return formatFixed(value, 0);
  if (/^fwhm_/.test(c) || c === 'sigma_star' || c.startsWith('sigma_star_')) return formatFixed(value, 0);
  if (/^(flux|lum|lam_l)_/.test(c)) return formatScientific(value, 2);
  // A probability that rounds to 0 or 1 but is neither says so: 2 draws in 2000 are not "0.00".
  if (c.startsWith('p_') && value > 0 && value < 0.005) return '< 0.01';
  if (c.startsWith('p_') && value < 1 && value > 0.995) return '> 0.99';
  if (isLog(c) || c.startsWith('p_') || c === 'local_offset_sigma' || c === 'age_gyr' || c === 'mu' || c === 'av' || c.startsWith('av_') || c.startsWith('balmer_decrement')) return formatFixed(value, 2);
  return formatGeneral(value);
}

/** `value` of column `column` as display text. */
export function formatValue(column: string, value: unknown): string {
  if (value === null || value === undefined || value === '') return MISSING;
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'bigint') return withMinus(value.toString());
  if (typeof value === 'string' && column.toLowerCase() === 'flags') return value.split(',').map((s) => s.trim()).filter(Boolean).join(', ');
  if (typeof value !== 'number') return String(value);
  if (!Number.isFinite(value)) return Number.isNaN(value) ? MISSING : value > 0 ? '∞' : `${MINUS}∞`;
  return numberFor(column.toLowerCase(), value);
}

/** True when the column's values are numbers (right-aligned in tables). */
export function isNumericType(type: string): boolean {
  return /float|double|int|decimal|real|numeric/i.test(type);
}
