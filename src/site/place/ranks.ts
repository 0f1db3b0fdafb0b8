/** Where a value falls in a population. */
export interface PercentileRank {
  /** Percentage of the population below the value (ties count half), 0–100; null when the population is empty. */
  percentile: number | null;
  /** Number of population values compared with. */
  n: number;
}

/**
 * Percentile rank of `x` among `values` (non-finite ones ignored): 100 · (below + ½ · equal) / n,
 * the "mean" definition, so the rank of a value equal to all others is 50.
 */
export function percentileRank(values: Iterable<number | null | undefined>, x: number): PercentileRank {
  let n = 0;
  let below = 0;
  let equal = 0;
  for (const v of values) {
    if (v === null || v === undefined || !Number.isFinite(v)) continue;
    n++;
    if (v < x) below++;
    else if (v === x) equal++;
  }
  return { percentile: n ? (100 * (below + 0.5 * equal)) / n : null, n };
}

/** "37th", "1st", "22nd", "100th" (rounded to a whole percentile). */
export function ordinalPercentile(p: number): string {
  const k = Math.round(p);
  const teen = k % 100 >= 11 && k % 100 <= 13;
  const suffix = teen ? 'th' : k % 10 === 1 ? 'st' : k % 10 === 2 ? 'nd' : k % 10 === 3 ? 'rd' : 'th';
  return `${k}${suffix}`;
}
