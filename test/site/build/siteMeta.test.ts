import { describe, expect, it } from 'vitest';
import { deriveSettingsOf, normalizeMeta } from '../../../src/site/build/siteMeta.ts';

describe('normalizeMeta', () => {
  it('lifts the texts, the columns (array form), hashes from input and config, and the inner settings', () => {
    const m = normalizeMeta({
      title: 'T',
      group: 'G',
      tool: { name: 'dawn-census', version: '1.2.3' },
      input: { sha256: 'ab' },
      config: { sha256: 'cd' },
      settings: { settings: { cosmology: 'planck18', draws: 10 }, cosmology: { id: 'planck18' } },
      columns: [{ name: 'log_mbh', unit: 'log(solMass)', description: 'mass', group: 'derived' }],
    });
    expect(m.title).toBe('T');
    expect(m.toolVersion).toBe('1.2.3');
    expect(m.hashes).toEqual({ input: 'sha256:ab', config: 'sha256:cd' });
    expect(m.columns.log_mbh).toMatchObject({ unit: 'log(solMass)', group: 'derived' });
    expect(deriveSettingsOf(m)).toEqual({ cosmology: 'planck18', draws: 10 });
  });
  it('tolerates a sidecar with nothing in it', () => {
    const m = normalizeMeta(null);
    expect(m.title).toBe('Dawn Census');
    expect(m.columns).toEqual({});
  });
});
