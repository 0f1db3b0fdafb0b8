import { describe, expect, it } from 'vitest';
import { implausibleInputs } from '../../../src/site/place/plausibility.ts';
import type { ObjectInputs } from '../../../src/core/derive/types.ts';

const withHalpha = (halpha: ObjectInputs['lines']['halpha']): ObjectInputs => ({ id: 'n', z: 6, lines: { halpha } });

describe('implausibleInputs on the place page', () => {
  it('warns on a flux too bright for a broad line (1e-18 units read as cgs)', () => {
    expect(implausibleInputs(withHalpha({ fluxCgs: { value: 3 } })).map((p) => p.column)).toEqual(['flux_halpha']);
  });

  it('warns on a flux too faint for any spectrum as well', () => {
    const problems = implausibleInputs(withHalpha({ fluxCgs: { value: 3e-25 } }));
    expect(problems.map((p) => p.column)).toEqual(['flux_halpha']);
    expect(problems[0]!.message).toMatch(/fainter than any broad line/);
  });

  it('warns on luminosities too faint (a log typed as linear) and too bright', () => {
    expect(implausibleInputs(withHalpha({ lumErgS: { value: 42.5 } }))[0]!.message).toMatch(/too faint/);
    expect(implausibleInputs(withHalpha({ lumErgS: { value: 3e49 } }))[0]!.message).toMatch(/brighter than any broad line/);
  });

  it('says nothing about ordinary values', () => {
    expect(implausibleInputs(withHalpha({ fluxCgs: { value: 3e-18 } }))).toEqual([]);
    expect(implausibleInputs(withHalpha({ lumErgS: { value: 3e42 } }))).toEqual([]);
  });
});
