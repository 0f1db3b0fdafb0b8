/**
 * The live custom reading's rows as they cross from a web worker to the page: every numeric
 * column in one Float64Array (column after column; NaN for null), which the worker transfers
 * instead of copying, and the flags and methods as strings. Doubles pass unchanged, so the page's rows are
 * bit for bit the worker's.
 */
import type { RederivedRow } from './rederiveBatch.ts';

/** The numeric columns of a RederivedRow, in packing order. */
export const REDERIVED_NUMBERS = [
  'log_mbh', 'log_mbh_p16', 'log_mbh_p50', 'log_mbh_p84', 'log_lbol', 'log_lbol_p16', 'log_lbol_p84',
  'log_edd_ratio', 'log_edd_ratio_p16', 'log_edd_ratio_p84', 'p_super_eddington', 'delta_log_mbh_local',
  'p_above_local', 'log_mseed', 'lambda_req_light', 'lambda_req_heavy',
] as const satisfies readonly (keyof RederivedRow)[];

/** Rows packed for a transfer. */
export interface RederivedColumns {
  /** REDERIVED_NUMBERS.length × n values, column after column. */
  values: Float64Array;
  flags: string[];
  mbhMethod: (string | null)[];
  lbolMethod: (string | null)[];
}

/** Packs `rows` (their ids stay behind: the page knows them). */
export function packRederived(rows: readonly RederivedRow[]): RederivedColumns {
  const n = rows.length;
  const values = new Float64Array(REDERIVED_NUMBERS.length * n);
  REDERIVED_NUMBERS.forEach((key, c) => {
    for (let i = 0; i < n; i++) values[c * n + i] = rows[i]![key] ?? NaN;
  });
  return { values, flags: rows.map((r) => r.flags), mbhMethod: rows.map((r) => r.mbh_method), lbolMethod: rows.map((r) => r.lbol_method) };
}

/** The rows of `packed`, with `ids` (same order and length). */
export function unpackRederived(packed: RederivedColumns, ids: readonly string[]): RederivedRow[] {
  const n = packed.flags.length;
  if (ids.length !== n || packed.values.length !== REDERIVED_NUMBERS.length * n) throw new Error(`packed rows: ${n} flags and ${packed.values.length} values for ${ids.length} ids`);
  const rows: RederivedRow[] = [];
  for (let i = 0; i < n; i++) {
    const row = { id: ids[i]!, mbh_method: packed.mbhMethod[i] ?? null, lbol_method: packed.lbolMethod[i] ?? null, flags: packed.flags[i]! } as RederivedRow;
    REDERIVED_NUMBERS.forEach((key, c) => {
      const v = packed.values[c * n + i]!;
      row[key] = Number.isNaN(v) ? null : v;
    });
    rows.push(row);
  }
  return rows;
}
