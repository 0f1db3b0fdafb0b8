/**
 * Interpolating cubic spline with not-a-knot end conditions (the third derivative is
 * continuous across the second and the second-to-last node). This is the spline that
 * FITPACK's `splrep(x, y, k=3, s=0)` returns, so curves defined through it elsewhere are
 * reproduced. Written for this project (no port).
 */
export interface CubicSpline {
  readonly x: readonly number[];
  readonly y: readonly number[];
  /** Second derivatives at the nodes. */
  readonly m: readonly number[];
}

/** Solves A·z = r in place by Gaussian elimination with partial pivoting (small dense systems only). */
function solveDense(a: number[][], r: number[]): number[] {
  const n = r.length;
  for (let col = 0; col < n; col++) {
    let piv = col;
    for (let i = col + 1; i < n; i++) if (Math.abs(a[i]![col]!) > Math.abs(a[piv]![col]!)) piv = i;
    [a[col], a[piv]] = [a[piv]!, a[col]!];
    [r[col], r[piv]] = [r[piv]!, r[col]!];
    for (let i = col + 1; i < n; i++) {
      const f = a[i]![col]! / a[col]![col]!;
      for (let j = col; j < n; j++) a[i]![j]! -= f * a[col]![j]!;
      r[i]! -= f * r[col]!;
    }
  }
  const z = new Array<number>(n).fill(0);
  for (let i = n - 1; i >= 0; i--) {
    let s = r[i]!;
    for (let j = i + 1; j < n; j++) s -= a[i]![j]! * z[j]!;
    z[i] = s / a[i]![i]!;
  }
  return z;
}

/**
 * Builds a not-a-knot cubic spline through (x_i, y_i).
 * @param x - strictly increasing nodes, at least 4.
 * @param y - values at the nodes.
 */
export function notAKnotSpline(x: readonly number[], y: readonly number[]): CubicSpline {
  const n = x.length;
  if (n < 4 || y.length !== n) throw new RangeError(`notAKnotSpline: need ≥ 4 nodes and as many values, got ${n} and ${y.length}`);
  const h = x.slice(1).map((xi, i) => xi - x[i]!);
  if (h.some((hi) => !(hi > 0))) throw new RangeError('notAKnotSpline: nodes must be strictly increasing');
  const a = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  const r = new Array<number>(n).fill(0);
  // Third-derivative continuity at node 1 and node n−2.
  a[0]![0] = h[1]!;
  a[0]![1] = -(h[0]! + h[1]!);
  a[0]![2] = h[0]!;
  a[n - 1]![n - 3] = h[n - 2]!;
  a[n - 1]![n - 2] = -(h[n - 3]! + h[n - 2]!);
  a[n - 1]![n - 1] = h[n - 3]!;
  for (let i = 1; i < n - 1; i++) {
    a[i]![i - 1] = h[i - 1]!;
    a[i]![i] = 2 * (h[i - 1]! + h[i]!);
    a[i]![i + 1] = h[i]!;
    r[i] = 6 * ((y[i + 1]! - y[i]!) / h[i]! - (y[i]! - y[i - 1]!) / h[i - 1]!);
  }
  return { x: [...x], y: [...y], m: solveDense(a, r) };
}

/**
 * Evaluates a spline at `t` (cubic extrapolation of the end pieces outside the nodes).
 * @param s - the spline from notAKnotSpline.
 * @param t - abscissa, same units as the nodes.
 */
export function evalSpline(s: CubicSpline, t: number): number {
  const { x, y, m } = s;
  let i = 0;
  while (i < x.length - 2 && t > x[i + 1]!) i++;
  const h = x[i + 1]! - x[i]!;
  const u = (x[i + 1]! - t) / h;
  const v = (t - x[i]!) / h;
  return (
    u * y[i]! + v * y[i + 1]! + ((u * u * u - u) * m[i]! + (v * v * v - v) * m[i + 1]!) * (h * h) / 6
  );
}
