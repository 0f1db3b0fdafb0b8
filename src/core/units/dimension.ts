/**
 * Physical dimension as exponents of cgs base quantities, plus a magnitude axis (magnitudes
 * are logarithmic and never convert to anything else) and a plane-angle axis (kept apart from
 * pure numbers, so that an angle unit on a ratio column is refused).
 */
export interface Dimension {
  readonly mass: number;
  readonly length: number;
  readonly time: number;
  readonly mag: number;
  readonly angle: number;
}

/** The dimension of a pure number. */
export const DIMENSIONLESS: Dimension = { mass: 0, length: 0, time: 0, mag: 0, angle: 0 };

/** Builds a dimension from exponents of g, cm, s, mag and angle (missing ones are 0). */
export function dim(d: Partial<Dimension>): Dimension {
  return { ...DIMENSIONLESS, ...d };
}

/** Dimension of a^p · b^q. */
export function combine(a: Dimension, p: number, b: Dimension, q: number): Dimension {
  return {
    mass: p * a.mass + q * b.mass,
    length: p * a.length + q * b.length,
    time: p * a.time + q * b.time,
    mag: p * a.mag + q * b.mag,
    angle: p * a.angle + q * b.angle,
  };
}

/** True when both dimensions have the same exponents. */
export function sameDimension(a: Dimension, b: Dimension): boolean {
  return a.mass === b.mass && a.length === b.length && a.time === b.time && a.mag === b.mag && a.angle === b.angle;
}

/** Names of the dimensions a catalog column is likely to carry, for error messages. */
const NAMED: [Dimension, string][] = [
  [DIMENSIONLESS, 'dimensionless number'],
  [dim({ length: 1, time: -1 }), 'velocity'],
  [dim({ mass: 1, time: -3 }), 'flux'],
  [dim({ mass: 1, length: 2, time: -3 }), 'luminosity'],
  [dim({ mass: 1, time: -2 }), 'spectral flux density (per frequency)'],
  [dim({ mass: 1, length: -1, time: -3 }), 'spectral flux density (per wavelength)'],
  [dim({ mass: 1, length: 1, time: -3 }), 'spectral luminosity (per wavelength)'],
  [dim({ mass: 1, length: 2, time: -2 }), 'energy'],
  [dim({ length: 1 }), 'length'],
  [dim({ mass: 1 }), 'mass'],
  [dim({ time: 1 }), 'time'],
  [dim({ time: -1 }), 'frequency'],
  [dim({ mag: 1 }), 'magnitude'],
  [dim({ angle: 1 }), 'angle'],
];

/** A readable name: 'flux', 'luminosity', … or the cgs form 'g^1 cm^-2' when it has no common name. */
export function dimensionName(d: Dimension): string {
  for (const [nd, name] of NAMED) if (sameDimension(nd, d)) return name;
  const parts: string[] = [];
  if (d.mass) parts.push(`g^${d.mass}`);
  if (d.length) parts.push(`cm^${d.length}`);
  if (d.time) parts.push(`s^${d.time}`);
  if (d.mag) parts.push(`mag^${d.mag}`);
  if (d.angle) parts.push(`deg^${d.angle}`);
  return `quantity of dimension ${parts.join(' ')}`;
}

/** 'a flux', 'an energy'. */
export function withArticle(name: string): string {
  return `${/^[aeiou]/i.test(name) ? 'an' : 'a'} ${name}`;
}
