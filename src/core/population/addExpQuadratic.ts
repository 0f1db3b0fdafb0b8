/**
 * Adds weight · exp(a q² + b q + c) to out[q] for q = 0 … count − 1, with a ≤ 0 (a concave exponent), using three
 * exponentials in all instead of one per point: from the point nearest the exponent's maximum, each neighbour is
 * the last value times a ratio, and each ratio the last times exp(2a), since
 * E(q + 1) − E(q) = a (2q + 1) + b and the step between those differences is 2a. Walking away from the maximum every
 * ratio is at most 1, so the values never overflow and a value that underflows to 0 is 0 to double precision.
 * Relative error: the error of E at the start (a few ulp of the largest of |c|, |b q|, |a q²|) plus about count²
 * ulp from the products; far below 1e-12 for the likelihood's windows (≤ ~60 points, |E| ≲ 1e3).
 * @param out - accumulator, at least `count` long.
 * @param count - number of points.
 * @param a - coefficient of q² (≤ 0).
 * @param b - coefficient of q.
 * @param c - constant term.
 * @param weight - factor of every term.
 */
export function addExpQuadratic(out: Float64Array, count: number, a: number, b: number, c: number, weight: number): void {
  if (count <= 0) return;
  // The discrete maximum of a concave quadratic is at the vertex rounded; a linear exponent peaks at an end.
  const top = a < 0 ? Math.min(count - 1, Math.max(0, Math.round(-b / (2 * a)))) : b > 0 ? count - 1 : 0;
  const peak = weight * Math.exp((a * top + b) * top + c);
  out[top] = (out[top] as number) + peak;
  const g = Math.exp(2 * a);
  let v = peak;
  const up = Math.exp(a * (2 * top + 1) + b);
  let r = up;
  for (let q = top + 1; q < count; q++) {
    v *= r;
    r *= g;
    out[q] = (out[q] as number) + v;
  }
  v = peak;
  // E(top − 1) − E(top) = 2a − (E(top + 1) − E(top)).
  r = up > 0 ? g / up : Math.exp(a * (1 - 2 * top) - b);
  for (let q = top - 1; q >= 0; q--) {
    v *= r;
    r *= g;
    out[q] = (out[q] as number) + v;
  }
}
