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
