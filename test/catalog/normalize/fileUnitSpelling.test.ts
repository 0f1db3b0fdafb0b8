import { describe, expect, it } from 'vitest';
import { fileUnitSpelling } from '../../../src/catalog/normalize/fileUnitSpelling.ts';

describe('fileUnitSpelling', () => {
  // Spellings written by astropy 5.2.1: VOTable uses the CDS form, FITS the `10**k` form.
  it.each([
    ['10-20erg.s-1.cm-2', '1e-20 erg.s-1.cm-2'],
    ['10+42erg.s-1', '1e+42 erg.s-1'],
    ['10**-20 cm-2 erg s-1', '1e-20 cm-2 erg s-1'],
    ['10**42 erg s-1', '1e42 erg s-1'],
    ['10**(-18) erg s-1', '1e-18 erg s-1'],
  ])('writes the scale factor of %s as %s', (unit, want) => expect(fileUnitSpelling(unit)).toBe(want));

  it.each(['km.s-1', '1e-20 erg / (cm2 s)', '10 km/s', '100m', 'dex(solMass)', '[solMass]'])('leaves %s as written', (unit) => {
    expect(fileUnitSpelling(unit)).toBe(unit);
  });
});
