/**
 * Which rows of a plotted column are limits, and which way, from the catalog's own markers:
 * the `flags` column (mbh_upper_limit, lbol_upper_limit, edd_ratio_upper_limit,
 * edd_ratio_lower_limit) for the derived quantities, and the `flux_<line>_is_limit` columns
 * for a line's flux and the luminosity made from it.
 */
import { splitFlags } from '../text/flagText.ts';
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

const FLAG_RULES: [RegExp, LimitRule][] = [
  [/^log_mbh$/, { upperFlags: ['mbh_upper_limit'], lowerFlags: [] }],
  [/^log_lbol$/, { upperFlags: ['lbol_upper_limit'], lowerFlags: [] }],
  [/^log_edd_ratio$/, { upperFlags: ['edd_ratio_upper_limit'], lowerFlags: ['edd_ratio_lower_limit'] }],
];

/** The limit rule of `column`, or null for a column whose values are never limits. */
export function limitRule(column: string): LimitRule | null {
  const stem = percentileStem(column);
  for (const [re, rule] of FLAG_RULES) if (re.test(stem)) return rule;
  const m = /^(?:flux|lum|log_lum)_(halpha|hbeta|mgii|civ|oiii)$/.exec(stem);
  if (m) return { upperFlags: [], lowerFlags: [], isLimitColumn: `flux_${m[1]}_is_limit` };
  return null;
}

/** The limit kind of one row's value under `rule`, or null for a measurement. */
export function limitOf(rule: LimitRule | null, row: { flags?: unknown; [c: string]: unknown }): LimitKind | null {
  if (!rule) return null;
  if (rule.isLimitColumn && row[rule.isLimitColumn] === true) return 'upper';
  const flags = splitFlags(row.flags);
  if (rule.upperFlags.some((f) => flags.includes(f))) return 'upper';
  if (rule.lowerFlags.some((f) => flags.includes(f))) return 'lower';
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
