/**
 * One object's row arranged for its page: the measured inputs with their errors and units,
 * the derived values with their 16–84 per cent intervals, the other columns the group
 * passed through, and the flags in words. Pure; formatting happens here so the page only
 * places text.
 */
import { columnLabel, unitText } from '../text/columnLabels.ts';
import { flagText, splitFlags } from '../text/flagText.ts';
import { formatValue, MISSING } from '../text/formatValue.ts';
import { limitMark } from '../text/limitMark.ts';
import type { CatalogRow } from './loadCatalog.ts';
import { objectPosition, type ObjectPosition } from './objectPosition.ts';
import type { SiteMeta } from './siteMeta.ts';

export interface ViewLine {
  column: string;
  label: string;
  value: string;
  /** '± 0.3', '+0.2 / −0.1', a 16–84 interval '6.9 – 7.7', or ''. */
  spread: string;
  unit: string;
  description: string;
  /** True when the value is an upper limit. */
  limit?: boolean;
  /** A derived bound: '<' upper or '>' lower limit (then `spread` is empty). */
  limitMark?: '<' | '>';
  /** True when the value is a number (right-aligned). */
  numeric: boolean;
}

/**
 * The text of a line's value cell: the value with "<" or ">" before a bound, and the words that
 * say which bound it is (shown muted after it). One function for the page built at build time and
 * the in-browser viewer, so both say it the same way.
 */
export function valueText(l: ViewLine): { text: string; note: string | null } {
  const text = l.limitMark ? `${l.limitMark} ${l.value}` : l.limit ? `< ${l.value}` : l.value;
  const note = l.limit || l.limitMark === '<' ? 'upper limit' : l.limitMark === '>' ? 'lower limit' : null;
  return { text, note };
}

export interface ObjectView {
  id: string;
  inputs: ViewLine[];
  derived: ViewLine[];
  other: ViewLine[];
  /** Right ascension and declination in degrees and sexagesimal, when the row has both (then they are in no table). */
  position: ObjectPosition | null;
  flags: { code: string; text: string }[];
}

/** Derived columns in page order; those with Monte Carlo percentiles show their 16–84 interval. */
export const DERIVED_ORDER = [
  'log_mbh', 'log_lbol', 'log_edd_ratio', 'p_super_eddington', 'log_mseed', 'lambda_req_light', 'lambda_req_heavy',
  'delta_log_mbh_local', 'local_offset_sigma', 'p_above_local', 'log_l5100', 'age_gyr', 'dl_mpc',
];
const METHOD_COLUMNS = new Set(['mbh_method', 'lbol_method', 'flags']);
const ERROR_SUFFIX = /_(err|err_lo|err_hi|is_limit)$/;
const PERCENTILE = /_p(16|50|84)$/;
const CANONICAL_INPUT =
  /^(z|(fwhm|flux|lum)_(halpha|hbeta|mgii|civ)|lam_l_(5100|3000|1350)|mu|log_mstar|sigma_star|av|balmer_decrement)$/;

function groupOf(column: string, meta: Pick<SiteMeta, 'columns'>): string {
  const g = meta.columns[column]?.group;
  if (g) return g;
  if (column === 'id' || column === 'row') return 'key';
  if (CANONICAL_INPUT.test(column) || (ERROR_SUFFIX.test(column) && CANONICAL_INPUT.test(column.replace(ERROR_SUFFIX, '')))) return 'input';
  if (DERIVED_ORDER.includes(column) || METHOD_COLUMNS.has(column) || PERCENTILE.test(column) || /^log_lum_/.test(column)) return 'derived';
  return 'passthrough';
}

const isNum = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

export function objectView(row: CatalogRow, columns: readonly string[], meta: Pick<SiteMeta, 'columns'>): ObjectView {
  const line = (column: string, spread = ''): ViewLine => ({
    column,
    label: columnLabel(column),
    value: formatValue(column, row[column]),
    spread,
    unit: unitText(meta.columns[column]?.unit),
    description: meta.columns[column]?.description ?? '',
    numeric: typeof row[column] === 'number',
  });

  const position = objectPosition(row);
  const placed = (c: string): boolean => position !== null && (c === 'ra' || c === 'dec');
  const inputs: ViewLine[] = [];
  for (const c of columns) {
    if (placed(c) || groupOf(c, meta) !== 'input' || ERROR_SUFFIX.test(c) || row[c] === null || row[c] === undefined) continue;
    const err = row[`${c}_err`];
    const lo = row[`${c}_err_lo`];
    const hi = row[`${c}_err_hi`];
    let spread = '';
    if (isNum(lo) && isNum(hi) && lo !== hi) spread = `+${formatValue(c, hi)} / −${formatValue(c, lo)}`;
    else if (isNum(err) && err > 0) spread = `± ${formatValue(c, err)}`;
    else if (isNum(lo) && lo > 0) spread = `± ${formatValue(c, lo)}`;
    inputs.push({ ...line(c, spread), limit: row[`${c}_is_limit`] === true });
  }

  const derived: ViewLine[] = [];
  const lineLums = columns.filter((c) => /^log_lum_/.test(c));
  const order = [...DERIVED_ORDER.slice(0, 10), ...lineLums, ...DERIVED_ORDER.slice(10)];
  for (const c of order) {
    if (!columns.includes(c)) continue;
    const p16 = row[`${c}_p16`];
    const p84 = row[`${c}_p84`];
    const mark = row[c] === null || row[c] === undefined ? '' : limitMark(c, row);
    // A bound never shows an interval, even from a catalog written before percentiles of bounds were left empty.
    if (mark) derived.push({ ...line(c, ''), limitMark: mark });
    else derived.push(line(c, isNum(p16) && isNum(p84) ? `${formatValue(c, p16)} – ${formatValue(c, p84)}` : ''));
  }

  const other: ViewLine[] = [];
  for (const c of columns) {
    if (c === 'id' || placed(c) || groupOf(c, meta) !== 'passthrough') continue;
    if (row[c] === null || row[c] === undefined || row[c] === '') continue;
    other.push(line(c));
  }

  const flags = splitFlags(row.flags).map((code) => ({ code, text: flagText(code) }));
  return { id: String(row.id ?? MISSING), inputs, derived, other, position, flags };
}
