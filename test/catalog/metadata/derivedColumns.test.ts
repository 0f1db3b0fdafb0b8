import { describe, expect, it } from 'vitest';
import { derivedColumnSpecs } from '../../../src/catalog/metadata/derivedColumns.ts';
import { PACKED_FIELDS } from '../../../src/catalog/derive/packedDerived.ts';

describe('derivedColumnSpecs', () => {
  it('lists the derived columns in output order, one log_lum column per measured line', () => {
    expect(derivedColumnSpecs(['halpha', 'civ']).map((c) => c.name)).toEqual([
      'age_gyr', 'dl_mpc', 'log_lum_halpha', 'log_lum_civ', 'log_l5100', 'log_mbh', 'mbh_method', 'log_lbol', 'lbol_method',
      'log_edd_ratio', 'p_super_eddington', 'log_mseed', 'lambda_req_light', 'lambda_req_heavy', 'delta_log_mbh_local',
      'local_offset_sigma', 'p_above_local',
      'log_mbh_is_limit', 'log_lbol_is_limit', 'log_edd_ratio_is_limit', 'log_mseed_is_limit', 'lambda_req_is_limit', 'delta_log_mbh_local_is_limit', 'flags',
      'log_mbh_p16', 'log_mbh_p50', 'log_mbh_p84', 'log_lbol_p16', 'log_lbol_p50', 'log_lbol_p84',
      'log_edd_ratio_p16', 'log_edd_ratio_p50', 'log_edd_ratio_p84', 'log_mseed_p16', 'log_mseed_p50', 'log_mseed_p84',
      'delta_log_mbh_local_p16', 'delta_log_mbh_local_p50', 'delta_log_mbh_local_p84',
    ]);
  });

  it('reads every numeric field of the packed results exactly once when all lines are measured', () => {
    const sources = derivedColumnSpecs(['halpha', 'hbeta', 'mgii', 'civ']).map((c) => c.source).filter((s) => !['mbhMethod', 'lbolMethod', 'flags'].includes(s));
    expect([...sources].sort()).toEqual([...PACKED_FIELDS].sort());
  });

  it('gives every column a description, and a unit to every float column', () => {
    for (const c of derivedColumnSpecs(['halpha'])) {
      expect(c.description.length).toBeGreaterThan(10);
      if (c.kind === 'float') expect(c.unit).toBeDefined();
    }
  });

  it('marks the median percentile with stat.median and the others with stat.percentile', () => {
    const specs = derivedColumnSpecs([]);
    expect(specs.find((c) => c.name === 'log_mbh_p50')?.ucd).toBe('phys.mass;stat.median');
    expect(specs.find((c) => c.name === 'log_mbh_p16')?.ucd).toBe('phys.mass;stat.percentile');
  });
});
