import { describe, expect, it } from 'vitest';
import { catalogColumnMap, mapHeader } from '../../../src/site/place/columnMap.ts';

describe('catalogColumnMap', () => {
  it('reads the sidecar input columns with their source names and units', () => {
    const meta = { input: { columns: [{ name: 'z', source: 'zspec', unit: '' }, { name: 'flux_halpha', source: 'F_Ha', unit: ' 1e-18 erg s-1 cm-2 ' }, { name: 'mu' }, { source: 'x' }] } };
    expect(catalogColumnMap(meta)).toEqual([
      { name: 'z', source: 'zspec', unit: '' },
      { name: 'flux_halpha', source: 'F_Ha', unit: '1e-18 erg s-1 cm-2' },
      { name: 'mu', source: 'mu', unit: '' },
    ]);
  });

  it('is empty for a sidecar without input columns', () => {
    expect(catalogColumnMap({})).toEqual([]);
    expect(catalogColumnMap({ input: { columns: 'no' } })).toEqual([]);
  });
});

describe('mapHeader', () => {
  const map = [
    { name: 'z', source: 'zspec', unit: '' },
    { name: 'flux_halpha', source: 'F_Ha', unit: '10-18erg.s-1.cm-2' },
  ];

  it('renames source columns, exactly or ignoring case, and keeps other names', () => {
    const h = mapHeader(['id', ' ZSPEC ', 'F_Ha', 'ra'], map);
    expect(h.names).toEqual(['id', 'z', 'flux_halpha', 'ra']);
    expect(h.pastedAs).toEqual({ z: 'ZSPEC', flux_halpha: 'F_Ha' });
    expect(h.problems).toEqual([]);
  });

  it('reads a unit written in astropy CDS spelling', () => {
    expect(mapHeader(['F_Ha'], map).units).toEqual({ flux_halpha: '1e-18 erg.s-1.cm-2' });
  });

  it('reports a canonical name that repeats a mapped column', () => {
    expect(mapHeader(['zspec', 'Z'], map).problems).toEqual(['columns "zspec" and "Z" both give z: keep one']);
  });
});
