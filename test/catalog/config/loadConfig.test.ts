import { mkdtemp, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ConfigError, defaultConfig, loadConfig, parseConfig } from '../../../src/catalog/config/index.ts';
import { CatalogError } from '../../../src/catalog/readers/CatalogError.ts';

// A config "in" the working directory, so messages name it `census.config.yaml`.
const here = join(process.cwd(), 'census.config.yaml');
const parse = (text: string) => parseConfig(text, here);
const messageOf = (text: string): string => {
  try {
    parse(text);
  } catch (e) {
    expect(e).toBeInstanceOf(ConfigError);
    expect(e).toBeInstanceOf(CatalogError);
    return (e as Error).message;
  }
  throw new Error('expected a ConfigError');
};

const FULL = `
title: Broad lines at cosmic dawn
group: An invented team
description: Test catalog
licence: CC-BY-4.0
citation: Nobody et al. (invented)
input: { path: data/catalog.csv, format: csv }
columns:
  flux_halpha: { source: F_HA, unit: "1e-18 erg s-1 cm-2" }
  id: { source: NAME }
cosmology: wmap9
calibrations: { halpha: gh05_halpha, hbeta: vp06_hbeta, mgii: vo09_mgii, civ: vp06_civ }
bolometric: bc5100
bc5100: 9.26
eddington_per_msun: 1.3e38
efficiency: 0.2
z_seed: 25
lambda_seed: 0.5
duty_cycle: 0.8
seeds: { light: 50, heavy: 1e6 }
local_relation: kh13_mbulge
dust_curve: smc
intrinsic_balmer: 3.1
line_priority: [mgii, halpha]
draws: 500
seed: 42
output: out/catalog.parquet
site: { base: census }
`;

describe('parseConfig', () => {
  it('reads every key of a full config into the config and its derive settings', () => {
    const cfg = parse(FULL);
    expect(cfg.title).toBe('Broad lines at cosmic dawn');
    expect(cfg.group).toBe('An invented team');
    expect(cfg.description).toBe('Test catalog');
    expect(cfg.licence).toBe('CC-BY-4.0');
    expect(cfg.citation).toBe('Nobody et al. (invented)');
    expect(cfg.input).toEqual({ path: join(process.cwd(), 'data/catalog.csv'), format: 'csv' });
    expect(cfg.columns).toEqual({ flux_halpha: { source: 'F_HA', unit: '1e-18 erg s-1 cm-2' }, id: { source: 'NAME' } });
    expect(cfg.settings).toEqual({
      cosmology: 'wmap9',
      calibrations: { halpha: 'gh05_halpha', hbeta: 'vp06_hbeta', mgii: 'vo09_mgii', civ: 'vp06_civ' },
      linePriority: ['mgii', 'halpha'],
      hbetaWithoutContinuum: 'line',
      bolometric: 'bc5100',
      bc5100: 9.26,
      eddingtonPerMsun: 1.3e38,
      efficiency: 0.2,
      zSeed: 25,
      lambdaSeed: 0.5,
      dutyCycle: 0.8,
      lightSeedMsun: 50,
      heavySeedMsun: 1e6,
      localRelation: 'kh13_mbulge',
      dustCurve: 'smc',
      intrinsicBalmer: 3.1,
      draws: 500,
      seed: 42,
    });
    expect(cfg.output).toBe(join(process.cwd(), 'out/catalog.parquet'));
    expect(cfg.site).toEqual({ base: '/census/' });
    expect(cfg.configPath).toBe(here);
    expect(cfg.configText).toBe(FULL);
  });

  it('reads the Hβ route without a continuum and the intended-medians switch', () => {
    const cfg = parse('hbeta_without_continuum: gh05_eq2\nimplausible_medians_intended: true\n');
    expect(cfg.settings.hbetaWithoutContinuum).toBe('gh05_eq2');
    expect(cfg.implausibleMediansIntended).toBe(true);
    expect(parse('').settings.hbetaWithoutContinuum).toBe('line');
  });

  it('fills keys a config leaves out with the defaults', () => {
    const cfg = parse('title: Only a title\ncalibrations: { mgii: vo09_mgii }\n');
    const d = defaultConfig();
    expect(cfg.title).toBe('Only a title');
    expect(cfg.settings).toEqual({ ...d.settings, calibrations: { ...d.settings.calibrations, mgii: 'vo09_mgii' } });
    expect(cfg.columns).toEqual({});
    expect(cfg.site).toEqual({ base: '/' });
    expect(cfg.input).toBeUndefined();
    expect(cfg.output).toBeUndefined();
  });

  it('treats an empty file or one of comments only as all defaults', () => {
    expect(parse('').settings).toEqual(defaultConfig().settings);
    expect(parse('# nothing yet\n').settings).toEqual(defaultConfig().settings);
  });

  it('keeps absolute input and output paths as they are', () => {
    const cfg = parse('input: { path: /data/cat.fits }\noutput: /srv/out.parquet\n');
    expect(cfg.input).toEqual({ path: '/data/cat.fits' });
    expect(cfg.output).toBe('/srv/out.parquet');
  });

  it('accepts a plain file name as input and as a column mapping', () => {
    const cfg = parse('input: cat.csv\ncolumns: { z: REDSHIFT }\n');
    expect(cfg.input).toEqual({ path: join(process.cwd(), 'cat.csv') });
    expect(cfg.columns).toEqual({ z: { source: 'REDSHIFT' } });
  });

  it.each([
    ['/', '/'],
    ['', '/'],
    ['census', '/census/'],
    ['/census', '/census/'],
    ['census/', '/census/'],
    ['//a/b//', '/a/b/'],
  ])('normalises site.base %j to %j', (base, want) => {
    expect(parse(`site: { base: ${JSON.stringify(base)} }`).site.base).toBe(want);
  });
});

