/** Smallest of a[from..to] (inclusive bounds, from ≤ to). */
export function minOf(a: Float64Array, from: number, to: number): number {
  let m = a[from] as number;
  for (let i = from + 1; i <= to; i++) if ((a[i] as number) < m) m = a[i] as number;
  return m;
}
