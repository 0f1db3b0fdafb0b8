import { describe, expect, it } from 'vitest';
import { parseReadingsState, readingsStateQuery } from '../../../src/site/readings/readingsUrl.ts';
import { customReading } from '../../../src/site/readings/customReading.ts';
import { ReadingSpecError } from '../../../src/core/readings/parseReadingSpec.ts';

const KNOWN = ['standard', 'scattering_core', 'dense_gas'];

describe('the Readings page URL', () => {
  it('round-trips the shown reading, the compared pair and a custom reading', () => {
    const state = { reading: 'custom', a: 'dense_gas', b: 'custom', custom: { deflation: 2.5, l5100Ratio: 5, dust: 'none' as const, efficiency: 0.2 } };
    expect(parseReadingsState(`?${readingsStateQuery(state)}`, KNOWN)).toEqual(state);
  });

  it('falls back to the first readings for unknown ids and has no custom reading without its settings', () => {
    expect(parseReadingsState('?reading=nope&b=<script>', KNOWN)).toEqual({ reading: 'standard', a: 'standard', b: 'scattering_core', custom: null });
  });
});

describe('customReading', () => {
  it('makes a deflated, small-bolometric, dust-free reading from the form', () => {
    const r = customReading({ deflation: 2, l5100Ratio: 5, dust: 'none', efficiency: 0.2 });
    expect(r).toMatchObject({ id: 'custom', width: { mode: 'deflated', deflation: 2 }, bolometric: { mode: 'l5100_ratio', ratio: 5 }, dust: 'none', growth: { efficiency: 0.2 } });
    expect(customReading({ deflation: 1, l5100Ratio: null, dust: 'standard', efficiency: null }).width.mode).toBe('measured');
  });

  it('refuses an out-of-range factor with one line naming it', () => {
    expect(() => customReading({ deflation: 40, l5100Ratio: null, dust: 'standard', efficiency: null })).toThrow(ReadingSpecError);
    expect(() => customReading({ deflation: 40, l5100Ratio: null, dust: 'standard', efficiency: null })).toThrow(/^your reading\.deflation must be a number between 1 and 10/);
  });
});
