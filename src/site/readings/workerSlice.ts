/**
 * The objects [from, to) that worker `i` of `k` derives of a population of `n`: equal slices in
 * input order, the last one shorter. The page and the workers compute it alike, so a worker
 * warms up (and keeps the deviates of) the objects it will be asked for.
 */
export function workerSlice(n: number, i: number, k: number): [number, number] {
  const size = Math.ceil(n / Math.max(1, k));
  return [Math.min(n, i * size), Math.min(n, (i + 1) * size)];
}
