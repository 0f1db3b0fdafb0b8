import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { openTable } from '../../../src/catalog/readers/openTable.ts';
import { readAll } from './readerTestKit.ts';

// Files written by an independent implementation: Astropy 5.2.1 (Debian python3-astropy), from
// test/fixtures/readers/make_astropy_fixtures.py. The expected cells below are the values that
// script writes (masked entries are null).
const fixture = (name: string) => fileURLToPath(new URL(`../../fixtures/readers/${name}`, import.meta.url));

const EXPECTED = {
  id: [101, 102, 103, 104],
  z: [5.25, 7.5, 9.125, null],
  fwhm: [2500, null, 3100.25, 1200],
  nlines: [3, null, 2, 5],
  broad: [true, false, true, true],
  name: ['alpha', 'beta gamma', null, 'delta,eps'],
};
const NAMES = Object.keys(EXPECTED);
const VALUES = Object.values(EXPECTED);

describe('tables written by Astropy', () => {
  it.each(['astropy-table.ecsv', 'astropy-table-comma.ecsv'])('reads the ECSV file %s with kinds, units, UCD, descriptions and meta', async (file) => {
    const src = await openTable(fixture(file));
    expect(src.format).toBe('ecsv');
    expect(src.columns).toEqual([
      { name: 'id', kind: 'int', description: 'Invented object number', fileType: 'int64' },
      { name: 'z', kind: 'float', description: 'Spectroscopic redshift', ucd: 'src.redshift', fileType: 'float64' },
      { name: 'fwhm', kind: 'float', unit: 'km / s', fileType: 'float32' },
      { name: 'nlines', kind: 'int', fileType: 'int16' },
      { name: 'broad', kind: 'bool', fileType: 'bool' },
      { name: 'name', kind: 'string', fileType: 'string' },
    ]);
    expect(src.meta).toEqual({ catalog: 'invented demo', version: 3 });
    expect((await readAll(src)).columns).toEqual(VALUES);
  });

  it('reads the FITS binary table with TNULL, NaN nulls, units and header keywords', async () => {
    const src = await openTable(fixture('astropy-table.fits'));
    expect(src.columns.map((c) => c.name)).toEqual(NAMES);
    expect(src.columns.map((c) => c.kind)).toEqual(['int', 'float', 'float', 'int', 'bool', 'string']);
    expect(src.columns[2]!.unit).toBe('km s-1');
    expect(src.meta.CATALOG).toBe('invented demo');
    expect(src.meta.VERSION).toBe(3);
    expect(src.meta.COMMENT).toContain('--BEGIN-ASTROPY-SERIALIZED-COLUMNS--');
    expect((await readAll(src)).columns).toEqual(VALUES);
  });

  it('reads unsigned FITS integers through TZERO and keeps a 64-bit value beyond 2^53 as exact text', async () => {
    const src = await openTable(fixture('astropy-unsigned.fits'));
    expect(src.columns.map((c) => [c.name, c.kind])).toEqual([['u16', 'int'], ['u32', 'int'], ['u8', 'int'], ['i64', 'string']]);
    expect((await readAll(src)).columns).toEqual([
      [0, 40000, 65535],
      [0, 3000000000, 4294967295],
      [0, 200, 255],
      ['-5', '9007199254740993', '7'],
    ]);
  });

  it('reads the TABLEDATA VOTable, including Astropy\'s bit-typed boolean column', async () => {
    const src = await openTable(fixture('astropy-table.vot'));
    expect(src.format).toBe('votable');
    expect(src.columns).toEqual([
      { name: 'id', kind: 'int', description: 'Invented object number' },
      { name: 'z', kind: 'float', description: 'Spectroscopic redshift', ucd: 'src.redshift' },
      { name: 'fwhm', kind: 'float', unit: 'km.s-1' },
      { name: 'nlines', kind: 'int' },
      { name: 'broad', kind: 'bool' },
      { name: 'name', kind: 'string' },
    ]);
    expect((await readAll(src, 3)).columns).toEqual(VALUES);
  });

  it('reads the BINARY2 VOTable with the same cells as the TABLEDATA one', async () => {
    const src = await openTable(fixture('astropy-table-binary2.vot'));
    expect(src.columns.map((c) => [c.name, c.kind])).toEqual([['id', 'int'], ['z', 'float'], ['broad', 'bool']]);
    expect((await readAll(src, 3)).columns).toEqual([EXPECTED.id, EXPECTED.z, EXPECTED.broad]);
  });
});
