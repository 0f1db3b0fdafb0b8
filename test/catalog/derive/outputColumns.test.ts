import { describe, expect, it } from 'vitest';
import { defaultConfig } from '../../../src/catalog/config/defaultConfig.ts';
import { buildOutputColumns } from '../../../src/catalog/derive/outputColumns.ts';
import { planColumns } from '../../../src/catalog/normalize/planColumns.ts';
import { memorySource } from '../normalize/memorySource.ts';

describe('buildOutputColumns with passthrough declarations', () => {
  const plan = planColumns(memorySource([['id', ['A']], ['z', [6]], ['RA', [150.1]], ['sfr', [3]]]), defaultConfig());

  it('writes ra with the position UCD and unit deg, and a declared pass-through column with its declaration', () => {
    const cols = buildOutputColumns(plan, undefined, { sfr: { unit: 'solMass/yr', ucd: 'phys.SFR' } });
    expect(cols.find((c) => c.name === 'ra')).toMatchObject({ unit: 'deg', ucd: 'pos.eq.ra;meta.main' });
    expect(cols.find((c) => c.name === 'sfr')).toMatchObject({ unit: 'solMass/yr', ucd: 'phys.SFR' });
  });

  it('says that a declared column is read as a canonical one instead of calling it missing', () => {
    expect(() => buildOutputColumns(plan, undefined, { RA: { unit: 'deg' } })).toThrow(
      'catalog.csv: the config declares passthrough.RA, but column "RA" is read as the canonical column ra, which has its own unit, UCD and description',
    );
    expect(() => buildOutputColumns(plan, undefined, { nope: {} })).toThrow('the config declares passthrough.nope, but the file has no such pass-through column');
  });
});
