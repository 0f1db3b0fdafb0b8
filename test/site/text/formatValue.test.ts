import { describe, expect, it } from 'vitest';
import { formatCount, formatValue, isNumericType, MISSING } from '../../../src/site/text/formatValue.ts';

describe('formatValue', () => {
  it('prints log quantities and percentiles to 0.01 dex', () => {
    expect(formatValue('log_mbh', 7.4567)).toBe('7.46');
    expect(formatValue('log_edd_ratio_p16', -0.004)).toBe('0.00');
    expect(formatValue('delta_log_mbh_local', 1.005)).toBe('1.00');
    // Names a query gives: median of a log column, bare percentiles.
    expect(formatValue('median_log_edd_ratio', -0.6183)).toBe('−0.62');
    expect(formatValue('p84', -0.00255)).toBe('0.00');
  });
  it('says a probability is below 0.01 or above 0.99 rather than round it to 0.00 or 1.00', () => {
    // 2 draws in 2000 showed as "0.00" on an object page.
    expect(formatValue('p_super_eddington', 0.001)).toBe('< 0.01');
    expect(formatValue('p_above_local', 0.9995)).toBe('> 0.99');
    expect(formatValue('p_super_eddington', 0)).toBe('0.00');
    expect(formatValue('p_super_eddington', 1)).toBe('1.00');
    expect(formatValue('p_super_eddington', 0.005)).toBe('0.01');
    expect(formatValue('p_above_local', 0.42)).toBe('0.42');
  });

  it('prints redshifts to 0.001 and coordinates to 1e-5 degrees', () => {
    expect(formatValue('z', 6.12345)).toBe('6.123');
    expect(formatValue('ra', 150.1234567)).toBe('150.12346');
  });
  it('prints fluxes in scientific notation and widths without decimals', () => {
    expect(formatValue('flux_halpha', 2.346e-18)).toBe('2.35×10⁻¹⁸');
    expect(formatValue('fwhm_halpha', 2345.6)).toBe('2346');
    expect(formatValue('lambda_req_light', 1.23456)).toBe('1.23');
  });
  it('shows missing values as a dash, booleans as words and text as it is', () => {
    expect(formatValue('log_mbh', null)).toBe(MISSING);
    expect(formatValue('log_mbh', Number.NaN)).toBe(MISSING);
    expect(formatValue('flux_halpha_is_limit', true)).toBe('yes');
    expect(formatValue('notes', '<b>x</b>')).toBe('<b>x</b>');
  });
  it('recognises numeric column types', () => {
    expect(isNumericType('Float64')).toBe(true);
    expect(isNumericType('Int32')).toBe(true);
    expect(isNumericType('Utf8')).toBe(false);
  });
});

describe('one formatter for the whole site', () => {
  it('prints negative numbers with the minus sign, not the hyphen', () => {
    expect(formatValue('log_edd_ratio', -1.234)).toBe('−1.23');
    expect(formatValue('delta_log_mbh_local', -0.5)).toBe('−0.50');
    expect(formatValue('some_ratio', -12.5)).toBe('−12.5');
    expect(formatValue('offset', -3)).toBe('−3');
  });
  it('prints the luminosity distance in whole Mpc whatever its size (it was 36980 and 1.03e5)', () => {
    expect(formatValue('dl_mpc', 36980.4)).toBe('36980');
    expect(formatValue('dl_mpc', 103412.7)).toBe('103413');
  });
  it('prints very large and very small numbers as powers of ten', () => {
    expect(formatValue('lum_halpha', 3.2e42)).toBe('3.20×10⁴²');
    expect(formatValue('x', 0.000123)).toBe('1.23×10⁻⁴');
  });
  it('prints counts grouped by thousands', () => {
    expect(formatCount(1234567)).toBe('1,234,567');
  });
});

describe('formatValue of flags', () => {
  it('spaces the comma-separated flags so they wrap', () => {
    expect(formatValue('flags', 'a,b,,c')).toBe('a, b, c');
  });
});
