/**
 * Which rows of a plotted column are limits, and which way, from the catalog's own markers:
 * the `<quantity>_is_limit` columns and the `flags` column (mbh_upper_limit, lbol_upper_limit,
 * edd_ratio_upper_limit, edd_ratio_lower_limit) for the derived quantities (the mass, L_bol,
 * λ_Edd and what rests on the mass: seed mass, required ratios, offset from the local relation),
 * and the `flux_<line>_is_limit` columns for a line's flux and the luminosity made from it.
 */
import { splitFlags } from '../text/flagText.ts';
import { LIMIT_COLUMN } from '../text/limitMark.ts';
import { percentileStem } from './intervalColumns.ts';

export type LimitKind = 'upper' | 'lower';

/** How to read limits of one column: the flags or limit column it takes them from. */
export interface LimitRule {
  /** Flags meaning an upper limit, and a lower limit, on this column. */
  upperFlags: readonly string[];
  lowerFlags: readonly string[];
  /** A boolean column true where this column is an upper limit. */
  isLimitColumn?: string;
}

/** A derived column's rule: its upper-limit flags, lower-limit flags and `_is_limit` column (LIMIT_COLUMN). */
const derived = (column: string, upperFlags: readonly string[], lowerFlags: readonly string[] = []): LimitRule => ({
  upperFlags,
  lowerFlags,
  ...(LIMIT_COLUMN[column] ? { isLimitColumn: LIMIT_COLUMN[column] } : {}),
});

const FLAG_RULES: [RegExp, LimitRule][] = [
  [/^log_mbh$/, derived('log_mbh', ['mbh_upper_limit'])],
  [/^log_lbol$/, derived('log_lbol', ['lbol_upper_limit'])],
  [/^log_edd_ratio$/, derived('log_edd_ratio', ['edd_ratio_upper_limit'], ['edd_ratio_lower_limit'])],
  // quantities built on the mass are bounds where the mass is one
  ...(['log_mseed', 'lambda_req_light', 'lambda_req_heavy', 'delta_log_mbh_local', 'local_offset_sigma'] as const).map(
    (c): [RegExp, LimitRule] => [new RegExp(`^${c}$`), derived(c, ['mbh_upper_limit'])],
  ),
];

/** The limit rule of `column`, or null for a column whose values are never limits. */
export function limitRule(column: string): LimitRule | null {
  const stem = percentileStem(column);
  for (const [re, rule] of FLAG_RULES) if (re.test(stem)) return rule;
  const m = /^(?:flux|lum|log_lum)_(halpha|hbeta|mgii|civ|oiii)$/.exec(stem);
  if (m) return { upperFlags: [], lowerFlags: [], isLimitColumn: `flux_${m[1]}_is_limit` };
  return null;
}

/**
 * The limit kind of one row's value under `rule`, or null for a measurement. The `_is_limit`
 * column, when the row has it, says whether the value is a bound (its direction from the lower
 * limit flags, else upper); without it (older catalogs), the flags alone.
 */
export function limitOf(rule: LimitRule | null, row: { flags?: unknown; [c: string]: unknown }): LimitKind | null {
  if (!rule) return null;
  const flags = splitFlags(row.flags);
  const lower = rule.lowerFlags.some((f) => flags.includes(f));
  const marked = rule.isLimitColumn ? row[rule.isLimitColumn] : undefined;
  if (marked === true) return lower ? 'lower' : 'upper';
  if (marked === false && !lower && !rule.lowerFlags.length) return null;
  if (rule.upperFlags.some((f) => flags.includes(f))) return 'upper';
  if (lower) return 'lower';
  return null;
}

/** Columns a result needs besides the plotted ones to mark limits: `flags` and any `_is_limit` column. */
export function limitSourceColumns(columns: readonly string[]): string[] {
  const out = new Set<string>();
  for (const c of columns) {
    const r = limitRule(c);
    if (!r) continue;
    if (r.upperFlags.length || r.lowerFlags.length) out.add('flags');
    if (r.isLimitColumn) out.add(r.isLimitColumn);
  }
  return [...out];
}
