/**
 * Which of the Readings page's drawings a new custom reading changes. A reader who changes only
 * L_bol/λL5100 leaves every mass as it was, one who changes only ε leaves all four charts as
 * they were: those charts are kept, not drawn again.
 */
import type { RederivedRow } from './rederiveBatch.ts';

/** The derived columns each population chart reads (its other columns, z and the host mass, are the catalog's). */
export const DERIVED_COLUMNS_BY_CHART: Readonly<Record<string, readonly (keyof RederivedRow)[]>> = {
  'mbh-mstar': ['log_mbh', 'log_mbh_p16', 'log_mbh_p84', 'flags'],
  'mbh-z': ['log_mbh', 'log_mbh_p16', 'log_mbh_p84', 'flags'],
  'lbol-mbh': ['log_mbh', 'log_mbh_p16', 'log_mbh_p84', 'log_lbol', 'log_lbol_p16', 'log_lbol_p84', 'flags'],
  'edd-hist': ['log_edd_ratio', 'log_edd_ratio_p16', 'log_edd_ratio_p84', 'flags'],
};

/** The derived columns of the comparison of two readings. */
export const SHIFT_COLUMNS: readonly (keyof RederivedRow)[] = ['log_mbh', 'log_edd_ratio'];

/** Whether `a` and `b` hold the same objects in the same order with the same values (Object.is) in `columns`. */
export function sameColumns(a: readonly RederivedRow[], b: readonly RederivedRow[], columns: readonly (keyof RederivedRow)[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) {
    const x = a[i]!;
    const y = b[i]!;
    if (x.id !== y.id) return false;
    for (const c of columns) if (!Object.is(x[c], y[c])) return false;
  }
  return true;
}

/**
 * The charts (keys of DERIVED_COLUMNS_BY_CHART, or unknown keys, which are always drawn) that
 * must be drawn again to show `next` where `shown` is drawn now (null: something else is shown).
 */
export function chartsToRedraw(keys: readonly string[], shown: readonly RederivedRow[] | null, next: readonly RederivedRow[]): string[] {
  if (!shown) return [...keys];
  return keys.filter((k) => {
    const cols = DERIVED_COLUMNS_BY_CHART[k];
    return !cols || !sameColumns(shown, next, cols);
  });
}
