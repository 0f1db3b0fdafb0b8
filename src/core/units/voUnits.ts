import type { QuantityKind } from './quantityKind.ts';

/**
 * The unit written into output files for each kind, in IVOA VOUnits 1.0 notation ('.' between
 * factors, '**' before exponents) so that astropy's `vounit` reader and VO tools read it. Log
 * quantities use the function form astropy writes, `dex(solMass)`, which astropy's generic unit
 * reader parses. The values are the same as {@link CANONICAL_UNITS} describes; only the spelling differs.
 */
export const VO_UNITS: Readonly<Record<QuantityKind, string>> = {
  velocity: 'km.s**-1',
  flux: 'erg.s**-1.cm**-2',
  luminosity: 'erg.s**-1',
  wavelength: 'Angstrom',
  magnitude: 'mag',
  mass: 'solMass',
  logMass: 'dex(solMass)',
  dimensionless: '',
  logDimensionless: 'dex',
  angle: 'deg',
};

/** VOUnits of log10 of a luminosity in erg/s, as astropy writes it. */
export const VO_LOG_LUMINOSITY = 'dex(erg.s**-1)';
