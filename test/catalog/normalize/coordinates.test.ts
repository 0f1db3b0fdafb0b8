import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { CensusConfig } from '../../../src/catalog/config/CensusConfig.ts';
import { defaultConfig } from '../../../src/catalog/config/defaultConfig.ts';
import { CANONICAL_BY_NAME } from '../../../src/catalog/normalize/canonicalColumns.ts';
import { normalizeChunk, type NormalizedRow } from '../../../src/catalog/normalize/normalizeChunk.ts';
import { planColumns } from '../../../src/catalog/normalize/planColumns.ts';
import type { Cell, ColumnInfo } from '../../../src/catalog/readers/types.ts';
import { allRows, memorySource } from './memorySource.ts';

type Cols = [ColumnInfo | string, Cell[]][];
const cfgWith = (columns: CensusConfig['columns']): CensusConfig => ({ ...defaultConfig(), columns, configPath: join(process.cwd(), 'census.config.yaml') });

async function normalize(cols: Cols, cfg: CensusConfig = defaultConfig()): Promise<NormalizedRow[]> {
  const src = memorySource(cols);
  const plan = planColumns(src, cfg);
  return (await allRows(src)).flatMap((ch) => normalizeChunk(ch, plan));
}

describe('ra and dec as canonical columns', () => {
  it('are read from columns named ra and dec, in degrees, every digit kept', async () => {
    const rows = await normalize([['id', ['A']], ['z', [6]], ['ra', ['47.342485123456789']], ['dec', [-21.696102000001]]]);
    expect(rows[0]!.canonical).toMatchObject({ ra: 47.342485123456789, dec: -21.696102000001 });
    expect(rows[0]!.passthrough).toEqual([]);
    expect(rows[0]!.problems).toEqual([]);
  });

  it('are read from any column the config maps to them, with unit conversion', async () => {
    const cfg = cfgWith({ ra: { source: 'RA_h', unit: 'hourangle' }, dec: { source: 'DEJ2000', unit: 'rad' } });
    const rows = await normalize([['id', ['A']], ['z', [6]], ['RA_h', [10]], ['DEJ2000', [Math.PI / 6]], ['note', ['x']]], cfg);
    // 10 h = 150°; π/6 rad = 30° (definitions of the units).
    expect(rows[0]!.canonical.ra).toBe(150);
    expect(rows[0]!.canonical.dec).toBeCloseTo(30, 12);
    expect(rows[0]!.passthrough).toEqual(['x']);
  });

  it.each<[string, Cell, string]>([
    ['ra', 360.5, 'row 1 (id A): ra = 360.5 deg: must be between 0 and 360'],
    ['ra', -0.1, 'row 1 (id A): ra = -0.1 deg: must be between 0 and 360'],
    ['dec', 91, 'row 1 (id A): dec = 91 deg: must be between -90 and 90'],
    ['dec', -90.5, 'row 1 (id A): dec = -90.5 deg: must be between -90 and 90'],
  ])('make %s = %s a row problem', async (column, cell, message) => {
    const rows = await normalize([['id', ['A']], ['z', [6]], [column, [cell]]]);
    expect(rows[0]!.problems.map((p) => p.message)).toEqual([message]);
    expect(rows[0]!.inputs).toBeNull();
  });

  it('accept the bounds themselves (0, 360, ±90)', async () => {
    const rows = await normalize([['id', ['A', 'B']], ['z', [6, 6]], ['ra', [0, 360]], ['dec', [-90, 90]]]);
    expect(rows.flatMap((r) => r.problems)).toEqual([]);
  });

  it('refuse a unit that is not an angle, naming the column', () => {
    const src = memorySource([['id', ['A']], ['z', [6]], ['ra', [1]]]);
    expect(() => planColumns(src, cfgWith({ ra: { unit: 'km/s' } }))).toThrow(/columns\.ra\.unit/);
  });

  it('carry the position UCDs and the unit deg into the output metadata', () => {
    expect(CANONICAL_BY_NAME.get('ra')).toMatchObject({ ucd: 'pos.eq.ra;meta.main', unit: 'deg' });
    expect(CANONICAL_BY_NAME.get('dec')).toMatchObject({ ucd: 'pos.eq.dec;meta.main', unit: 'deg' });
  });
});
