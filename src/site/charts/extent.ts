/**
 * The range [lo, hi] of the finite `values`, widened by `pad` of its width on each side (or by
 * `minHalfWidth` around a single value). Returns `fallback` when there is no finite value.
 */
export function paddedExtent(
  values: Iterable<number | null | undefined>,
  fallback: [number, number],
  pad = 0.06,
  minHalfWidth = 0.5,
): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (v === null || v === undefined || !Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  if (lo > hi) return [fallback[0], fallback[1]];
  const w = hi - lo;
  if (w < 2 * minHalfWidth * (1 - 2 * pad)) {
    const mid = (lo + hi) / 2;
    return [mid - minHalfWidth, mid + minHalfWidth];
  }
  return [lo - pad * w, hi + pad * w];
}
