import type { Percentiles } from '../derive/types.ts';
import { percentiles16_50_84 } from './percentiles.ts';
import { binnedPercentiles } from './binnedPercentiles.ts';

/** Samples remembered per memo: one per variant of a quantity among an object's readings. */
const ENTRIES = 4;

/**
 * The 16/50/84th percentiles of samples, remembered for samples seen before: an object derived
 * under several readings often gives one quantity exactly the same draws under two of them
 * (a reading that changes only L_bol leaves every mass draw as it was), and the percentiles of
 * equal samples are equal, so they are computed once. A sample counts as seen only when every
 * value is identical (NaN equal to NaN, +0 not equal to −0), so the result is exactly {@link percentiles16_50_84}'s.
 * Call `clear` between objects. Unlike percentiles16_50_84 it never reorders `values`.
 */
export class PercentileMemo {
  private readonly kept: { values: Float64Array; p: Percentiles }[] = [];
  private used = 0;
  private next = 0;

  clear(): void {
    this.used = 0;
    this.next = 0;
  }

  percentiles(values: Float64Array): Percentiles {
    for (let e = 0; e < this.used; e++) {
      const k = this.kept[e] as { values: Float64Array; p: Percentiles };
      if (sameValues(k.values, values)) return { ...k.p };
    }
    let slot: number;
    if (this.used < ENTRIES) slot = this.used++;
    else {
      slot = this.next;
      this.next = (this.next + 1) % ENTRIES;
    }
    let k = this.kept[slot];
    if (!k || k.values.length !== values.length) {
      k = { values: new Float64Array(values.length), p: { p16: NaN, p50: NaN, p84: NaN } };
      this.kept[slot] = k;
    }
    k.values.set(values);
    // The counting path reads the sample without reordering it; the selection it falls back to
    // reorders, so that runs on the kept copy, which is then restored.
    const counted = binnedPercentiles(values);
    if (counted) k.p = counted;
    else {
      k.p = percentiles16_50_84(k.values);
      k.values.set(values);
    }
    return { ...k.p };
  }
}

/** True when the two samples hold the same values in the same order (as Object.is). */
function sameValues(a: Float64Array, b: Float64Array): boolean {
  const n = a.length;
  if (n !== b.length) return false;
  // Four at a time while they are bitwise-plain equal (the common case of a repeated sample; the
  // compiler checks each array once per step instead of at every element), then one by one.
  const n4 = n - (n % 4);
  let i = 0;
  for (; i < n4; i += 4) {
    if (a[i] !== b[i] || a[i + 1] !== b[i + 1] || a[i + 2] !== b[i + 2] || a[i + 3] !== b[i + 3]) break;
    // Equal numbers that may still differ: zeros of either sign (NaN never gets here).
    if (a[i] === 0 || a[i + 1] === 0 || a[i + 2] === 0 || a[i + 3] === 0) break;
  }
  for (; i < n; i++) {
    const x = a[i] as number;
    const y = b[i] as number;
    if (x === y) {
      // +0 and −0 compare equal but are different values.
      if (x === 0 && 1 / x !== 1 / y) return false;
    } else if (x === x || y === y) return false;
  }
  return true;
}
