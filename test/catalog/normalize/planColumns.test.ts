import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { CensusConfig } from '../../../src/catalog/config/CensusConfig.ts';
import { defaultConfig } from '../../../src/catalog/config/defaultConfig.ts';
import { planColumns } from '../../../src/catalog/normalize/planColumns.ts';
import { CatalogError } from '../../../src/catalog/readers/CatalogError.ts';
import type { ColumnInfo } from '../../../src/catalog/readers/types.ts';
import { memorySource } from './memorySource.ts';

const f = (name: string, unit?: string): ColumnInfo => ({ name, kind: 'float', ...(unit ? { unit } : {}) });
const s = (name: string): ColumnInfo => ({ name, kind: 'string' });
const withColumns = (columns: CensusConfig['columns']): CensusConfig => ({
  ...defaultConfig(),
  columns,
  configPath: join(process.cwd(), 'census.config.yaml'),
});
const planOf = (infos: ColumnInfo[], cfg: CensusConfig = defaultConfig()) =>
  planColumns(memorySource(infos.map((i) => [i, []])), cfg);
const failure = (infos: ColumnInfo[], cfg?: CensusConfig): string => {
  try {
    planOf(infos, cfg);
  } catch (e) {
    expect(e).toBeInstanceOf(CatalogError);
    return (e as Error).message;
  }
  throw new Error('expected a CatalogError');
};

