import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { pastedRowToInputs } from '../../../src/site/place/pastedRow.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const demo = readFileSync(resolve(import.meta.dirname, '../../../data-demo/new-objects.csv'), 'utf8');
const lines = demo.split('\n').filter((l) => l.trim() !== '');
const header = lines.find((l) => l.startsWith('id,'))!;
const row = (id: string) => `${header}\n${lines.find((l) => l.startsWith(id + ','))!}`;

describe('pastedRowToInputs', () => {
  it('reads a demo new object with its flux unit and leaves out the non-canonical columns', () => {
    const res = pastedRowToInputs(row('CDW-90001'), '1e-18 erg s-1 cm-2');
    expect(res.problems).toEqual([]);
    expect(res.ignored).toEqual(['field', 'spec_program', 'notes']);
    const i = res.inputs!;
    expect(i.id).toBe('CDW-90001');
    expect(i.z).toBe(5.4172);
    // 5.315 × 1e-18 erg s-1 cm-2 (the file's unit, data-demo/new-objects.csv header comment)
    expectClose(i.lines.halpha!.fluxCgs!.value, 5.315e-18, { rtol: 1e-12, source: 'data-demo/new-objects.csv, unit 1e-18' });
    expectClose(i.lines.halpha!.fluxCgs!.errLo!, 0.333e-18, { rtol: 1e-12, source: 'data-demo/new-objects.csv, unit 1e-18' });
    expect(i.lines.halpha!.fwhmKms).toEqual({ value: 1626, errLo: 126, errHi: 126 });
    expect(i.lines.halpha!.fluxIsLimit).toBe(false);
    expect(i.logMstar).toEqual({ value: 9.75, errLo: 0.29, errHi: 0.29 });
  });

  it('reads the Hβ-only object with its continuum luminosity', () => {
    const res = pastedRowToInputs(row('CDW-90003'), '1e-18 erg s-1 cm-2');
    expect(res.problems).toEqual([]);
    expect(res.inputs!.lines.halpha).toBeUndefined();
    expect(res.inputs!.lines.hbeta!.fwhmKms!.value).toBe(1534);
    expect(res.inputs!.lamL5100!.value).toBe(1.369e44);
  });

  it('suggests the unit when a flux read as erg s-1 cm-2 is implausibly bright', () => {
    const res = pastedRowToInputs(row('CDW-90001'), 'erg s-1 cm-2');
    expect(res.inputs).toBeNull();
    expect(res.problems).toHaveLength(1);
    expect(res.problems[0]).toMatch(/^flux_halpha: 5\.315 erg s-1 cm-2 is brighter than any broad line.*1e-18/);
  });

  it('names the column and the reason for an invalid value', () => {
    const res = pastedRowToInputs('id,z,fwhm_halpha,flux_halpha\nX,6,-1200,3', '1e-18 erg s-1 cm-2');
    expect(res.inputs).toBeNull();
    expect(res.problems).toEqual(['fwhm_halpha: -1200 km s-1: must be positive']);
  });

  it('says when there is no z column', () => {
    const res = pastedRowToInputs('id,fwhm_halpha\nX,1200', 'erg s-1 cm-2');
    expect(res.problems).toEqual(['z: no z column']);
  });
});
