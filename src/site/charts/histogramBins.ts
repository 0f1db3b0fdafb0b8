/** One bin of a histogram of detections and limits, stacked: detections from 0, upper limits above them, lower limits on top. */
export interface StackedBin {
  x1: number;
  x2: number;
  detections: number;
  /** Upper limits whose bound lies in the bin. */
  limits: number;
  /** Lower limits whose bound lies in the bin. */
  lowerLimits: number;
}

/**
 * Bins `values` into bins of `width` aligned on multiples of `width` (so the edges do not move
 * with the data), counting detections, upper limits (`limit` true or 'upper') and lower limits
 * ('lower') separately. Non-finite values are dropped. Returns the bins from the lowest to the
 * highest occupied one, empty ones included.
 */
export function stackedBins(values: readonly { v: number; limit: boolean | 'upper' | 'lower' }[], width: number): StackedBin[] {
  const finite = values.filter((d) => Number.isFinite(d.v));
  if (!finite.length) return [];
  // a small tolerance keeps values that sit on an edge (up to rounding) in the bin they start
  const index = (v: number) => Math.floor(v / width + 1e-9);
  let lo = Infinity;
  let hi = -Infinity;
  for (const d of finite) {
    const i = index(d.v);
    lo = Math.min(lo, i);
    hi = Math.max(hi, i);
  }
  const bins: StackedBin[] = [];
  for (let i = lo; i <= hi; i++) bins.push({ x1: i * width, x2: (i + 1) * width, detections: 0, limits: 0, lowerLimits: 0 });
  for (const d of finite) {
    const b = bins[index(d.v) - lo]!;
    if (d.limit === 'lower') b.lowerLimits += 1;
    else if (d.limit) b.limits += 1;
    else b.detections += 1;
  }
  return bins;
}
