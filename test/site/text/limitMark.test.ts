import { describe, expect, it } from 'vitest';
import { limitMark } from '../../../src/site/text/limitMark.ts';

describe('limitMark', () => {
  it('marks a derived value as an upper limit from its _is_limit column', () => {
    expect(limitMark('log_mbh', { log_mbh: 7.1, log_mbh_is_limit: true, flags: 'mbh_upper_limit' })).toBe('<');
    expect(limitMark('lambda_req_light', { lambda_req_is_limit: true })).toBe('<');
    expect(limitMark('log_mbh', { log_mbh: 7.1, log_mbh_is_limit: false, flags: '' })).toBe('');
  });

  it('gives the Eddington ratio its direction from the flags', () => {
    expect(limitMark('log_edd_ratio', { log_edd_ratio_is_limit: true, flags: 'edd_ratio_lower_limit' })).toBe('>');
    expect(limitMark('log_edd_ratio', { log_edd_ratio_is_limit: true, flags: 'lbol_upper_limit,edd_ratio_upper_limit' })).toBe('<');
  });

  it('falls back to the flags for a catalog written before the _is_limit columns', () => {
    expect(limitMark('log_lbol', { log_lbol: 44, flags: 'lbol_upper_limit' })).toBe('<');
    expect(limitMark('log_lbol', { log_lbol: 44, flags: 'no_host_mass' })).toBe('');
  });
});

describe('limitMark on luminosities from an upper-limit flux', () => {
  it('marks a line luminosity whose flux is an upper limit, and only that line', () => {
    // A referee found log_lum_halpha (41.19) and log_l5100 (42.68) of an upper-limit Hα flux shown as measurements.
    const row = { flux_halpha_is_limit: true, flux_hbeta_is_limit: false, log_lum_halpha: 41.19, log_lum_hbeta: 40.7, lam_l_5100: null, log_l5100: 42.68 };
    expect(limitMark('log_lum_halpha', row)).toBe('<');
    expect(limitMark('log_lum_hbeta', row)).toBe('');
    expect(limitMark('log_lum_mgii', row)).toBe('');
  });

  it('marks an L5100 made from a limit line, not one measured', () => {
    expect(limitMark('log_l5100', { flux_halpha_is_limit: true, log_lum_halpha: 41.2, lam_l_5100: null })).toBe('<');
    expect(limitMark('log_l5100', { flux_halpha_is_limit: true, log_lum_halpha: 41.2, lam_l_5100: 3e42 })).toBe('');
    // Without Hα, L5100 comes from Hβ.
    expect(limitMark('log_l5100', { log_lum_halpha: null, flux_hbeta_is_limit: true, lam_l_5100: null })).toBe('<');
    expect(limitMark('log_l5100', { flux_halpha_is_limit: false, log_lum_halpha: 41.2, flux_hbeta_is_limit: true, lam_l_5100: null })).toBe('');
  });
});
