import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { MAX_PASTED_ROWS, pastedRows } from '../../../src/site/place/pastedRow.ts';
import type { MappedColumn } from '../../../src/site/place/columnMap.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const demo = readFileSync(resolve(import.meta.dirname, '../../../data-demo/new-objects.csv'), 'utf8');
const lines = demo.split('\n').filter((l) => l.trim() !== '');
const header = lines.find((l) => l.startsWith('id,'))!;
const line = (id: string) => lines.find((l) => l.startsWith(id + ','))!;
const row = (id: string) => `${header}\n${line(id)}`;

/** The demo catalog's column map as its build records it (data-demo/census.config.yaml `columns:`: fluxes in 1e-18 erg s-1 cm-2). */
const DEMO_MAP: MappedColumn[] = ['id', 'z', 'fwhm_halpha', 'fwhm_halpha_err', 'flux_halpha', 'flux_halpha_err', 'flux_hbeta', 'flux_hbeta_err', 'lam_l_5100'].map((name) => ({
  name,
  source: name,
  unit: name.startsWith('flux_') ? '1e-18 erg s-1 cm-2' : '',
}));

describe('pastedRows', () => {
  it('reads a demo new object with its flux unit and leaves out the non-canonical columns', () => {
    const res = pastedRows(row('CDW-90001'), '1e-18 erg s-1 cm-2');
    expect(res.problems).toEqual([]);
    expect(res.ignored).toEqual(['field', 'spec_program', 'notes']);
    expect(res.rows).toHaveLength(1);
    expect(res.rows[0]!.problems).toEqual([]);
    const i = res.rows[0]!.inputs!;
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
    const res = pastedRows(row('CDW-90003'), '1e-18 erg s-1 cm-2');
    const i = res.rows[0]!.inputs!;
    expect(res.rows[0]!.problems).toEqual([]);
    expect(i.lines.halpha).toBeUndefined();
    expect(i.lines.hbeta!.fwhmKms!.value).toBe(1534);
    expect(i.lamL5100!.value).toBe(1.369e44);
  });

  it('places every pasted row, not only the first', () => {
    const res = pastedRows([header, line('CDW-90001'), line('CDW-90002'), line('CDW-90003')].join('\n'), undefined, DEMO_MAP);
    expect(res.rows.map((r) => [r.row, r.id, r.inputs?.id, r.problems])).toEqual([
      [1, 'CDW-90001', 'CDW-90001', []],
      [2, 'CDW-90002', 'CDW-90002', []],
      [3, 'CDW-90003', 'CDW-90003', []],
    ]);
    expect(res.notes).toEqual([]);
  });

  it('reads the catalog own column names in the units of its column map when no flux unit is chosen', () => {
    const res = pastedRows([header, line('CDW-90002')].join('\n'), undefined, DEMO_MAP);
    const i = res.rows[0]!.inputs!;
    // 191.9 and 44.54 × 1e-18 erg s-1 cm-2 (data-demo/new-objects.csv; unit from data-demo/census.config.yaml columns:)
    expectClose(i.lines.halpha!.fluxCgs!.value, 191.9e-18, { rtol: 1e-12, source: 'data-demo/new-objects.csv, unit 1e-18' });
    expectClose(i.lines.hbeta!.fluxCgs!.errHi!, 2.24e-18, { rtol: 1e-12, source: 'data-demo/new-objects.csv, unit 1e-18' });
  });

  it('reads a source column the map renames, in its mapped unit, and names it in messages', () => {
    const map: MappedColumn[] = [
      { name: 'id', source: 'NAME', unit: '' },
      { name: 'z', source: 'zspec', unit: '' },
      { name: 'fwhm_halpha', source: 'FWHM_Ha', unit: 'm/s' },
      { name: 'flux_halpha', source: 'F_Ha', unit: '10-17erg.s-1.cm-2' },
      { name: 'lam_l_5100', source: 'L5100', unit: '1e44 erg s-1' },
    ];
    const res = pastedRows('NAME,zspec,FWHM_Ha,F_Ha,L5100\nA-1,6.1,2000000,1.5,2\nA-2,6.2,-5,1.5,', '', map);
    expect(res.problems).toEqual([]);
    const a = res.rows[0]!.inputs!;
    expect(a.id).toBe('A-1');
    expect(a.z).toBe(6.1);
    // 2e6 m/s = 2000 km/s; 1.5 × 1e-17 (astropy's CDS spelling 10-17) erg s-1 cm-2; 2 × 1e44 erg s-1 (unit arithmetic, common practice, no source)
    expectClose(a.lines.halpha!.fwhmKms!.value, 2000, { rtol: 1e-12, source: 'unit arithmetic' });
    expectClose(a.lines.halpha!.fluxCgs!.value, 1.5e-17, { rtol: 1e-12, source: 'unit arithmetic' });
    expectClose(a.lamL5100!.value, 2e44, { rtol: 1e-12, source: 'unit arithmetic' });
    expect(res.rows[1]!.inputs).toBeNull();
    expect(res.rows[1]!.problems).toEqual(['row 2 (id A-2): FWHM_Ha (fwhm_halpha): -5 m/s: must be positive']);
  });

  it('still reads canonical names when the catalog used other source names', () => {
    const map: MappedColumn[] = [{ name: 'fwhm_halpha', source: 'FWHM_Ha', unit: 'm/s' }];
    const res = pastedRows('id,z,fwhm_halpha,flux_halpha\nB-1,5,1800,6.2e-18', '', map);
    expect(res.rows[0]!.problems).toEqual([]);
    expect(res.rows[0]!.inputs!.lines.halpha!.fwhmKms!.value).toBe(1800);
  });

  it('gives a row with a problem its own message naming the row, column and reason, and still reads the others', () => {
    const text = 'id,z,fwhm_halpha,flux_halpha\nX-1,6,1500,3\nX-2,6,-1200,3\nX-3,six,1500,3\nX-1,6.5,1500,3';
    const res = pastedRows(text, '1e-18 erg s-1 cm-2');
    expect(res.rows.map((r) => r.inputs !== null)).toEqual([true, false, false, false]);
    expect(res.rows[1]!.problems).toEqual(['row 2 (id X-2): fwhm_halpha: -1200 km s-1: must be positive']);
    expect(res.rows[2]!.problems).toEqual(['row 3 (id X-3): z: six: not a number']);
    expect(res.rows[3]!.problems).toEqual(['row 4 (id X-1): id: X-1: duplicate of row 1']);
  });

  it('suggests the unit when a flux read as erg s-1 cm-2 is implausibly bright', () => {
    const res = pastedRows(row('CDW-90001'), 'erg s-1 cm-2', DEMO_MAP);
    expect(res.rows[0]!.inputs).toBeNull();
    expect(res.rows[0]!.problems).toHaveLength(1);
    expect(res.rows[0]!.problems[0]).toMatch(/^row 1 \(id CDW-90001\): flux_halpha: 5\.315 erg s-1 cm-2 is brighter than any broad line.*1e-18/);
  });

  it('says when there is no z column', () => {
    const res = pastedRows('id,fwhm_halpha\nX,1200', 'erg s-1 cm-2');
    expect(res.rows).toEqual([]);
    expect(res.problems).toEqual(['z: no z column']);
  });

  it('refuses a header that gives one column twice through the map', () => {
    const map: MappedColumn[] = [{ name: 'fwhm_halpha', source: 'FWHM_Ha', unit: '' }];
    const res = pastedRows('id,z,FWHM_Ha,fwhm_halpha\nX,6,1500,1600', '', map);
    expect(res.rows).toEqual([]);
    expect(res.problems).toEqual(['columns "FWHM_Ha" and "fwhm_halpha" both give fwhm_halpha: keep one']);
  });

  it('places at most MAX_PASTED_ROWS rows and says so', () => {
    const body = Array.from({ length: MAX_PASTED_ROWS + 3 }, (_, k) => `R-${k},6,1500,3`).join('\n');
    const res = pastedRows(`id,z,fwhm_halpha,flux_halpha\n${body}`, '1e-18 erg s-1 cm-2');
    expect(res.rows).toHaveLength(MAX_PASTED_ROWS);
    expect(res.notes).toEqual([`${MAX_PASTED_ROWS + 3} data rows were pasted; the first ${MAX_PASTED_ROWS} are placed. Paste the rest separately.`]);
  });
});
