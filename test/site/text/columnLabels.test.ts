import { describe, expect, it } from 'vitest';
import { columnLabel, unitText } from '../../../src/site/text/columnLabels.ts';

describe('column labels', () => {
  it('names line, error and percentile columns in words', () => {
    expect(columnLabel('fwhm_hbeta_err')).toBe('FWHM Hβ error');
    expect(columnLabel('flux_halpha_is_limit')).toBe('Flux Hα is an upper limit');
    expect(columnLabel('log_mbh_p84')).toBe('Black-hole mass, 84th percentile');
    expect(columnLabel('some_passthrough')).toBe('some_passthrough');
  });
  it('writes VOUnits as a reader does', () => {
    expect(unitText('log(solMass)')).toBe('log M☉');
    expect(unitText('log(erg/s)')).toBe('log erg s⁻¹');
    // units written one way: the catalog's 'erg s-1' and 'log(erg/s)' read alike
    expect(unitText('erg s-1')).toBe('erg s⁻¹');
    expect(unitText('erg s-1 cm-2')).toBe('erg s⁻¹ cm⁻²');
    expect(unitText('km s-1')).toBe('km s⁻¹');
    expect(unitText('km/s')).toBe('km s⁻¹');
    expect(unitText('Mpc')).toBe('Mpc');
    // VOUnits as the catalog now writes them read the same way
    expect(unitText('dex(solMass)')).toBe('log M☉');
    expect(unitText('dex(erg.s**-1)')).toBe('log erg s⁻¹');
    expect(unitText('erg.s**-1.cm**-2')).toBe('erg s⁻¹ cm⁻²');
    expect(unitText('km.s**-1')).toBe('km s⁻¹');
    expect(unitText('')).toBe('');
  });
});
