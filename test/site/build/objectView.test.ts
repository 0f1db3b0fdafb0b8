import { describe, expect, it } from 'vitest';
import { objectView } from '../../../src/site/build/objectView.ts';

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
