import { describe, expect, it } from 'vitest';
import { readingSummarySql, SUMMARY_INTERVAL_METHOD, summaryFromRow } from '../../../src/core/readings/readingSummary.ts';

describe('readingSummarySql', () => {
  it('groups by reading and names the counts, fractions, intervals and medians summaryFromRow reads', () => {
    const sql = readingSummarySql('readings');
    expect(sql).toContain('FROM readings');
    expect(sql).toContain('GROUP BY reading');
    for (const key of ['super', 'over', 'light']) for (const c of ['n', 'k', 'f', 'lo', 'hi']) expect(sql).toContain(`${c}_${key}`);
    expect(SUMMARY_INTERVAL_METHOD).toMatch(/Wilson 1927/);
  });

  it('turns a result row into numbers, nulls staying null', () => {
    const s = summaryFromRow({ reading: 'standard', objects: 4, n_super: 4, k_super: 1, f_super: 0.25, lo_super: 0.1, hi_super: 0.5, n_over: 0, k_over: 0, f_over: null, lo_over: null, hi_over: null, n_light: 2, k_light: 2, f_light: 1, lo_light: 0.6, hi_light: 1, median_log_mbh: 7, median_log_edd_ratio: null });
    expect(s.superEddington).toEqual({ k: 1, n: 4, fraction: 0.25, lo: 0.1, hi: 0.5 });
    expect(s.overMassive.fraction).toBeNull();
    expect(s.medianLogEddRatio).toBeNull();
  });

  it('reads a missing column (undefined) as null, not as NaN', () => {
    const s = summaryFromRow({ reading: 'x', objects: 1, n_super: 0, k_super: 0 });
    expect(s.superEddington.fraction).toBeNull();
    expect(s.medianLogMbh).toBeNull();
  });
});
