import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { ALLOWED_VALUES_BEGIN, ALLOWED_VALUES_END, withAllowedValues } from '../../../src/catalog/config/allowedValuesTable.ts';
import { buildConfigSchema, CONFIG_SCHEMA_PATH, configSchemaText, type JsonSchema } from '../../../src/catalog/config/configSchema.ts';
import { CALIBRATION_IDS_BY_LINE, COSMOLOGY_IDS, DUST_CURVE_IDS, LOCAL_RELATION_IDS } from '../../../src/catalog/config/knownIds.ts';
import { validateAgainstSchema } from '../../../src/catalog/config/schemaSubsetValidator.ts';
import { CONFIG_KEYS, NUMBER_RULES, validateConfig } from '../../../src/catalog/config/validateConfig.ts';

const root = fileURLToPath(new URL('../../../', import.meta.url));
const schema = buildConfigSchema();
const props = schema.properties as Record<string, JsonSchema>;
const demo = parse(readFileSync(`${root}data-demo/census.config.yaml`, 'utf8')) as Record<string, unknown>;
const toolAccepts = (doc: unknown): boolean => {
  try {
    validateConfig(doc, 'test.yaml', '/tmp');
    return true;
  } catch {
    return false;
  }
};

describe('the committed config schema and README table', () => {
  it('match what npm run schema would write now (run npm run schema when this fails)', () => {
    expect(readFileSync(`${root}${CONFIG_SCHEMA_PATH}`, 'utf8')).toBe(configSchemaText());
    const readme = readFileSync(`${root}README.md`, 'utf8');
    expect(readme).toContain(ALLOWED_VALUES_BEGIN);
    expect(readme).toContain(ALLOWED_VALUES_END);
    expect(readme).toBe(withAllowedValues(readme));
  });

  it('is shipped with the package', () => {
    const pkg = JSON.parse(readFileSync(`${root}package.json`, 'utf8')) as { files: string[]; scripts: Record<string, string> };
    expect(pkg.files).toContain('schema/');
    expect(pkg.scripts.schema).toBe('tsx scripts/write-config-schema.ts');
  });

  it('lists every allowed value of the core records in the README table', () => {
    const table = withAllowedValues(`${ALLOWED_VALUES_BEGIN}${ALLOWED_VALUES_END}`);
    for (const id of [...COSMOLOGY_IDS, ...DUST_CURVE_IDS, ...LOCAL_RELATION_IDS, ...Object.values(CALIBRATION_IDS_BY_LINE).flat()]) expect(table).toContain(`\`${id}\``);
  });
});

describe('buildConfigSchema', () => {
  it('declares draft 2020-12 and exactly the validator\'s top-level keys, with no others', () => {
    expect(schema.$schema).toBe('https://json-schema.org/draft/2020-12/schema');
    expect(Object.keys(props).sort()).toEqual([...CONFIG_KEYS].sort());
    expect(schema.additionalProperties).toBe(false);
  });

  it('offers per line only the calibrations of that line', () => {
    const cal = (props.calibrations!.properties as Record<string, JsonSchema>);
    expect(cal.halpha!.enum).toEqual(CALIBRATION_IDS_BY_LINE.halpha);
    expect(cal.civ!.enum).toEqual(CALIBRATION_IDS_BY_LINE.civ);
  });

  it('accepts data-demo/census.config.yaml, as the tool does', () => {
    expect(toolAccepts(demo)).toBe(true);
    expect(validateAgainstSchema(demo, schema)).toEqual([]);
  });

  it.each([
    ['an unknown top-level key', { cosmolgy: 'planck18' }, '$: unknown key "cosmolgy"'],
    ['an unknown cosmology', { cosmology: 'planck99' }, '$.cosmology: "planck99" is not one of'],
    ['a calibration of another line', { calibrations: { halpha: 'vp06_civ' } }, '$.calibrations.halpha: "vp06_civ" is not one of'],
    ['draws of zero', { draws: 0 }, '$.draws: 0 is below 1'],
    ['a fractional draw count', { draws: 2.5 }, '$.draws: expected integer, got number'],
    ['an efficiency of 1', { efficiency: 1 }, '$.efficiency: 1 is not below 1'],
    ['a line listed twice in line_priority', { line_priority: ['halpha', 'halpha'] }, '$.line_priority: items are not unique'],
    ['an unknown export format', { output: { path: 'out.parquet', formats: ['hdf5'] } }, '$.output.formats[0]: "hdf5" is not one of'],
    ['a DOI of the wrong shape', { doi: '11.1234/abc' }, '$.doi: "11.1234/abc" does not match'],
    ['an ORCID of the wrong shape', { authors: [{ name: 'A. Writer', orcid: '0000-0002-1825' }] }, '$.authors[0].orcid: "0000-0002-1825" does not match'],
    ['a survey without fields', { survey: { wavelength_range_angstrom: [9000, 53000] } }, '$.survey: missing required key "fields"'],
    ['an odd walker count', { survey: { ...(demo.survey as object), relation_fit: { walkers: 15 } } }, '$.survey.relation_fit.walkers: 15 is not a multiple of 2'],
    ['a custom reading with a deflation above 10', { readings: { custom: [{ id: 'wide', premise: 'p', references: 'r', width: 'deflated', deflation: 11 }] } }, '$.readings.custom[0].deflation: 11 is above 10'],
    ['an unknown canonical column', { columns: { fwhm_halfa: 'FWHM' } }, '$.columns: unknown key "fwhm_halfa"'],
  ])('rejects %s, as the tool does', (_what, doc, message) => {
    expect(toolAccepts(doc)).toBe(false);
    const problems = validateAgainstSchema(doc, schema);
    expect(problems.some((p) => p.startsWith(message))).toBe(true);
  });

  it('gives every number rule the same bounds as the validator, at and beside each bound', () => {
    for (const [name, r] of Object.entries(NUMBER_RULES)) {
      const s = r.schema as JsonSchema;
      const probes = [0, 1, -1, 0.5, 2.5, 1e5, 1e5 + 1, Number.MAX_SAFE_INTEGER, 2 ** 53, 1e300];
      for (const x of probes) expect([name, x, validateAgainstSchema(x, s).length === 0]).toEqual([name, x, r.ok(x)]);
    }
  });

  it('matches the tool on numbers at the edges of the survey fit, key by key', () => {
    const survey = demo.survey as Record<string, unknown>;
    for (const walkers of [6, 8, 200, 202]) {
      const doc = { survey: { ...survey, relation_fit: { walkers } } };
      expect([walkers, validateAgainstSchema(doc, schema).length === 0]).toEqual([walkers, toolAccepts(doc)]);
    }
  });
});

describe('validateAgainstSchema', () => {
  it('refuses a schema keyword outside its subset instead of ignoring it', () => {
    expect(() => validateAgainstSchema(1, { type: 'number', $ref: '#/$defs/x' })).toThrow('schema keyword "$ref" is outside the checked subset');
  });

  it('requires exactly one alternative of oneOf to match', () => {
    const s = { oneOf: [{ type: 'number' }, { type: 'integer' }] };
    expect(validateAgainstSchema(1.5, s)).toEqual([]);
    expect(validateAgainstSchema(2, s)).toEqual(['$: matches 2 alternatives of oneOf']);
  });
});
