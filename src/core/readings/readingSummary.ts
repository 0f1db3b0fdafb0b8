/**
 * The headline numbers of each reading, computed in SQL from the readings table, the same text
 * in the catalog build (DuckDB in Node) and in the browser (DuckDB-WASM), so both give the same
 * digits. Fractions carry binomial 68.27 % (1σ) intervals by the Wilson score method (Wilson
 * 1927, JASA 22, 209), which stays inside [0, 1] and behaves for small counts and for 0 or n
 * successes, unlike the normal approximation.
 */

/** z of a 68.27 % two-sided interval (1σ). */
export const SUMMARY_INTERVAL_Z = 1;

/** How the intervals are computed, for the metadata and the methods page. */
export const SUMMARY_INTERVAL_METHOD =
  'Wilson score interval, z = 1 (68.27 %): Wilson 1927, Journal of the American Statistical Association 22, 209';

/** One fraction of the summary: k of n, with its interval. */
export interface SummaryFraction {
  k: number;
  n: number;
  fraction: number | null;
  lo: number | null;
  hi: number | null;
}

/** One reading's summary row. */
export interface ReadingSummary {
  reading: string;
  /** Objects in the readings table (every row of the catalog). */
  objects: number;
  /** P(λ_Edd > 1) > 0.84, among objects with an Eddington ratio. */
  superEddington: SummaryFraction;
  /** log M_BH more than 1 dex above the local relation (nominal), among objects with a host measurement and a measured (not upper-limit) mass. */
  overMassive: SummaryFraction;
  /** λ > 1 needed to grow from the light seed, among objects with a required λ from a measured (not upper-limit) mass. */
  needsSuperEddingtonLight: SummaryFraction;
  /** Median log M_BH of the measured masses (upper limits left out). */
  medianLogMbh: number | null;
  /** Median log λ_Edd of the measured ratios (bounds left out). */
  medianLogEddRatio: number | null;
}

/** SQL of the Wilson interval's bounds for k successes in n trials (NULL when n = 0). */
function wilson(k: string, n: string, sign: '-' | '+'): string {
  const z2 = SUMMARY_INTERVAL_Z * SUMMARY_INTERVAL_Z;
  return `(${k} + ${z2 / 2} ${sign} ${SUMMARY_INTERVAL_Z} * sqrt(${k} * (${n} - ${k}) / NULLIF(${n}, 0) + ${z2 / 4})) / NULLIF(${n} + ${z2}, ${z2})`;
}

/**
 * Per fraction: its key, the column an object must have, the condition it counts, and whether a
 * bound is left out. A quantity resting on an upper-limit mass (the offset, the required λ) is a
 * bound, not a measurement: "more than 1 dex above" or "needs λ > 1" does not follow from a bound
 * that is, so those fractions count measured masses only. P(λ_Edd > 1) is already empty for a bound.
 */
const FRACTIONS = [
  ['super', 'p_super_eddington', 'p_super_eddington > 0.84', 'TRUE'],
  ['over', 'delta_log_mbh_local', 'delta_log_mbh_local > 1', 'NOT mbh_bound'],
  ['light', 'lambda_req_light', 'lambda_req_light > 1', 'NOT mbh_bound'],
] as const;

/** SQL: true when the row's flags (comma-separated) include `flag`. */
const hasFlag = (flag: string): string => `list_contains(string_split(coalesce(flags, ''), ','), '${flag}')`;

/**
 * The summary query over a table with the readings columns (`reading`, `log_mbh`,
 * `log_edd_ratio`, `p_super_eddington`, `delta_log_mbh_local`, `lambda_req_light`, `flags`).
 * Bounds are left out of the fractions that would read them as measurements, and of the medians. One row per
 * reading, ordered by reading id; columns as read by {@link summaryFromRow}.
 * @param table - the table or file expression to read (e.g. `readings`, `read_parquet('…')`).
 */
export function readingSummarySql(table: string): string {
  const counts = FRACTIONS.flatMap(([key, col, cond, measured]) => [
    `(count(${col}) FILTER (WHERE ${measured}))::DOUBLE AS n_${key}`,
    `(count(*) FILTER (WHERE ${cond} AND ${measured}))::DOUBLE AS k_${key}`,
  ]).join(',\n    ');
  const fractions = FRACTIONS.flatMap(([key]) => [
    `n_${key}`,
    `k_${key}`,
    `k_${key} / NULLIF(n_${key}, 0) AS f_${key}`,
    `${wilson(`k_${key}`, `n_${key}`, '-')} AS lo_${key}`,
    `${wilson(`k_${key}`, `n_${key}`, '+')} AS hi_${key}`,
  ]).join(',\n  ');
  return `WITH t AS (
  SELECT *, ${hasFlag('mbh_upper_limit')} AS mbh_bound,
    (${hasFlag('edd_ratio_upper_limit')} OR ${hasFlag('edd_ratio_lower_limit')}) AS edd_bound
  FROM ${table}
), c AS (
  SELECT reading,
    count(*)::DOUBLE AS objects,
    ${counts},
    quantile_cont(log_mbh, 0.5) FILTER (WHERE NOT mbh_bound) AS median_log_mbh,
    quantile_cont(log_edd_ratio, 0.5) FILTER (WHERE NOT edd_bound) AS median_log_edd_ratio
  FROM t
  GROUP BY reading
)
SELECT reading, objects,
  ${fractions},
  median_log_mbh, median_log_edd_ratio
FROM c ORDER BY reading`;
}

const toNum = (v: unknown): number | null => (v === null || v === undefined ? null : Number(v));

/** One row of {@link readingSummarySql}'s result (column name → value) as a summary. */
export function summaryFromRow(row: Readonly<Record<string, unknown>>): ReadingSummary {
  const frac = (key: string): SummaryFraction => ({
    k: Number(row[`k_${key}`]),
    n: Number(row[`n_${key}`]),
    fraction: toNum(row[`f_${key}`]),
    lo: toNum(row[`lo_${key}`]),
    hi: toNum(row[`hi_${key}`]),
  });
  return {
    reading: String(row.reading),
    objects: Number(row.objects),
    superEddington: frac('super'),
    overMassive: frac('over'),
    needsSuperEddingtonLight: frac('light'),
    medianLogMbh: toNum(row.median_log_mbh),
    medianLogEddRatio: toNum(row.median_log_edd_ratio),
  };
}
