import { describe, expect, it } from 'vitest';
import { flagText, splitFlags } from '../../../src/site/text/flagText.ts';

describe('flags in words', () => {
  it('splits a comma-separated flags cell and drops blanks', () => {
    expect(splitFlags('no_host_mass, calibration_out_of_range,')).toEqual(['no_host_mass', 'calibration_out_of_range']);
    expect(splitFlags('')).toEqual([]);
    expect(splitFlags(null)).toEqual([]);
  });
  it('explains the flags the derivation writes and says so when a flag is unknown', () => {
    expect(flagText("mbh_upper_limit")).toMatch(/upper limit/);
    expect(flagText('made_up_flag')).toMatch(/No description/);
  });
});

describe('flag words come from the core', () => {
  it('uses the core description of a flag the site has no words of its own for', () => {
    expect(flagText('lbol_fallback')).toMatch(/another method was used/);
  });
});