describe('parseConfig rejects a bad config with one line naming the file and the key', () => {
  it.each([
    ['cosmolgy: planck18', 'census.config.yaml: unknown key "cosmolgy" (did you mean "cosmology"?)'],
    ['drawz: 10', 'census.config.yaml: unknown key "drawz" (did you mean "draws"?)'],
    ['input: { path: a.csv, fromat: csv }', 'census.config.yaml: unknown key "input.fromat" (did you mean "input.format"?)'],
    ['seeds: { ligth: 10 }', 'census.config.yaml: unknown key "seeds.ligth" (did you mean "seeds.light"?)'],
    ['calibrations: { oiii: x }', 'census.config.yaml: unknown key "calibrations.oiii"; known: halpha, hbeta, mgii, civ'],
    ['site: { bse: / }', 'census.config.yaml: unknown key "site.bse" (did you mean "site.base"?)'],
    ['columns: { flux_halpha: { sorce: F } }', 'census.config.yaml: unknown key "columns.flux_halpha.sorce" (did you mean "columns.flux_halpha.source"?)'],
    ['efficiency: high', 'census.config.yaml: efficiency must be a number between 0 and 1, got "high"'],
    ['efficiency: 1', 'census.config.yaml: efficiency must be a number between 0 and 1, got 1'],
    ['efficiency: 0', 'census.config.yaml: efficiency must be a number between 0 and 1, got 0'],
    ['duty_cycle: 1.5', 'census.config.yaml: duty_cycle must be a number between 0 and 1, got 1.5'],
    ['bc5100: -3', 'census.config.yaml: bc5100 must be a positive number, got -3'],
    ['eddington_per_msun: .inf', 'census.config.yaml: eddington_per_msun must be a positive number, got Infinity'],
    ['intrinsic_balmer: [2.86]', 'census.config.yaml: intrinsic_balmer must be a positive number, got a list'],
    ['lambda_seed: 0', 'census.config.yaml: lambda_seed must be a positive number, got 0'],
    ['seeds: { heavy: "1e5" }', 'census.config.yaml: seeds.heavy must be a positive number, got "1e5"'],
    ['seeds: 100', 'census.config.yaml: seeds must be a mapping with light and heavy (Msun), got 100'],
    ['z_seed: 0', 'census.config.yaml: z_seed must be a number greater than 0, got 0'],
    ['z_seed: -5', 'census.config.yaml: z_seed must be a number greater than 0, got -5'],
    ['draws: 0', 'census.config.yaml: draws must be an integer between 1 and 100000, got 0'],
    ['draws: 100001', 'census.config.yaml: draws must be an integer between 1 and 100000, got 100001'],
    ['draws: 10.5', 'census.config.yaml: draws must be an integer between 1 and 100000, got 10.5'],
    ['seed: -1', 'census.config.yaml: seed must be an integer of at least 0, got -1'],
    ['seed: 1.5', 'census.config.yaml: seed must be an integer of at least 0, got 1.5'],
    ['cosmology: planck19', 'census.config.yaml: cosmology: unknown cosmology "planck19"; known: planck18, planck15, wmap9, flat70'],
    [
      'calibrations: { halpha: rv16_halpha }',
      'census.config.yaml: calibrations.halpha: unknown calibration "rv16_halpha"; known: gh05_halpha, rv15_halpha',
    ],
    [
      'calibrations: { halpha: vp06_hbeta }',
      'census.config.yaml: calibrations.halpha: calibration "vp06_hbeta" is for hbeta, not halpha; known: gh05_halpha, rv15_halpha',
    ],
    ['calibrations: rv15_halpha', 'census.config.yaml: calibrations must be a mapping of line to calibration, got "rv15_halpha"'],
    [
      'bolometric: bc4000',
      'census.config.yaml: bolometric: unknown bolometric method "bc4000"; known: halpha_gh05_bc5100, bc5100, bc3000, bc1350, netzer19',
    ],
    ['local_relation: mbh_sigma', 'census.config.yaml: local_relation: unknown local relation "mbh_sigma"; known: rv15_agn, rv15_early, kh13_mbulge, kh13_sigma'],
    ['dust_curve: mw', 'census.config.yaml: dust_curve: unknown dust curve "mw"; known: calzetti00, ccm89, smc'],
    ['line_priority: halpha', 'census.config.yaml: line_priority must be a non-empty list of lines (halpha, hbeta, mgii, civ), got "halpha"'],
    ['line_priority: []', 'census.config.yaml: line_priority must be a non-empty list of lines (halpha, hbeta, mgii, civ), got a list'],
    ['line_priority: [halpha, oiii]', 'census.config.yaml: line_priority[1]: unknown line "oiii"; known: halpha, hbeta, mgii, civ'],
    ['line_priority: [halpha, halpha]', 'census.config.yaml: line_priority lists "halpha" twice'],
    ['input: { format: csv }', 'census.config.yaml: input.path must be the catalog file name (relative to the config file), got nothing'],
    ['input: { path: a.xls, format: xls }', 'census.config.yaml: input.format: unknown format "xls"; known: csv, tsv, ecsv, fits, votable, parquet'],
    ['input: { path: a.csv, comment: "//" }', 'census.config.yaml: input.comment must be one character other than a blank, quote or comma, got "//"'],
    ['input: { path: a.csv, comment: "," }', 'census.config.yaml: input.comment must be one character other than a blank, quote or comma, got ","'],
    ['output: 3', 'census.config.yaml: output must be a file name or a mapping with path and formats, got 3'],
    ['title: [a, b]', 'census.config.yaml: title must be a string, got a list'],
    ['site: { base: 1 }', 'census.config.yaml: site.base must be a string, got 1'],
    ['columns: { fwhm_ha: { source: FWHM } }', 'census.config.yaml: columns: unknown column "fwhm_ha" (did you mean "fwhm_halpha"?)'],
    ['columns: { flux_halpha: 12 }', 'census.config.yaml: columns.flux_halpha must be a mapping with source and/or unit, got 12'],
    ['columns: { z: { source: "" } }', 'census.config.yaml: columns.z.source is empty'],
    ['columns: [id, z]', 'census.config.yaml: columns must be a mapping of canonical column names, got a list'],
    ['columns: { id: { unit: km/s } }', 'census.config.yaml: columns.id.unit: id is text and takes no unit, got "km/s"'],
    ['- a\n- b', 'census.config.yaml: must be a mapping of keys to values, got a list'],
    ['hbeta_without_continuum: gh05', 'census.config.yaml: hbeta_without_continuum: unknown route "gh05"; known: line, gh05_eq2'],
    ['implausible_medians_intended: yes please', 'census.config.yaml: implausible_medians_intended must be true or false, got "yes please"'],
  ])('%s', (text, message) => {
    expect(messageOf(text)).toBe(message);
  });

  it('names the column and the unit when a unit has the wrong dimension', () => {
    expect(messageOf('columns: { fwhm_halpha: { unit: erg/s } }')).toBe(
      'census.config.yaml: columns.fwhm_halpha.unit: unit "erg/s" is a luminosity, expected a velocity (km s-1)',
    );
  });

  it('names the column and the unit when a unit is unknown', () => {
    expect(messageOf('columns: { flux_halpha: { unit: furlongs } }')).toBe(
      'census.config.yaml: columns.flux_halpha.unit: unknown unit "furlongs": "furlongs" is not a recognised unit symbol',
    );
  });

  it('reports a YAML syntax error with its line and column on one line', () => {
    const msg = messageOf('title: ok\ncosmology: [planck18\ndraws: 10\n');
    expect(msg).toMatch(/^census\.config\.yaml: YAML syntax error at line \d+, column \d+: \S/);
    expect(msg).not.toContain('\n');
  });

  it('reports the line of a badly indented key', () => {
    const msg = messageOf('title: a\nseeds:\n  light: 10\n heavy: 20\n');
    expect(msg).toMatch(/^census\.config\.yaml: YAML syntax error at line 4, column \d+: /);
  });

  it('reports a key given twice as a YAML error', () => {
    expect(messageOf('draws: 10\ndraws: 20\n')).toMatch(/^census\.config\.yaml: YAML syntax error at line 2, column 1: .*unique/);
  });
});

