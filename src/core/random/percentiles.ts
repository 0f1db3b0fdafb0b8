import type { Percentiles } from '../derive/types.ts';
import { lerp } from './quantile.ts';
import { minOf } from './minOf.ts';
import { selectInPlace } from './selectInPlace.ts';
import { binnedPercentiles } from './binnedPercentiles.ts';

/**
 * 16th, 50th and 84th percentiles (the median and ±1σ of a normal) of `values`, each as
 * {@link quantile} (numpy 'linear'). Selects the median over the whole array, then the 16th
 * only below it and the 84th only above it. REORDERS `values` in place; no NaN; n ≥ 1.
 * Monte Carlo samples take the faster counting path of {@link binnedPercentiles} (same result).
 */
export function percentiles16_50_84(values: Float64Array): Percentiles {
  const n = values.length;
  if (n === 0) throw new RangeError('percentiles of an empty array');
  const counted = binnedPercentiles(values);
  if (counted) return counted;
  const h50 = (n - 1) * 0.5;
  const k50 = Math.floor(h50);
  selectInPlace(values, k50);
  const v50 = values[k50] as number;
  // Order statistic k50+1 (the minimum above the median position), when it exists.
  const next50 = k50 + 1 < n ? minOf(values, k50 + 1, n - 1) : v50;
  const p50 = h50 === k50 ? v50 : lerp(v50, next50, h50 - k50);

  // a[0..k50−1] now hold order statistics 0..k50−1 and a[k50+1..n−1] hold k50+1..n−1 (as sets).
  const h16 = (n - 1) * 0.16;
  const k16 = Math.floor(h16);
  let p16: number;
  if (k16 === k50) p16 = h16 === k16 ? v50 : lerp(v50, next50, h16 - k16);
  else {
    selectInPlace(values, k16, 0, k50 - 1);
    const v = values[k16] as number;
    const next = k16 + 1 <= k50 - 1 ? minOf(values, k16 + 1, k50 - 1) : v50;
    p16 = h16 === k16 ? v : lerp(v, next, h16 - k16);
  }

  const h84 = (n - 1) * 0.84;
  const k84 = Math.floor(h84);
  let p84: number;
  if (k84 === k50) p84 = h84 === k84 ? v50 : lerp(v50, next50, h84 - k84);
  else {
    selectInPlace(values, k84, k50 + 1, n - 1);
    const v = values[k84] as number;
    p84 = h84 === k84 ? v : lerp(v, minOf(values, k84 + 1, n - 1), h84 - k84);
  }
  return { p16, p50, p84 };
}
