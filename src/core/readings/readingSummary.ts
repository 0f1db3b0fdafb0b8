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
  /** log M_BH more than 1 dex above the local relation (nominal), among objects with a host measurement. */
  overMassive: SummaryFraction;
  /** λ > 1 needed to grow from the light seed, among objects with a required λ. */
  needsSuperEddingtonLight: SummaryFraction;
  medianLogMbh: number | null;
  medianLogEddRatio: number | null;
}

/** SQL of the Wilson interval's bounds for k successes in n trials (NULL when n = 0). */
function wilson(k: string, n: string, sign: '-' | '+'): string {
  const z2 = SUMMARY_INTERVAL_Z * SUMMARY_INTERVAL_Z;
  return `(${k} + ${z2 / 2} ${sign} ${SUMMARY_INTERVAL_Z} * sqrt(${k} * (${n} - ${k}) / NULLIF(${n}, 0) + ${z2 / 4})) / NULLIF(${n} + ${z2}, ${z2})`;
}

const FRACTIONS = [
  ['super', 'p_super_eddington', 'p_super_eddington > 0.84'],
  ['over', 'delta_log_mbh_local', 'delta_log_mbh_local > 1'],
  ['light', 'lambda_req_light', 'lambda_req_light > 1'],
] as const;

/**
 * The summary query over a table with the readings columns (`reading`, `log_mbh`,
 * `log_edd_ratio`, `p_super_eddington`, `delta_log_mbh_local`, `lambda_req_light`). One row per
 * reading, ordered by reading id; columns as read by {@link summaryFromRow}.
 * @param table - the table or file expression to read (e.g. `readings`, `read_parquet('…')`).
 */
export function readingSummarySql(table: string): string {
  const counts = FRACTIONS.flatMap(([key, col, cond]) => [
    `count(${col})::DOUBLE AS n_${key}`,
    `(count(*) FILTER (WHERE ${cond}))::DOUBLE AS k_${key}`,
  ]).join(',\n    ');
  const fractions = FRACTIONS.flatMap(([key]) => [
    `n_${key}`,
    `k_${key}`,
    `k_${key} / NULLIF(n_${key}, 0) AS f_${key}`,
    `${wilson(`k_${key}`, `n_${key}`, '-')} AS lo_${key}`,
    `${wilson(`k_${key}`, `n_${key}`, '+')} AS hi_${key}`,
  ]).join(',\n  ');
  return `WITH c AS (
  SELECT reading,
    count(*)::DOUBLE AS objects,
    ${counts},
    quantile_cont(log_mbh, 0.5) AS median_log_mbh,
    quantile_cont(log_edd_ratio, 0.5) AS median_log_edd_ratio
  FROM ${table}
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
