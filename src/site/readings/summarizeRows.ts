/**
 * The per-reading summary of rows derived in the browser (the live custom reading), with the
 * definitions of the SQL in src/core/readings/readingSummary.ts: the same thresholds, the Wilson
 * interval with z = 1, and the median interpolated between the two middle values as DuckDB's
 * quantile_cont does.
 */
import { SUMMARY_INTERVAL_Z, type ReadingSummary, type SummaryFraction } from '../../core/readings/readingSummary.ts';
import type { RederivedRow } from './rederiveBatch.ts';
import { splitFlags } from '../text/flagText.ts';

/** k of n with its Wilson interval (nulls when n = 0). */
export function wilsonFraction(k: number, n: number): SummaryFraction {
  if (n === 0) return { k, n, fraction: null, lo: null, hi: null };
  const z2 = SUMMARY_INTERVAL_Z * SUMMARY_INTERVAL_Z;
  const half = SUMMARY_INTERVAL_Z * Math.sqrt((k * (n - k)) / n + z2 / 4);
  return { k, n, fraction: k / n, lo: (k + z2 / 2 - half) / (n + z2), hi: (k + z2 / 2 + half) / (n + z2) };
}

function median(values: number[]): number | null {
  if (values.length === 0) return null;
  const s = [...values].sort((a, b) => a - b);
  const pos = (s.length - 1) / 2;
  const lo = Math.floor(pos);
  return s[lo]! + (s[Math.ceil(pos)]! - s[lo]!) * (pos - lo);
}

/** True when the row's flags (comma-separated) include `flag`. */
const hasFlag = (r: RederivedRow, flag: string): boolean => splitFlags(r.flags).includes(flag);
const massBound = (r: RederivedRow): boolean => hasFlag(r, 'mbh_upper_limit');
const eddBound = (r: RederivedRow): boolean => hasFlag(r, 'edd_ratio_upper_limit') || hasFlag(r, 'edd_ratio_lower_limit');

/** The summary of `rows` under the reading `reading`; bounds are left out as the SQL summary leaves them out. */
export function summarizeRows(reading: string, rows: readonly RederivedRow[]): ReadingSummary {
  const frac = (get: (r: RederivedRow) => number | null, cond: (x: number) => boolean, measured: (r: RederivedRow) => boolean = () => true) => {
    const have = rows.filter(measured).map(get).filter((x): x is number => x !== null);
    return wilsonFraction(have.filter(cond).length, have.length);
  };
  return {
    reading,
    objects: rows.length,
    superEddington: frac((r) => r.p_super_eddington, (x) => x > 0.84),
    overMassive: frac((r) => r.delta_log_mbh_local, (x) => x > 1, (r) => !massBound(r)),
    needsSuperEddingtonLight: frac((r) => r.lambda_req_light, (x) => x > 1, (r) => !massBound(r)),
    medianLogMbh: median(rows.filter((r) => !massBound(r)).map((r) => r.log_mbh).filter((x): x is number => x !== null)),
    medianLogEddRatio: median(rows.filter((r) => !eddBound(r)).map((r) => r.log_edd_ratio).filter((x): x is number => x !== null)),
  };
}
