import { describe, expect, it } from 'vitest';
import { expectClose } from '../../helpers/expectClose.ts';
import { describeUnit, unitConverter, UnitError, type QuantityKind } from '../../../src/core/units/index.ts';

// Unit strings as catalogs write them, beyond the table in unitConverter.test.ts: spacing,
// separators, rational exponents, scale factors, and the messages for what cannot be read.
// Sizes: SI definitions (BIPM SI Brochure 2019); syntax: IVOA VOUnits 1.0 (2014) §2.

describe('parseUnit through unitConverter: spelling', () => {
  it('reads several spaces between factors and after a scale factor, and ignores spaces around the unit', () => {
    expectClose(unitConverter('km   s-1', 'velocity')(1), 1, { rtol: 1e-14, source: 'canonical' });
    expectClose(unitConverter('1e-18   erg/s/cm2', 'flux')(1), 1e-18, { rtol: 1e-14, source: 'scale factor' });
    expectClose(unitConverter('  m/s  ', 'velocity')(1), 1e-3, { rtol: 1e-14, source: 'SI: 1 m/s = 1e-3 km/s' });
  });

  it('reads a log unit and dex with spaces around them', () => {
    expect(unitConverter(' log(solMass) ', 'logMass')(9.5)).toBe(9.5);
    expect(unitConverter(' dex ', 'logDimensionless')(0.3)).toBe(0.3);
  });

  it('treats a unit of spaces only as the canonical unit', () => {
    expect(unitConverter('   ', 'velocity')(5)).toBe(5);
  });

  it("reads '*' and the middle dot '·' as products, as '.' and a space are", () => {
    expectClose(unitConverter('erg*s**-1*cm**-2', 'flux')(1), 1, { rtol: 1e-14, source: 'VOUnits 1.0 §2 products' });
    expectClose(unitConverter('erg·s-1·cm-2', 'flux')(1), 1, { rtol: 1e-14, source: 'common spelling of a product' });
  });

  it('reads a rational exponent in parentheses: s**(-2/2) is s-1 and cm**(-4/2) is cm-2', () => {
    expectClose(unitConverter('erg s**(-2/2) cm**(-4/2)', 'flux')(1), 1, { rtol: 1e-14, source: 'VOUnits 1.0 §2.3 rational exponents' });
    expectClose(unitConverter('m**(3/3)/s', 'velocity')(1), 1e-3, { rtol: 1e-14, source: 'SI: 1 m/s = 1e-3 km/s' });
  });

  it("reads a scale factor joined to the unit by '*' or '×'", () => {
    expectClose(unitConverter('1e-18*erg/s/cm2', 'flux')(1), 1e-18, { rtol: 1e-14, source: 'scale factor' });
    expectClose(unitConverter('1e-18 × erg/s/cm2', 'flux')(1), 1e-18, { rtol: 1e-14, source: 'scale factor' });
    expectClose(unitConverter('1e-18.erg.s-1.cm-2', 'flux')(1), 1e-18, { rtol: 1e-14, source: 'VOUnits 1.0 "." product after a scale factor' });
  });

  it('reads a bare number as a dimensionless scale and a scaled percent', () => {
    expect(unitConverter('1000', 'dimensionless')(1)).toBe(1000);
    expectClose(unitConverter('10 %', 'dimensionless')(1), 0.1, { rtol: 1e-14, source: '10 % = 0.1' });
  });

  it('reads SI prefixes only on units that take them', () => {
    expectClose(unitConverter('Mm/ks', 'velocity')(1), 1, { rtol: 1e-14, source: 'SI prefixes: 1e6 m / 1e3 s = 1 km/s' });
    // Ångström and the solar units take no SI prefix (src/core/units/unitSymbols.ts; VOUnits 1.0 §2.4 lists
    // Angstrom among the units not to be prefixed: from memory).
    expect(() => unitConverter('kAngstrom', 'wavelength')).toThrow(/"kAngstrom" is not a recognised unit symbol/);
    expect(() => unitConverter('kMsun', 'mass')).toThrow(/"kMsun" is not a recognised unit symbol/);
    // 'x' is no SI prefix, although 's' is a unit.
    expect(() => unitConverter('km/xs', 'velocity')).toThrow(/"xs" is not a recognised unit symbol/);
  });
});

describe('parseUnit through unitConverter: what cannot be read', () => {
  it('names an empty group', () => {
    expect(() => unitConverter('erg/()', 'luminosity')).toThrow('unknown unit "erg/()": nothing where a unit was expected');
  });

  it('names the part it cannot read', () => {
    expect(() => unitConverter('km/$', 'velocity')).toThrow('unknown unit "km/$": cannot read "$"');
  });

  it('rejects a scale factor that is zero or negative', () => {
    expect(() => unitConverter('0 erg/s', 'luminosity')).toThrow('unknown unit "0 erg/s": scale factor 0 must be positive');
    expect(() => unitConverter('-1 erg/s', 'luminosity')).toThrow(/scale factor -1 must be positive/);
  });

  it('rejects a unit whose size overflows', () => {
    expect(() => unitConverter('1e300 Yerg/s', 'luminosity')).toThrow('unknown unit "1e300 Yerg/s": its size is not a positive finite number');
  });

  it('names an unknown quantity kind', () => {
    expect(() => unitConverter('km/s', 'speed' as QuantityKind)).toThrow('unknown quantity kind "speed"');
  });

  it('rejects a linear dimensionless unit for a logarithmic column', () => {
    expect(() => unitConverter('%', 'logDimensionless')).toThrow('unit "%" is linear, expected');
  });

  it('names a dimension that has no common name by its cgs exponents', () => {
    expect(() => unitConverter('g cm', 'velocity')).toThrow('unit "g cm" is a quantity of dimension g^1 cm^1, expected a velocity');
    expect(() => unitConverter('s2 mag', 'velocity')).toThrow('is a quantity of dimension s^2 mag^1,');
  });

  it('throws errors named UnitError', () => {
    let caught: unknown;
    try {
      unitConverter('furlong', 'velocity');
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(UnitError);
    expect((caught as Error).name).toBe('UnitError');
  });
});

describe('describeUnit of a log unit', () => {
  it('says it is the log10 of a mass unit of one solar mass, 1.98841e33 g', () => {
    // M_sun = GM_sun / G = 1.3271244e26 cm³ s⁻² (IAU 2015 B3 nominal) / 6.67430e-8 (CODATA 2018) = 1.98841e33 g, 6 digits.
    expect(describeUnit('log(solMass)').text).toBe('"log(solMass)" is the log10 of a mass unit of 1.98841e+33 in cgs');
  });
});
