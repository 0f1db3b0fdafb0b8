import { describe, expect, it } from 'vitest';
import { expectClose } from '../../helpers/expectClose.ts';
import { CANONICAL_UNITS, describeUnit, unitConverter, UnitError, type QuantityKind } from '../../../src/core/units/index.ts';

// [unit string, kind, value in canonical units of 1 (or of `x`) given unit, source]
const SI = 'SI definitions (1 W = 1e7 erg/s, 1 m = 100 cm; BIPM SI Brochure 2019)';
const FACTORS: [string, QuantityKind, number, string][] = [
  ['km/s', 'velocity', 1, 'canonical'],
  ['km s-1', 'velocity', 1, 'canonical'],
  ['km.s**-1', 'velocity', 1, 'VOUnits 1.0 syntax for km s-1'],
  ['km s^-1', 'velocity', 1, 'caret exponent'],
  ['km/s', 'velocity', 1, 'canonical'],
  ['m/s', 'velocity', 1e-3, SI],
  ['cm/s', 'velocity', 1e-5, SI],
  ['erg/s/cm2', 'flux', 1, 'canonical'],
  ['erg s-1 cm-2', 'flux', 1, 'canonical'],
  ['erg/s/cm^2', 'flux', 1, 'canonical'],
  ['erg.s-1.cm-2', 'flux', 1, 'VOUnits 1.0 "." product'],
  ['erg/(s cm2)', 'flux', 1, 'parenthesised group'],
  ['1e-18 erg/s/cm2', 'flux', 1e-18, 'scale factor'],
  ['1E-17 erg s-1 cm-2', 'flux', 1e-17, 'scale factor'],
  ['1e-20 erg s-1 cm-2', 'flux', 1e-20, 'scale factor'],
  ['10-20 erg s-1 cm-2', 'flux', 1e-20, 'CDS scale factor notation (10-20 = 1e-20)'],
  ['10**-20 erg/s/cm2', 'flux', 1e-20, 'VOUnits 1.0 scale factor'],
  ['10^-19 erg/s/cm^2', 'flux', 1e-19, 'scale factor'],
  ['10^(-19) erg s^(-1) cm^(-2)', 'flux', 1e-19, 'parenthesised exponents'],
  ['erg/(s.cm**2)', 'flux', 1, 'parenthesised group with exponent inside'],
  ['1e-3 W/m^2', 'flux', 1, SI],
  ['W m-2', 'flux', 1e3, SI],
  ['W/m2', 'flux', 1e3, SI],
  ['mW m-2', 'flux', 1, SI],
  ['erg/s', 'luminosity', 1, 'canonical'],
  ['W', 'luminosity', 1e7, SI],
  ['1e44 erg/s', 'luminosity', 1e44, 'scale factor'],
  ['Lsun', 'luminosity', 3.828e33, 'IAU 2015 Resolution B3 nominal L_sun = 3.828e26 W'],
  ['solLum', 'luminosity', 3.828e33, 'IAU 2015 Resolution B3 nominal L_sun = 3.828e26 W'],
  ['Angstrom', 'wavelength', 1, 'canonical'],
  ['AA', 'wavelength', 1, 'canonical (CDS symbol)'],
  ['Å', 'wavelength', 1, 'canonical'],
  ['nm', 'wavelength', 10, SI],
  ['um', 'wavelength', 1e4, SI],
  ['µm', 'wavelength', 1e4, SI],
  ['mag', 'magnitude', 1, 'canonical'],
  ['solMass', 'mass', 1, 'canonical'],
  ['Msun', 'mass', 1, 'canonical'],
  ['1e8 solMass', 'mass', 1e8, 'scale factor'],
  ['', 'dimensionless', 1, 'canonical'],
  ['-', 'dimensionless', 1, 'canonical'],
  ['%', 'dimensionless', 0.01, 'percent'],
  ['dex', 'logDimensionless', 1, 'canonical'],
];

describe('unitConverter', () => {
  it.each(FACTORS)('converts 1 "%s" (%s) to %f canonical units', (unit, kind, factor, source) => {
    expectClose(unitConverter(unit, kind)(1), factor, { rtol: 1e-14, source });
    expectClose(unitConverter(unit, kind)(2.5), 2.5 * factor, { rtol: 1e-14, source });
  });

  it('treats an undefined, empty or "-" unit as canonical (identity)', () => {
    for (const kind of Object.keys(CANONICAL_UNITS) as QuantityKind[]) {
      expect(unitConverter(undefined, kind)(3.5)).toBe(3.5);
      expect(unitConverter('', kind)(3.5)).toBe(3.5);
      expect(unitConverter(' - ', kind)(3.5)).toBe(3.5);
    }
  });

  it('converts grams to solar masses with the IAU 2015 nominal mass', () => {
    // M_sun = 1.98840987e33 g (IAU 2015 B3 GM_sun / CODATA 2018 G, computed); rtol follows its 9 digits.
    expectClose(unitConverter('g', 'mass')(1.98840987e33), 1, { rtol: 1e-9, source: 'IAU 2015 B3 / CODATA 2018' });
    expectClose(unitConverter('kg', 'mass')(1.98840987e30), 1, { rtol: 1e-9, source: 'IAU 2015 B3 / CODATA 2018' });
  });

  it('reads log mass units and linear masses for logMass', () => {
    const src = 'definition of log10 and of the unit';
    expect(unitConverter('log(solMass)', 'logMass')(9.5)).toBe(9.5);
    expect(unitConverter('dex(solMass)', 'logMass')(9.5)).toBe(9.5);
    expect(unitConverter('[solMass]', 'logMass')(9.5)).toBe(9.5);
    expect(unitConverter('[Msun]', 'logMass')(9.5)).toBe(9.5);
    expect(unitConverter('log10 Msun', 'logMass')(9.5)).toBe(9.5);
    expect(unitConverter('log10(Msun)', 'logMass')(9.5)).toBe(9.5);
    // Bare dex on a log-mass column (or its error) is dex of solMass: common practice, no source.
    expect(unitConverter('dex', 'logMass')(9.5)).toBe(9.5);
    expectClose(unitConverter('log(1e6 solMass)', 'logMass')(2), 8, { rtol: 1e-15, source: src });
    expectClose(unitConverter('solMass', 'logMass')(3.16e9), Math.log10(3.16e9), { rtol: 1e-15, source: src });
    expectClose(unitConverter('1e8 Msun', 'logMass')(2), Math.log10(2e8), { rtol: 1e-15, source: src });
    // log10 of grams: log10(1.98840987e33) = 33.29850 (computed) → 0 in log solMass.
    expectClose(unitConverter('log(g)', 'logMass')(Math.log10(1.98840987e33)), 0, { atol: 1e-9, source: 'IAU 2015 B3 / CODATA 2018' });
  });

  it('reads dex and [-] as a dimensionless logarithm', () => {
    expect(unitConverter('dex', 'logDimensionless')(-1.2)).toBe(-1.2);
    expect(unitConverter('[-]', 'logDimensionless')(-1.2)).toBe(-1.2);
  });
});

