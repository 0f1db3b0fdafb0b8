import { describe, expect, it } from 'vitest';
import { summarizeRows, wilsonFraction } from '../../../src/site/readings/summarizeRows.ts';
import type { RederivedRow } from '../../../src/site/readings/rederiveBatch.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const row = (i: number, p: number | null, delta: number | null, lam: number | null, mbh: number | null, flags = ''): RederivedRow => ({
  id: `o${i}`, log_mbh: mbh, log_mbh_p16: null, log_mbh_p50: null, log_mbh_p84: null, mbh_method: null,
  log_lbol: null, log_lbol_p16: null, log_lbol_p84: null, lbol_method: null,
  log_edd_ratio: mbh === null ? null : -mbh, log_edd_ratio_p16: null, log_edd_ratio_p84: null,
  p_super_eddington: p, delta_log_mbh_local: delta, p_above_local: null, log_mseed: null, lambda_req_light: lam, lambda_req_heavy: null, flags,
});

describe('summarizeRows', () => {
  it('gives the Wilson 68 % interval astropy gives', () => {
    // Computed with astropy 5.2.1: binom_conf_interval(3, 400, 0.682689492137086, 'wilson') = [0.00424807, 0.01320829].
    const f = wilsonFraction(3, 400);
    expectClose(f.lo!, 0.00424807, { atol: 5e-9, source: 'astropy 5.2.1 binom_conf_interval wilson, 8 digits' });
    expectClose(f.hi!, 0.01320829, { atol: 5e-9, source: 'astropy 5.2.1 binom_conf_interval wilson, 8 digits' });
    // astropy 5.2.1: 1 of 1 → [0.5, 1]; 0 of 0 has no interval.
    expect(wilsonFraction(1, 1)).toMatchObject({ fraction: 1, lo: 0.5, hi: 1 });
    expect(wilsonFraction(0, 0)).toMatchObject({ fraction: null, lo: null, hi: null });
  });

  it('counts with the SQL summary\'s thresholds (strictly above 0.84, 1 dex and λ = 1) and interpolates the median', () => {
    const rows = [row(0, 0.85, 1.5, 2, 6), row(1, 0.84, 1, 1, 7), row(2, 0.9, null, null, 8), row(3, null, 0.2, 0.5, null)];
    const s = summarizeRows('x', rows);
    expect(s.objects).toBe(4);
    expect(s.superEddington).toMatchObject({ k: 2, n: 3 });
    expect(s.overMassive).toMatchObject({ k: 1, n: 3 });
    expect(s.needsSuperEddingtonLight).toMatchObject({ k: 1, n: 3 });
    expect(s.medianLogMbh).toBe(7);
    expect(summarizeRows('y', rows.slice(0, 2)).medianLogMbh).toBe(6.5);
  });

  it('leaves bounds out as the SQL summary does: an upper-limit mass from the offset, the light-seed λ and the median mass', () => {
    const rows = [
      row(0, 0.9, 1.5, 2, 6),
      row(1, null, 1.5, 2, 9, 'edd_ratio_lower_limit,lbol_upper_limit,mbh_upper_limit'),
      row(2, null, 0.5, 0.5, 7, 'edd_ratio_upper_limit'),
    ];
    const s = summarizeRows('x', rows);
    // Row 1's offset of 1.5 dex rests on an upper-limit mass: not counted (with it, 2 of 3).
    expect(s.overMassive).toMatchObject({ k: 1, n: 2 });
    expect(s.needsSuperEddingtonLight).toMatchObject({ k: 1, n: 2 });
    expect(s.medianLogMbh).toBe(6.5);
    // log λ_Edd = −log M here: only row 0's is not a bound.
    expect(s.medianLogEddRatio).toBe(-6);
  });
});