describe('planColumns', () => {
  it('finds canonical columns by exact name, then ignoring case, and passes the rest through in file order', () => {
    const plan = planOf([s('ID'), f('Z'), f('FWHM_Halpha'), f('fwhm_halpha_err'), s('field'), f('RA'), f('mag_f444w')]);
    expect(plan.canonical.map((c) => [c.name, c.sourceName, c.sourceIndex])).toEqual([
      ['id', 'ID', 0],
      ['z', 'Z', 1],
      ['fwhm_halpha', 'FWHM_Halpha', 2],
      ['fwhm_halpha_err', 'fwhm_halpha_err', 3],
      ['ra', 'RA', 5],
    ]);
    expect(plan.passthrough.map((p) => [p.name, p.sourceIndex])).toEqual([
      ['field', 4],
      ['mag_f444w', 6],
    ]);
    expect(plan.label).toBe('catalog.csv');
  });

  it('prefers the exact name when two columns differ only in case', () => {
    const plan = planOf([s('id'), f('Z'), f('z')]);
    expect(plan.canonical.find((c) => c.name === 'z')?.sourceName).toBe('z');
    expect(plan.passthrough.map((p) => p.name)).toEqual(['Z']);
  });

  it('refuses two columns that match one canonical name only when case is ignored', () => {
    expect(failure([s('ID'), s('Id'), f('z')])).toBe(
      'catalog.csv: columns "ID" and "Id" both match id when case is ignored; choose one with columns.id.source in the config',
    );
  });

  it('reads a column mapped by the config, which no other canonical name can then claim', () => {
    const plan = planOf([s('NAME'), f('z'), f('z_spec')], withColumns({ id: { source: 'NAME' }, z: { source: 'z_spec' } }));
    expect(plan.canonical.map((c) => [c.name, c.sourceName])).toEqual([
      ['id', 'NAME'],
      ['z', 'z_spec'],
    ]);
    expect(plan.passthrough.map((p) => p.name)).toEqual(['z']);
    expect(plan.canonical[1]?.label).toBe('z (column z_spec)');
  });

  it('converts a 1e-18 erg s-1 cm-2 flux column to erg s-1 cm-2', () => {
    const plan = planOf([s('id'), f('z'), f('F_HA')], withColumns({ flux_halpha: { source: 'F_HA', unit: '1e-18 erg s-1 cm-2' } }));
    const col = plan.canonical.find((c) => c.name === 'flux_halpha')!;
    expect(col.unitIn).toBe('1e-18 erg s-1 cm-2');
    // 5 × 1e-18 = 5e-18 by definition of the unit (exact up to one rounding).
    expect(col.convert(5)).toBeCloseTo(5e-18, 30);
  });

  it('uses the unit in the file metadata when the config gives none', () => {
    const plan = planOf([s('id'), f('z'), f('fwhm_halpha', 'm/s'), f('fwhm_halpha_err', 'km/s')]);
    const [, , fwhm, err] = plan.canonical;
    expect(fwhm?.unitIn).toBe('m/s');
    expect(fwhm?.convert(2.5e6)).toBeCloseTo(2500, 9); // 1 km = 1000 m (SI)
    expect(err?.convert(300)).toBeCloseTo(300, 12);
  });

  it('lets the config unit override the unit in the file', () => {
    const plan = planOf([s('id'), f('z'), f('lum_halpha', 'W')], withColumns({ lum_halpha: { unit: 'erg/s' } }));
    const lum = plan.canonical.find((c) => c.name === 'lum_halpha')!;
    expect(lum.unitIn).toBe('erg/s');
    expect(lum.convert(3e42)).toBe(3e42);
  });

  it('converts an error with the unit of its value when the error column has none', () => {
    const plan = planOf([s('id'), f('z'), f('flux_hbeta'), f('flux_hbeta_err_lo'), f('flux_hbeta_err_hi')], withColumns({ flux_hbeta: { unit: '1e-18 erg s-1 cm-2' } }));
    const [, , , lo, hi] = plan.canonical;
    expect(lo?.unitIn).toBe('1e-18 erg s-1 cm-2');
    expect(lo?.convert(2)).toBeCloseTo(2e-18, 30);
    expect(hi?.convert(3)).toBeCloseTo(3e-18, 30);
  });

  it('takes an unlabelled column to be in the canonical unit', () => {
    const plan = planOf([s('id'), f('z'), f('fwhm_civ'), f('lam_l_1350')]);
    expect(plan.canonical[2]?.unitIn).toBeUndefined();
    expect(plan.canonical[2]?.unitLabel).toBe('km/s');
    expect(plan.canonical[2]?.convert(4000)).toBe(4000);
    expect(plan.canonical[3]?.convert(1e45)).toBe(1e45);
  });

  it('gives each planned column its canonical definition, in canonical order', () => {
    const plan = planOf([f('fwhm_hbeta'), f('z'), s('id')]);
    expect(plan.canonical.map((c) => c.name)).toEqual(['id', 'z', 'fwhm_hbeta']);
    expect(plan.canonical[2]?.def.ucd).toBe('spect.line.width');
  });

  it('fails when there is no id column, naming init when no config was given', () => {
    expect(failure([f('z'), s('name')])).toBe(
      'catalog.csv: no id column (looked for "id" in any case; map another column with columns.id.source in a config: dawn-census init catalog.csv writes one, with the columns it recognises mapped)',
    );
    expect(failure([f('z'), s('name')], withColumns({}))).toBe(
      'catalog.csv: no id column (looked for "id" in any case; map another column with columns.id.source in the config)',
    );
  });

  it('fails when there is no z column, suggesting close names', () => {
    expect(failure([s('id'), f('zz')], withColumns({}))).toBe(
      'catalog.csv: no z column (looked for "z" in any case; map another column with columns.z.source in the config); close matches: zz',
    );
  });

  it('fails when a column mapped in the config is not in the file, listing close matches', () => {
    expect(failure([s('id'), f('z'), f('F_HAL'), f('F_HB')], withColumns({ flux_halpha: { source: 'F_HA' } }))).toBe(
      'catalog.csv: column "F_HA" (mapped to flux_halpha in census.config.yaml) is not in the file; close matches: F_HAL, F_HB',
    );
  });

  it('lists the file columns when a mapped column has no close match', () => {
    expect(failure([s('id'), f('z')], withColumns({ mu: { source: 'MAGNIFICATION' } }))).toBe(
      'catalog.csv: column "MAGNIFICATION" (mapped to mu in census.config.yaml) is not in the file; columns in the file: id, z',
    );
  });

  it('fails on a file unit of the wrong dimension, naming the column and the unit', () => {
    expect(failure([s('id'), f('z'), f('FWHM_HALPHA', 'erg/s')])).toBe(
      'catalog.csv: column "FWHM_HALPHA" (fwhm_halpha): unit "erg/s" is a luminosity, expected a velocity (km s-1)',
    );
  });

  it('fails on an unknown unit in the file, naming the column and the unit', () => {
    expect(failure([s('id'), f('z'), f('flux_mgii', 'bananas')])).toBe(
      'catalog.csv: column "flux_mgii" (flux_mgii): unknown unit "bananas": "bananas" is not a recognised unit symbol',
    );
  });

  it('names the config file when the config unit is wrong', () => {
    expect(failure([s('id'), f('z'), f('sigma_star')], withColumns({ sigma_star: { unit: 'mag' } }))).toBe(
      'census.config.yaml: columns.sigma_star.unit: unit "mag" is a magnitude, expected a velocity (km s-1)',
    );
  });

  it('fails when a numeric canonical column holds true/false values', () => {
    expect(failure([s('id'), f('z'), { name: 'fwhm_halpha', kind: 'bool' }])).toBe(
      'catalog.csv: column "fwhm_halpha" (fwhm_halpha) holds true/false values; fwhm_halpha needs numbers',
    );
  });

  it('accepts text, integer and boolean kinds where they can hold the values', () => {
    const plan = planOf([
      { name: 'id', kind: 'int' },
      s('z'),
      { name: 'flux_halpha_is_limit', kind: 'bool' },
      { name: 'flux_hbeta_is_limit', kind: 'string' },
      { name: 'fwhm_halpha', kind: 'int' },
    ]);
    expect(plan.canonical.map((c) => c.name)).toEqual(['id', 'z', 'fwhm_halpha', 'flux_halpha_is_limit', 'flux_hbeta_is_limit']);
  });

  it('reads log stellar masses in dex and a shifted log unit, with errors converted by scale only', () => {
    const plan = planOf([s('id'), f('z'), f('log_mstar', 'log(1e10 solMass)'), f('log_mstar_err', 'dex')]);
    const [, , m, e] = plan.canonical;
    expect(m?.convert(-0.5)).toBeCloseTo(9.5, 12); // log10(1e10) = 10 exactly
    expect(e?.convert(0.2)).toBeCloseTo(0.2, 12);
  });

  it('converts an error without its own unit by the scale of its value unit, never its zero point', () => {
    const plan = planOf([s('id'), f('z'), f('log_mstar', 'log(1e10 solMass)'), f('log_mstar_err')]);
    expect(plan.canonical[3]?.convert(0.3)).toBeCloseTo(0.3, 12);
  });

  it('refuses an error column in a unit that does not scale linearly to the canonical one', () => {
    expect(failure([s('id'), f('z'), f('log_mstar'), f('log_mstar_err', 'solMass')])).toBe(
      'catalog.csv: column "log_mstar_err" (log_mstar_err): an error needs a unit that scales linearly, got "solMass"',
    );
  });

  it('ignores a unit on the id column', () => {
    const plan = planOf([{ name: 'id', kind: 'string', unit: 'km/s' }, f('z')]);
    expect(plan.canonical[0]?.unitIn).toBeUndefined();
  });
});
