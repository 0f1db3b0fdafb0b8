import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { checkUcd } from '../../../src/core/metadata/index.ts';
import { parseUnit } from '../../../src/core/units/index.ts';
import { POPULATION_TABLES } from '../../../src/catalog/population/populationColumns.ts';
import { allOutputColumns } from './allOutputColumns.ts';

const PYTHON = '/usr/bin/python3';
// Every column derive can write, and the three tables of `dawn-census population` (named table.column).
const populationColumns = Object.entries(POPULATION_TABLES).flatMap(([table, t]) => t.columns.map((c) => ({ ...c, name: `${table}.${c.name}` })));
const columns = [...allOutputColumns(), ...populationColumns];
const numeric = columns.filter((c) => c.kind === 'float' || c.kind === 'int');

/* Parses each unit with astropy: VOUnits first; a `dex(...)` unit with astropy's generic reader
   (astropy 5.2's VOUnits reader has no function units) and its inner unit as VOUnits. */
const ASTROPY_UNITS = `
import json, sys, warnings
import astropy, astropy.units as u
warnings.simplefilter('ignore')
out = {'version': astropy.__version__, 'bad': {}}
for name, s in json.load(sys.stdin).items():
    try:
        if s.startswith('dex(') and s.endswith(')'):
            u.Unit(s[4:-1], format='vounit')
            assert isinstance(u.Unit(s), u.DexUnit), 'not a dex unit'
        else:
            u.Unit(s, format='vounit')
    except Exception as e:
        out['bad'][name] = f'{s}: {e}'
print(json.dumps(out))
`;

describe('output column metadata', () => {
  it('gives every output column a UCD made of UCD1+ 1.5 words in a valid order', () => {
    const bad = columns.flatMap((c) => {
      const why = c.ucd === undefined ? 'has no UCD' : checkUcd(c.ucd);
      return why ? [`${c.name}: ${why}`] : [];
    });
    expect(bad).toEqual([]);
    expect(columns.length).toBeGreaterThan(100);
    expect(populationColumns.length).toBe(22);
  });

  it('gives every numeric output column a unit that the project parser reads', () => {
    const bad = numeric.flatMap((c) => {
      if (c.name === 'row') return [];
      if (c.unit === undefined) return [`${c.name}: has no unit`];
      try {
        const p = parseUnit(c.unit);
        if (c.unit.startsWith('dex') !== p.log) return [`${c.name}: "${c.unit}" log flag ${p.log}`];
        return [];
      } catch (e) {
        return [`${c.name}: ${(e as Error).message}`];
      }
    });
    expect(bad).toEqual([]);
  });

  it('gives every numeric output column a unit that astropy reads as VOUnits (dex units as astropy writes them)', () => {
    const units = Object.fromEntries(numeric.filter((c) => c.unit).map((c) => [c.name, c.unit as string]));
    const r = spawnSync(PYTHON, ['-c', ASTROPY_UNITS], { input: JSON.stringify(units), encoding: 'utf8' });
    expect(r.stderr).toBe('');
    const out = JSON.parse(r.stdout) as { version: string; bad: Record<string, string> };
    expect(out.bad).toEqual({});
    expect(Object.keys(units).length).toBeGreaterThan(50);
  });

  it('spells log quantities as dex units and leaves no log(...) unit', () => {
    expect(columns.find((c) => c.name === 'log_mbh')?.unit).toBe('dex(solMass)');
    expect(columns.find((c) => c.name === 'log_lbol')?.unit).toBe('dex(erg.s**-1)');
    expect(columns.filter((c) => c.unit?.startsWith('log'))).toEqual([]);
  });
});
