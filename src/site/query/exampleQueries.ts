/** Example queries of real use, shown in the SQL workspace. */
export interface ExampleQuery {
  title: string;
  sql: string;
}

export const EXAMPLE_QUERIES: readonly ExampleQuery[] = [
  {
    title: 'Super-Eddington objects above z = 6',
    sql: `SELECT id, z, log_mbh, log_lbol, log_edd_ratio, p_super_eddington
FROM census
WHERE z > 6 AND log_edd_ratio > 0
ORDER BY log_edd_ratio DESC`,
  },
  {
    title: 'More than 1 dex above the local relation',
    sql: `SELECT id, z, log_mstar, log_mbh, delta_log_mbh_local, local_offset_sigma, p_above_local
FROM census
WHERE delta_log_mbh_local > 1
ORDER BY delta_log_mbh_local DESC`,
  },
  {
    title: 'Median Eddington ratio per redshift bin',
    sql: `SELECT floor(z) AS z_from, count(*) AS n,
       median(log_edd_ratio) AS median_log_edd_ratio,
       quantile_cont(log_edd_ratio, 0.16) AS p16,
       quantile_cont(log_edd_ratio, 0.84) AS p84
FROM census
WHERE log_edd_ratio IS NOT NULL
GROUP BY z_from
ORDER BY z_from`,
  },
  {
    title: 'Too massive for a light seed growing at the Eddington limit',
    sql: `SELECT id, z, log_mbh, log_mseed, lambda_req_light, lambda_req_heavy
FROM census
WHERE lambda_req_light > 1
ORDER BY lambda_req_light DESC`,
  },
  {
    title: 'Masses extrapolated beyond their calibration',
    sql: `SELECT id, z, mbh_method, log_mbh, flags
FROM census
WHERE list_contains(string_split(flags, ','), 'calibration_out_of_range')
ORDER BY z DESC`,
  },
];

/** The query the workspace opens with when the link carries none. */
export const DEFAULT_QUERY = `SELECT id, z, log_mbh, log_lbol, log_edd_ratio, delta_log_mbh_local, flags
FROM census
ORDER BY z DESC
LIMIT 1000`;
