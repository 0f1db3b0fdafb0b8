import type { ExampleQuery } from '../query/exampleQueries.ts';

/** Example queries over the `readings` table (one row per object and reading), shown in the SQL workspace. */
export const READINGS_EXAMPLE_QUERIES: readonly ExampleQuery[] = [
  {
    title: 'Super-Eddington under every reading',
    // Every reading's P above 0.84; bool_and would skip a reading without P (an object whose
    // Eddington ratio is a bound there) and list the object anyway.
    sql: `SELECT id, min(p_super_eddington) AS lowest_p_super_eddington, count(*) AS readings
FROM readings
GROUP BY id
HAVING count(*) FILTER (WHERE p_super_eddington > 0.84) = count(*)
ORDER BY lowest_p_super_eddington DESC`,
  },
  {
    title: 'How far each reading moves the masses',
    sql: `SELECT r.reading, count(r.log_mbh) AS n,
       median(r.log_mbh - s.log_mbh) AS median_shift_dex,
       min(r.log_mbh - s.log_mbh) AS min_shift_dex,
       max(r.log_mbh - s.log_mbh) AS max_shift_dex
FROM readings r JOIN readings s ON s.id = r.id AND s.reading = 'standard'
GROUP BY r.reading
ORDER BY median_shift_dex`,
  },
  {
    title: 'Over-massive under one reading, not under another',
    sql: `SELECT id,
       max(delta_log_mbh_local) FILTER (WHERE reading = 'standard') AS standard_offset,
       max(delta_log_mbh_local) FILTER (WHERE reading = 'scattering_core') AS scattering_core_offset
FROM readings
GROUP BY id
HAVING standard_offset > 1 AND scattering_core_offset <= 1
ORDER BY standard_offset DESC`,
  },
];
