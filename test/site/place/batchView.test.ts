import { describe, expect, it } from 'vitest';
import { placedCells, readingCells } from '../../../src/site/place/batchView.ts';

const report = { ranks: [], zWindow: null, neighbours: [] };

describe('placedCells', () => {
  it('writes each bound with its direction: "<" for upper limits, ">" for a lower-limit Eddington ratio, never as a plain number', () => {
    const bound = {
      id: 'NEW-1', z: 6.1,
      log_mbh: 7.31, log_mbh_is_limit: true,
      log_lbol: 45.2, log_lbol_is_limit: false,
      log_edd_ratio: -0.21, log_edd_ratio_is_limit: true,
      delta_log_mbh_local: 1.4, delta_log_mbh_local_is_limit: true,
      flags: 'mbh_upper_limit,edd_ratio_lower_limit',
    };
    const measured = { id: 'NEW-2', z: 5.0, log_mbh: 7.9, log_mbh_is_limit: false, log_lbol: 45.0, log_lbol_is_limit: false, log_edd_ratio: -1, log_edd_ratio_is_limit: false, delta_log_mbh_local: 0.5, delta_log_mbh_local_is_limit: false, flags: '' };
    // columns: row, id, z, log M_BH, log L_bol, log λ_Edd, Δ local, rank
    expect(placedCells({ row: 1, id: 'NEW-1', placed: bound, report }).slice(3, 7)).toEqual(['< 7.31', '45.20', '> −0.21', '< 1.40']);
    expect(placedCells({ row: 2, id: 'NEW-2', placed: measured, report }).slice(3, 7)).toEqual(['7.90', '45.00', '−1.00', '0.50']);
  });
});

describe('readingCells', () => {
  it('marks the bounds of a pasted object under a reading from its flags', () => {
    const row = {
      id: 'NEW-1', log_mbh: 7.31, log_mbh_p16: null, log_mbh_p50: null, log_mbh_p84: null, mbh_method: 'vp06_hbeta_line', log_lbol: 45.2, log_lbol_p16: 45.1, log_lbol_p84: 45.3, lbol_method: 'bc5100',
      log_edd_ratio: -0.21, log_edd_ratio_p16: null, log_edd_ratio_p84: null, p_super_eddington: null, delta_log_mbh_local: 1.4, p_above_local: null, log_mseed: 4.1, lambda_req_light: null, lambda_req_heavy: null,
      flags: 'mbh_upper_limit,edd_ratio_lower_limit',
    };
    expect(readingCells('NEW-1', { label: 'Standard' }, row)).toEqual(['NEW-1', 'Standard', '< 7.31', '45.20', '> −0.21', '—', '< 1.40', 'mbh_upper_limit, edd_ratio_lower_limit']);
  });
});
