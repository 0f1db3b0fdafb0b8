import { RELATION_PIVOT } from './relationLikelihood.ts';

/** One x of a relation's band: the 16th, 50th and 84th percentiles of the mean relation there. */
export interface RelationBandPoint {
  /** log M* / M_sun. */
  readonly x: number;
  /** log M_BH / M_sun at the 16th, 50th and 84th percentile over the posterior. */
  readonly lo: number;
  readonly mid: number;
  readonly hi: number;
}

// the kth smallest of a sorted array, at fraction p (nearest rank below, as relationFitRun's offsets)
const at = (sorted: Float64Array, p: number): number => sorted[Math.min(sorted.length - 1, Math.floor(p * (sorted.length - 1)))] as number;

/**
 * The 68 % band of the mean relation log M_BH = α + β (log M* − 10) over posterior samples, pointwise in M*: at
 * each x the 16th, 50th and 84th percentiles of α + β (x − 10) over the samples. The band is narrowest near the
 * data's centre and widens with the slope's uncertainty away from it; the intrinsic scatter σ is not in it.
 * @param alpha - posterior samples of α (log M_sun at log M* = 10).
 * @param beta - samples of β, the same length.
 * @param xs - log M* values (M_sun) at which to evaluate.
 * @returns one point per x; empty when there are no samples.
 */
export function relationBand(alpha: ArrayLike<number>, beta: ArrayLike<number>, xs: readonly number[]): RelationBandPoint[] {
  const n = Math.min(alpha.length, beta.length);
  if (n === 0) return [];
  const y = new Float64Array(n);
  return xs.map((x) => {
    for (let k = 0; k < n; k++) y[k] = (alpha[k] as number) + (beta[k] as number) * (x - RELATION_PIVOT);
    y.sort();
    return { x, lo: at(y, 0.16), mid: at(y, 0.5), hi: at(y, 0.84) };
  });
}
