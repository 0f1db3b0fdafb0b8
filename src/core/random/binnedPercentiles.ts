import type { Percentiles } from '../derive/types.ts';
import { lerp } from './quantile.ts';

/** Bins of the counting pass; the central bins of 2000 normal draws then hold ~20 values each. */
const NBINS = 512;
/** A needed bin holding more values than this (a range stretched by outliers) sends the caller back to selection. */
const MAX_IN_BIN = 512;
const PROBS = [0.16, 0.5, 0.84] as const;

const counts = new Int32Array(NBINS);
const slotOfBin = new Int8Array(NBINS);
const gathered = new Float64Array(6 * MAX_IN_BIN);
/** Per needed rank: the rank, its bin, the count before the bin; per slot: start and fill point in `gathered`. */
const ranks = new Int32Array(6);
const binOf = new Int32Array(6);
const before = new Int32Array(6);
const start = new Int32Array(6);
const fill = new Int32Array(6);
const slotOfRank = new Int32Array(6);
/** The bin of each value, from the counting pass (grown to the largest sample seen). */
let binOfValue = new Uint16Array(2048);

/**
 * The 16th, 50th and 84th percentiles of `values` (numpy's default 'linear' interpolation
 * between order statistics), exactly, by counting rather than selecting: one pass for the
 * range, one counting the values into equal bins, one gathering the values of the (at most
 * six) bins that hold the order statistics needed; those few are sorted. On Monte Carlo draws
 * this does about a third of the work of three selections.
 *
 * Returns null, leaving `values` untouched, when it cannot answer cheaply: non-finite values,
 * or a needed bin crowded because a few outliers stretch the range. The caller then selects.
 * @param values - the sample (not modified).
 */
export function binnedPercentiles(values: Float64Array): Percentiles | null {
  const n = values.length;
  if (n < 64) return null;
  let min = Infinity;
  let max = -Infinity;
  // NaN fails both comparisons; the sum carries it (and ±Infinity) to the check below.
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const x = values[i] as number;
    sum += x;
    if (x < min) min = x;
    if (x > max) max = x;
  }
  if (!Number.isFinite(sum) || !Number.isFinite(min) || !Number.isFinite(max)) return null;
  if (min === max) return { p16: min, p50: min, p84: min };

  const scale = NBINS / (max - min);
  counts.fill(0);
  if (binOfValue.length < n) binOfValue = new Uint16Array(n);
  const bins = binOfValue;
  for (let i = 0; i < n; i++) {
    const b = ((values[i] as number) - min) * scale;
    // b = NBINS only for x = max (or by rounding just below it): it belongs to the last bin.
    const bin = b < NBINS ? b | 0 : NBINS - 1;
    bins[i] = bin;
    counts[bin] = (counts[bin] as number) + 1;
  }

  // Ranks needed: floor and floor+1 of (n − 1)p for each p.
  for (let i = 0; i < 3; i++) {
    const k = Math.floor((n - 1) * (PROBS[i] as number));
    ranks[2 * i] = k;
    ranks[2 * i + 1] = Math.min(k + 1, n - 1);
  }
  // Bin of each rank, and how many values lie in bins before it.
  let cum = 0;
  let r = 0;
  for (let b = 0; b < NBINS && r < 6; b++) {
    const c = counts[b] as number;
    while (r < 6 && (ranks[r] as number) < cum + c) {
      binOf[r] = b;
      before[r] = cum;
      r++;
    }
    cum += c;
  }

  // Each needed bin gets a slot (1-based; 0 = not needed; all 0 between calls) and a stretch of `gathered`.
  let slots = 0;
  let offset = 0;
  for (let j = 0; j < 6; j++) {
    const b = binOf[j] as number;
    if (slotOfBin[b] !== 0) continue;
    const c = counts[b] as number;
    if (c > MAX_IN_BIN) {
      for (let i = 0; i < 6; i++) slotOfBin[binOf[i] as number] = 0;
      return null;
    }
    start[slots] = offset;
    fill[slots] = offset;
    slotOfBin[b] = ++slots;
    offset += c;
  }
  for (let i = 0; i < n; i++) {
    const s = slotOfBin[bins[i] as number] as number;
    if (s !== 0) {
      const x = values[i] as number;
      // Not `gathered[(fill[s - 1] as number)++]`: StrykerJS 9.6 prints that without its parentheses, which does not parse.
      const k = fill[s - 1] as number;
      fill[s - 1] = k + 1;
      gathered[k] = x;
    }
  }
  for (let s = 0; s < slots; s++) sortRange(gathered, start[s] as number, fill[s] as number);
  for (let j = 0; j < 6; j++) slotOfRank[j] = slotOfBin[binOf[j] as number] as number;
  // Leave slotOfBin all zero for the next call.
  for (let j = 0; j < 6; j++) slotOfBin[binOf[j] as number] = 0;

  const order = (j: number): number => gathered[(start[(slotOfRank[j] as number) - 1] as number) + (ranks[j] as number) - (before[j] as number)] as number;
  const at = (i: number, p: number): number => {
    const h = (n - 1) * p;
    const t = h - Math.floor(h);
    const lo = order(2 * i);
    return t === 0 ? lo : lerp(lo, order(2 * i + 1), t);
  };
  return { p16: at(0, 0.16), p50: at(1, 0.5), p84: at(2, 0.84) };
}

/** Sorts a[from..to) ascending as TypedArray sort does (no NaN here): insertion sort for the usual few values, else the built-in sort. */
function sortRange(a: Float64Array, from: number, to: number): void {
  if (to - from > 48) {
    a.subarray(from, to).sort();
    return;
  }
  for (let i = from + 1; i < to; i++) {
    const x = a[i] as number;
    let j = i - 1;
    // As the built-in sort orders them: −0 before +0.
    while (j >= from && ((a[j] as number) > x || (x === 0 && (a[j] as number) === 0 && 1 / (a[j] as number) > 1 / x))) {
      a[j + 1] = a[j] as number;
      j--;
    }
    a[j + 1] = x;
  }
}
