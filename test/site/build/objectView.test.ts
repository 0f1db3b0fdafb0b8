import { describe, expect, it } from 'vitest';
import { objectView, valueText, type ViewLine } from '../../../src/site/build/objectView.ts';

describe('objectView of a bound', () => {
  const row = {
    id: 'L-1', z: 6, log_mbh: 7.1, log_mbh_p16: 6.7, log_mbh_p84: 7.5, log_mbh_is_limit: true,
    log_lbol: 44.2, log_lbol_p16: 44.0, log_lbol_p84: 44.4, log_lbol_is_limit: false,
    log_edd_ratio: -0.8, log_edd_ratio_is_limit: true, flags: 'mbh_upper_limit,edd_ratio_lower_limit',
  };
  const view = objectView(row, Object.keys(row), { columns: {} });
  const line = (c: string) => view.derived.find((l) => l.column === c)!;

  it('shows "<" and no 16–84 % interval for an upper limit, even when the file holds percentiles', () => {
    expect(line('log_mbh').limitMark).toBe('<');
    expect(line('log_mbh').spread).toBe('');
  });

  it('shows ">" for a lower-limit Eddington ratio and the interval of a measured value', () => {
    expect(line('log_edd_ratio').limitMark).toBe('>');
    expect(line('log_lbol').limitMark).toBeUndefined();
    expect(line('log_lbol').spread).toMatch(/–/);
  });
});

describe('valueText', () => {
  const line = (over: Partial<ViewLine>): ViewLine => ({ column: 'log_mbh', label: 'Black-hole mass', value: '6.28', spread: '', unit: 'dex(solMass)', description: '', numeric: true, ...over });

  it('writes a measurement as it is, with no words after it', () => {
    expect(valueText(line({ spread: '6.1 – 6.5' }))).toEqual({ text: '6.28', note: null });
  });

  it('marks an upper limit of an input or a derived bound with "<"', () => {
    expect(valueText(line({ limit: true }))).toEqual({ text: '< 6.28', note: 'upper limit' });
    expect(valueText(line({ limitMark: '<' }))).toEqual({ text: '< 6.28', note: 'upper limit' });
  });

  it('marks a lower limit with ">" and says so', () => {
    expect(valueText(line({ column: 'log_edd_ratio', value: '-0.69', limitMark: '>' }))).toEqual({ text: '> -0.69', note: 'lower limit' });
  });
});
