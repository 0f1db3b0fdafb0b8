import { minOf } from './minOf.ts';
import { selectInPlace } from './selectInPlace.ts';

/** a + (b − a)t, computed from the nearer end as numpy does, so it is monotone in t and exact at t = 1. */
export function lerp(a: number, b: number, t: number): number {
  const d = b - a;
  return t >= 0.5 ? b - d * (1 - t) : a + d * t;
}

/**
 * The p-quantile (0 ≤ p ≤ 1) of `values` as numpy's default 'linear' method: the order statistics
 * at h = (n−1)p, linearly interpolated. Linear time by selection; REORDERS `values` in place
 * (copy first if the order matters). Values must not be NaN. Throws on an empty array.
 */
export function quantile(values: Float64Array, p: number): number {
  const n = values.length;
  if (n === 0) throw new RangeError('quantile of an empty array');
  if (!(p >= 0 && p <= 1)) throw new RangeError(`quantile p must be in [0, 1], got ${p}`);
  const h = (n - 1) * p;
  const k = Math.floor(h);
  selectInPlace(values, k);
  const lo = values[k] as number;
  const t = h - k;
  if (t === 0) return lo;
  // Everything after k is ≥ a[k]: the next order statistic is their minimum.
  return lerp(lo, minOf(values, k + 1, n - 1), t);
}
