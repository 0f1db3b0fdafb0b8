import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { guessColumns } from '../../../src/catalog/config/guessColumns.ts';
import { parseConfig } from '../../../src/catalog/config/loadConfig.ts';
import { defaultSettings } from '../../../src/catalog/config/defaultConfig.ts';
import { PASSTHROUGH_LISTED, starterConfig, type StarterInput } from '../../../src/catalog/config/starterConfig.ts';
import { checkUnit } from '../../../src/catalog/config/checkUnit.ts';
import { CANONICAL_BY_NAME } from '../../../src/catalog/normalize/canonicalColumns.ts';

const BASE: Omit<StarterInput, 'catalog'> = { version: '9.9.9', schemaPath: 'node_modules/dawn-census/schema/census.config.schema.json', configName: 'census.config.yaml', outputPath: 'mine.census.parquet' };

function withCatalog(columns: { name: string; unit?: string; ucd?: string }[]): string {
  return starterConfig({ ...BASE, catalog: { path: 'data/mine.csv', format: 'csv', rows: 12, columns, guesses: guessColumns(columns) } });
}

describe('starterConfig', () => {
  it('loads as it is, and the settings it writes out are exactly the defaults', () => {
    const text = withCatalog([{ name: 'id' }, { name: 'z' }]);
    const cfg = parseConfig(text, '/tmp/dc/census.config.yaml');
    expect(cfg.settings).toEqual(defaultSettings());
    expect(cfg.input?.path).toBe('/tmp/dc/data/mine.csv');
    expect(cfg.input?.format).toBe('csv');
    expect(cfg.output).toBe('/tmp/dc/mine.census.parquet');
    expect(cfg.site.base).toBe('/');
    // A template without a catalog loads too.
    expect(parseConfig(starterConfig(BASE), '/tmp/dc/census.config.yaml').settings).toEqual(defaultSettings());
  });

  it('maps the guessed columns and says each is a guess; leaves choices and missing required columns as comments', () => {
    const text = withCatalog([{ name: 'Name' }, { name: 'FWHM_Ha', unit: 'km / s' }, { name: 'F_Ha' }, { name: 'zA' }, { name: 'zB' }, { name: 'notes' }]);
    const doc = parse(text) as { columns: Record<string, { source: string }> };
    expect(doc.columns).toEqual({ id: { source: 'Name' }, fwhm_halpha: { source: 'FWHM_Ha' }, flux_halpha: { source: 'F_Ha' } });
    expect(text).toMatch(/^ {2}id: \{ source: Name \} +# guessed from its name: check$/m);
    // No unit in the file for a flux: the comment says how it will be read.
    expect(text).toMatch(/^ {2}flux_halpha: \{ source: F_Ha \} +# guessed from its name: check; no unit in the file: read as erg s-1 cm-2$/m);
    expect(text).toMatch(/^ {2}fwhm_halpha: \{ source: FWHM_Ha \} +# guessed from its name: check$/m);
    expect(text).toMatch(/^ {2}# z: \{ source: … \} +# required, not found: name the column that holds it$/m);
    expect(text).toContain('# Passed through unchanged: zA, zB, notes.');
    expect(text).toContain('written by dawn-census init 9.9.9 from data/mine.csv (csv, 6 columns, 12 rows)');
  });

  it('offers the candidates of an ambiguous column in a comment, and a unit line for a width found by name without one', () => {
    const text = withCatalog([{ name: 'id' }, { name: 'redshift' }, { name: 'z_spec' }, { name: 'fwhm_halpha' }]);
    expect(text).toMatch(/^ {2}# z: \{ source: redshift \} +# choose one of redshift, z_spec$/m);
    const unitLine = /^ {2}# fwhm_halpha: \{ unit: "([^"]+)" \} +# no unit in the file: read as km\/s; set yours if not$/m.exec(text);
    expect(unitLine).not.toBeNull();
    // Uncommented, the unit line is one the config accepts for the column.
    expect(checkUnit(unitLine![1]!, CANONICAL_BY_NAME.get('fwhm_halpha')!.kind, 'fwhm_halpha')).toBeUndefined();
    expect((parse(text) as { columns: unknown }).columns).toBeNull();
  });

  it('keeps a column name with line breaks or other control characters inside its comment or quoted value', () => {
    const evil = 'x\nseed: 5\ndraws: 7';
    const text = withCatalog([{ name: 'id' }, { name: 'z' }, { name: evil }, { name: 'F_Ha\r\nbolometric: bc3000' }]);
    const cfg = parseConfig(text, '/tmp/dc/census.config.yaml');
    expect(cfg.settings).toEqual(defaultSettings());
    expect(text).not.toMatch(/^seed: 5$/m);
    expect(text).toContain('x\\x0Aseed: 5\\x0Adraws: 7');
  });

  it('quotes a name YAML would read as something else', () => {
    for (const [name, canonical] of [['007', 'id'], ['true', 'id'], ['yes', 'id'], ['F_Ha: 3', 'flux_halpha'], ['F_Ha #1', 'flux_halpha'], ['-z', 'z'], [' z', 'z']] as const) {
      const t = starterConfig({ ...BASE, catalog: { path: 'c.csv', format: 'csv', columns: [{ name }], guesses: { byName: [], guesses: [{ canonical, source: name, by: 'name' }], ambiguous: [], passthrough: [] } } });
      expect((parse(t) as { columns: Record<string, { source: unknown }> }).columns[canonical]!.source).toBe(name);
    }
  });

  it('names the first pass-through columns of a wide catalog and counts the rest', () => {
    const wide = Array.from({ length: PASSTHROUGH_LISTED + 3 }, (_, i) => ({ name: `c${i}` }));
    const text = withCatalog([{ name: 'id' }, { name: 'z' }, ...wide]);
    const line = text.split('\n').find((l) => l.startsWith('# Passed through unchanged:'))!;
    expect(line).toContain(`c0, c1,`);
    expect(line).toContain(`c${PASSTHROUGH_LISTED - 1}, and 3 more.`);
    expect(line).not.toContain(`c${PASSTHROUGH_LISTED},`);
  });

  it('writes no line with blanks at its end', () => {
    for (const text of [starterConfig(BASE), withCatalog([{ name: 'Name' }, { name: 'z_spec' }, { name: 'FWHM_Hb' }])]) {
      expect(text.split('\n').filter((l) => /\s$/.test(l))).toEqual([]);
    }
  });
});
