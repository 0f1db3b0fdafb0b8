/**
 * The factor that converts an error (a difference of values) with the same converter as its
 * value: conv(x) − conv(0) per unit x, for a converter that is affine (scale and offset, as
 * every unit conversion of a linear or logarithmic quantity to itself is). Undefined when the
 * converter is not affine (e.g. linear to logarithmic), where an error cannot be converted
 * without its value.
 */
export function errorScale(convert: (x: number) => number): number | undefined {
  const c0 = convert(0);
  const c1 = convert(1);
  const c10 = convert(10);
  const k = c1 - c0;
  if (!Number.isFinite(c0) || !Number.isFinite(k) || k === 0) return undefined;
  const k10 = (c10 - c0) / 10;
  if (Math.abs(k10 - k) > 1e-9 * Math.abs(k)) return undefined;
  return Math.abs(k);
}