describe('unitConverter errors', () => {
  it('name an unknown unit', () => {
    expect(() => unitConverter('furlong/s', 'velocity')).toThrow(UnitError);
    expect(() => unitConverter('furlong/s', 'velocity')).toThrow(/^unknown unit "furlong\/s"/);
    expect(() => unitConverter('km/s/', 'velocity')).toThrow(/unknown unit "km\/s\/"/);
    expect(() => unitConverter('erg/(s cm2', 'flux')).toThrow(/unknown unit "erg\/\(s cm2": unbalanced parenthesis/);
  });

  it('name the unit, its dimension and the expected one when the dimension is wrong', () => {
    expect(() => unitConverter('erg/s', 'flux')).toThrow('unit "erg/s" is a luminosity, expected a flux (erg s-1 cm-2)');
    expect(() => unitConverter('mJy', 'flux')).toThrow('unit "mJy" is a spectral flux density (per frequency), expected a flux (erg s-1 cm-2)');
    expect(() => unitConverter('erg/s/cm2/AA', 'flux')).toThrow(/is a spectral flux density \(per wavelength\), expected a flux/);
    expect(() => unitConverter('km', 'velocity')).toThrow('unit "km" is a length, expected a velocity (km s-1)');
    expect(() => unitConverter('mag', 'mass')).toThrow('unit "mag" is a magnitude, expected a mass (solMass)');
    expect(() => unitConverter('log(solMass)', 'mass')).toThrow('unit "log(solMass)" is a logarithmic unit, expected a mass (solMass)');
    expect(() => unitConverter('log(km)', 'logMass')).toThrow('unit "log(km)" is the log of a length, expected a log mass (log(solMass))');
    expect(() => unitConverter('dex', 'mass')).toThrow('unit "dex" is the log of a dimensionless number, expected a mass (solMass)');
    expect(() => unitConverter('km/s', 'dimensionless')).toThrow('unit "km/s" is a velocity, expected a dimensionless number (dimensionless)');
  });
});

describe('unitConverter for angles', () => {
  it.each<[string, number, number]>([
    // Definitions: 1 h of hour angle = 15 deg; π rad = 180 deg; 60 arcmin = 3600 arcsec = 1 deg (IAU/SI definitions).
    ['deg', 47.342485, 47.342485],
    ['hourangle', 10, 150],
    ['rad', Math.PI, 180],
    ['arcmin', 90, 1.5],
    ['arcsec', 5400, 1.5],
    ['mas', 3.6e6, 1],
  ])('converts %s to degrees (%s → %s)', (unit, x, deg) => {
    expectClose(unitConverter(unit, 'angle')(x), deg, { rtol: 1e-14, source: 'definition of the unit' });
  });

  it('keeps angles apart from pure numbers', () => {
    expect(() => unitConverter('deg', 'dimensionless')).toThrow('unit "deg" is an angle, expected a dimensionless number (dimensionless)');
    expect(() => unitConverter('', 'angle')).not.toThrow();
    expect(() => unitConverter('km/s', 'angle')).toThrow('unit "km/s" is a velocity, expected an angle (deg)');
  });
});

describe('describeUnit', () => {
  it('says what a unit measures and its size in cgs', () => {
    const d = describeUnit('1e-18 erg/s/cm2');
    expect(d.quantity).toBe('flux');
    expect(d.log).toBe(false);
    expectClose(d.cgs, 1e-18, { rtol: 1e-15, source: 'scale factor' });
    expect(d.text).toContain('"1e-18 erg/s/cm2" is a flux');
    expect(describeUnit('[solMass]')).toMatchObject({ quantity: 'mass', log: true });
  });

  it('lists a canonical unit for each kind', () => {
    expect(CANONICAL_UNITS).toEqual({
      velocity: 'km s-1',
      flux: 'erg s-1 cm-2',
      luminosity: 'erg s-1',
      wavelength: 'Angstrom',
      magnitude: 'mag',
      mass: 'solMass',
      logMass: 'log(solMass)',
      dimensionless: '',
      logDimensionless: 'dex',
      angle: 'deg',
    });
  });
});