describe('loadConfig', () => {
  it('reads a file, resolving relative paths against its folder and ignoring a byte-order mark', async () => {
    const dir = await mkdtemp(join(tmpdir(), 'census-config-'));
    const file = join(dir, 'census.config.yaml');
    await writeFile(file, '\uFEFFinput: { path: catalog.csv }\noutput: out/x.parquet\ndraws: 7\n');
    const cfg = await loadConfig(file);
    expect(cfg.input?.path).toBe(join(dir, 'catalog.csv'));
    expect(cfg.output).toBe(join(dir, 'out/x.parquet'));
    expect(cfg.settings.draws).toBe(7);
    expect(cfg.configPath).toBe(file);
  });

  it('names a missing file in a ConfigError', async () => {
    const file = join(tmpdir(), 'no-such-dir-census', 'census.config.yaml');
    await expect(loadConfig(file)).rejects.toThrow(new ConfigError(`${file}: cannot read the config file: no such file`));
  });

  it('names the file by its absolute path when it is outside the working directory', async () => {
    const dir = await mkdtemp(join(tmpdir(), 'census-config-'));
    const file = join(dir, 'census.config.yaml');
    await writeFile(file, 'cosmolgy: planck18\n');
    await expect(loadConfig(file)).rejects.toThrow(`${file}: unknown key "cosmolgy" (did you mean "cosmology"?)`);
  });
});

describe('the demo config', () => {
  it('loads without a problem and points at the demo catalog', async () => {
    const file = join(process.cwd(), 'data-demo', 'census.config.yaml');
    const cfg = await loadConfig(file);
    expect(cfg.input?.path).toBe(join(process.cwd(), 'data-demo', 'catalog.csv'));
    expect(cfg.columns.flux_halpha?.unit).toBe('1e-18 erg s-1 cm-2');
  });
});
