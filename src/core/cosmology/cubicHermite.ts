/**
 * Cubic Hermite interpolation on one interval of width `h`: values y0, y1 and derivatives
 * d0, d1 (per unit of x) at its ends, evaluated at fraction t ∈ [0, 1]. Error O(h⁴ f'''').
 */
export function cubicHermite(y0: number, y1: number, d0: number, d1: number, h: number, t: number): number {
  const t2 = t * t;
  const t3 = t2 * t;
  return (
    (2 * t3 - 3 * t2 + 1) * y0 + (t3 - 2 * t2 + t) * h * d0 + (-2 * t3 + 3 * t2) * y1 + (t3 - t2) * h * d1
  );
}

/** Derivative d/dx of {@link cubicHermite} at fraction t (per unit of x). */
export function cubicHermiteSlope(y0: number, y1: number, d0: number, d1: number, h: number, t: number): number {
  const t2 = t * t;
  return ((6 * t2 - 6 * t) * (y0 - y1)) / h + (3 * t2 - 4 * t + 1) * d0 + (3 * t2 - 2 * t) * d1;
}
