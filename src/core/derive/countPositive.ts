/**
 * How many k have a[k] + b[k] > 0 (a[k] > 0 when `b` is null; NaN is not above zero): the draws
 * of λ_Edd above 1, or of a black hole above a local one. Four draws per step, for the reason
 * given in virialLogMassInto (src/core/virial/virialCalibration.ts).
 * @param a - the draws (log10 values, or offsets in dex).
 * @param b - added to `a` draw by draw (as long as `a`), or null.
 */
export function countPositive(a: Float64Array, b: Float64Array | null): number {
  const n = a.length;
  const n4 = n - (n % 4);
  let count = 0;
  if (b === null) {
    for (let k = 0; k < n4; k += 4) {
      if ((a[k] as number) > 0) count++;
      if ((a[k + 1] as number) > 0) count++;
      if ((a[k + 2] as number) > 0) count++;
      if ((a[k + 3] as number) > 0) count++;
    }
    for (let k = n4; k < n; k++) if ((a[k] as number) > 0) count++;
    return count;
  }
  for (let k = 0; k < n4; k += 4) {
    if ((a[k] as number) + (b[k] as number) > 0) count++;
    if ((a[k + 1] as number) + (b[k + 1] as number) > 0) count++;
    if ((a[k + 2] as number) + (b[k + 2] as number) > 0) count++;
    if ((a[k + 3] as number) + (b[k + 3] as number) > 0) count++;
  }
  for (let k = n4; k < n; k++) if ((a[k] as number) + (b[k] as number) > 0) count++;
  return count;
}
