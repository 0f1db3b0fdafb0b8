import { describe, expect, it } from 'vitest';
import { chartsToRedraw, sameColumns, SHIFT_COLUMNS } from '../../../src/site/readings/changedCharts.ts';
import type { RederivedRow } from '../../../src/site/readings/rederiveBatch.ts';

const KEYS = ['mbh-mstar', 'mbh-z', 'lbol-mbh', 'edd-hist'];

function rows(change: Partial<RederivedRow> = {}): RederivedRow[] {
  return Array.from({ length: 3 }, (_, i) => ({
    id: `o${i}`, log_mbh: 7 + i, log_mbh_p16: 6.6 + i, log_mbh_p50: 7 + i, log_mbh_p84: 7.4 + i, mbh_method: 'Ha_RV15',
    log_lbol: 45 + i, log_lbol_p16: 44.8 + i, log_lbol_p84: 45.2 + i, lbol_method: 'halpha', log_edd_ratio: -0.2, log_edd_ratio_p16: -0.5,
    log_edd_ratio_p84: 0.1, p_super_eddington: 0.3, delta_log_mbh_local: 1.2, p_above_local: 0.9, log_mseed: 3, lambda_req_light: 1.1,
    lambda_req_heavy: 0.7, flags: '', ...(i === 1 ? change : {}),
  }));
}

describe('which drawings a new custom reading changes', () => {
  it('redraws every chart when the charts show something else', () => {
    expect(chartsToRedraw(KEYS, null, rows())).toEqual(KEYS);
  });

  it('keeps every chart when only quantities no chart draws change (a new ε moves the seed masses only)', () => {
    expect(chartsToRedraw(KEYS, rows(), rows({ log_mseed: 4, lambda_req_light: 2 }))).toEqual([]);
  });

  it('redraws only the charts of luminosity and Eddington ratio when the bolometric correction changes', () => {
    expect(chartsToRedraw(KEYS, rows(), rows({ log_lbol: 44, log_edd_ratio: -1.2 }))).toEqual(['lbol-mbh', 'edd-hist']);
  });

  it('redraws every chart when the masses change, or a flag, or the objects', () => {
    expect(chartsToRedraw(KEYS, rows(), rows({ log_mbh_p84: 8.5 }))).toEqual(['mbh-mstar', 'mbh-z', 'lbol-mbh']);
    expect(chartsToRedraw(KEYS, rows(), rows({ flags: 'mbh_upper_limit' }))).toEqual(KEYS);
    expect(chartsToRedraw(KEYS, rows(), rows().slice(1))).toEqual(KEYS);
    expect(chartsToRedraw([...KEYS, 'unknown'], rows(), rows())).toEqual(['unknown']);
  });

  it('tells a null from a zero and a negative zero from a zero', () => {
    expect(sameColumns(rows({ log_edd_ratio: 0 }), rows({ log_edd_ratio: -0 }), ['log_edd_ratio'])).toBe(false);
    expect(sameColumns(rows({ log_mbh: null }), rows({ log_mbh: 0 }), SHIFT_COLUMNS)).toBe(false);
    expect(sameColumns(rows(), rows(), SHIFT_COLUMNS)).toBe(true);
  });
});
