import { describe, expect, it } from 'vitest';
import { catalogFluxUnit } from '../../../src/site/place/catalogFluxUnit.ts';

describe('catalogFluxUnit', () => {
  it('returns the unit the catalog read its first line flux in', () => {
    const meta = { input: { columns: [{ name: 'z', source: 'z', unit: '' }, { name: 'flux_halpha', source: 'F', unit: '1e-18 erg s-1 cm-2' }] } };
    expect(catalogFluxUnit(meta)).toBe('1e-18 erg s-1 cm-2');
  });
  it('ignores flux error columns and canonical units', () => {
    expect(catalogFluxUnit({ input: { columns: [{ name: 'flux_halpha_err', unit: '1e-18 erg s-1 cm-2' }, { name: 'flux_hbeta', unit: '' }] } })).toBeUndefined();
  });
  it('returns undefined for a sidecar without input columns', () => {
    expect(catalogFluxUnit({ input: { file: 'x.csv' } })).toBeUndefined();
    expect(catalogFluxUnit({})).toBeUndefined();
  });
});
