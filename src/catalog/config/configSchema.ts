import { DEFAULT_SETTINGS } from '../../core/derive/defaultSettings.ts';
import { LINES } from '../../core/derive/types.ts';
import { BUILT_IN_READINGS } from '../../core/readings/builtInReadings.ts';
import { READING_BOLOMETRIC_IDS, READING_SPEC_KEYS } from '../../core/readings/parseReadingSpec.ts';
import { READING_LIMITS, type ReadingLimitKey } from '../../core/readings/readingLimits.ts';
import { CANONICAL_COLUMNS } from '../normalize/canonicalColumns.ts';
import {
  BOLOMETRIC_IDS,
  CALIBRATION_IDS_BY_LINE,
  COSMOLOGY_IDS,
  DUST_CURVE_IDS,
  HBETA_WITHOUT_CONTINUUM_IDS,
  INPUT_FORMATS,
  LOCAL_RELATION_IDS,
} from './knownIds.ts';
import { EXPORT_FORMATS } from './publicationConfig.ts';
import { READINGS_KEYS } from './readingsConfig.ts';
import { DEFAULT_GZIP_LIMITS } from '../readers/gzipLimits.ts';
import { CONFIG_KEYS, NUMBER_RULES } from './validateConfig.ts';
import { DENSITY_KEYS, FIELD_KEYS, FIT_KEYS, SURVEY_KEYS } from './validateSurvey.ts';

/** A JSON Schema document or sub-schema (draft 2020-12), as plain JSON. */
export type JsonSchema = { [key: string]: unknown };

/** Where the published schema sits in the package. */
export const CONFIG_SCHEMA_PATH = 'schema/census.config.schema.json';

const str = (description: string, extra: JsonSchema = {}): JsonSchema => ({ type: 'string', description, ...extra });
const oneOfIds = (ids: readonly string[], description: string, dflt?: string): JsonSchema => ({
  type: 'string',
  enum: [...ids],
  description,
  ...(dflt !== undefined ? { default: dflt } : {}),
});
const rule = (r: { schema: JsonSchema; what: string }, description: string, dflt?: number): JsonSchema => ({
  ...r.schema,
  description: `${description} (${r.what})`,
  ...(dflt !== undefined ? { default: dflt } : {}),
});
const strict = (properties: Record<string, JsonSchema>, keys: readonly string[], description: string, required: string[] = []): JsonSchema => {
  // The key list of the validator decides which keys exist; a key without a schema here is a bug the tests catch.
  const missing = keys.filter((k) => !(k in properties));
  const extra = Object.keys(properties).filter((k) => !keys.includes(k));
  if (missing.length || extra.length) throw new Error(`config schema out of step with the validator: missing ${missing.join(', ') || '-'}; extra ${extra.join(', ') || '-'}`);
  return { type: 'object', description, properties, additionalProperties: false, ...(required.length ? { required } : {}) };
};
/** A case-insensitive regular-expression fragment for `text` (JSON Schema patterns take no flags). */
const anyCase = (text: string): string => [...text].map((c) => (/[a-z]/i.test(c) ? `[${c.toLowerCase()}${c.toUpperCase()}]` : c.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&'))).join('');
const readingNumber = (key: ReadingLimitKey, what: string): JsonSchema => ({
  type: 'number',
  minimum: READING_LIMITS[key].min,
  maximum: READING_LIMITS[key].max,
  description: `${what}: ${READING_LIMITS[key].min} to ${READING_LIMITS[key].max} (${READING_LIMITS[key].reason})`,
});
const numberList = (description: string, minItems: number): JsonSchema => ({ type: 'array', items: { type: 'number' }, minItems, description });
const pair = (description: string): JsonSchema => ({ type: 'array', items: { type: 'number' }, minItems: 2, maxItems: 2, description });

function calibrationsSchema(description: string, withDefaults: boolean): JsonSchema {
  const props = Object.fromEntries(
    LINES.map((l) => [l, oneOfIds(CALIBRATION_IDS_BY_LINE[l], `Virial calibration for ${l}`, withDefaults ? DEFAULT_SETTINGS.calibrations[l] : undefined)]),
  );
  return strict(props, LINES, description);
}

function columnsSchema(): JsonSchema {
  const props = Object.fromEntries(
    CANONICAL_COLUMNS.map((c) => {
      const unit = c.unitText ? ` Canonical unit: ${c.unitText}.` : '';
      return [c.name, {
        description: `${c.description}.${unit} A string names the file column; a mapping gives source and/or unit.`,
        oneOf: [
          { type: 'string', minLength: 1 },
          { type: 'object', properties: { source: { type: 'string', minLength: 1, description: 'Column name in the file' }, unit: { type: 'string', description: 'Unit of the values in the file (overrides the file\'s own)' } }, additionalProperties: false },
        ],
      }];
    }),
  );
  return { type: 'object', description: 'Canonical column name → the file column and/or unit it is read from', properties: props, additionalProperties: false };
}

function customReadingSchema(): JsonSchema {
  const props: Record<string, JsonSchema> = {
    id: str('Id of the reading', { pattern: '^[a-z][a-z0-9_]{0,39}$' }),
    label: str('Name shown on the site'),
    premise: str('One sentence: what the reading assumes'),
    references: { description: 'The paper(s) the reading rests on', oneOf: [{ type: 'string', minLength: 1 }, { type: 'array', items: { type: 'string', minLength: 1 }, minItems: 1 }] },
    calibrations: calibrationsSchema('Virial calibration per line under this reading', false),
    width: oneOfIds(['measured', 'core', 'deflated'], 'Which width enters the mass'),
    deflation: readingNumber('deflation', 'Width-deflation factor (measured / core FWHM)'),
    bolometric: oneOfIds(READING_BOLOMETRIC_IDS, 'Bolometric correction under this reading (or give l5100_ratio)'),
    l5100_ratio: readingNumber('l5100Ratio', 'L_bol / λL5100'),
    dust: oneOfIds(['standard', 'none'], 'Dust correction of the broad lines'),
    efficiency: readingNumber('efficiency', 'Radiative efficiency'),
    duty_cycle: readingNumber('dutyCycle', 'Duty cycle of growth'),
  };
  return strict(props, READING_SPEC_KEYS, 'A custom reading of the broad lines', ['id', 'premise', 'references']);
}

function surveySchema(): JsonSchema {
  const limit: JsonSchema = {
    description: 'Limiting line flux (in flux_unit): a number, { column: <name> } per object, or a table over observed wavelength',
    oneOf: [
      { type: 'number', exclusiveMinimum: 0 },
      { type: 'object', properties: { column: { type: 'string' } }, required: ['column'], additionalProperties: false },
      {
        type: 'object',
        properties: { wavelength_angstrom: numberList('Observed wavelengths, increasing (Å)', 2), flux: { type: 'array', items: { type: 'number', exclusiveMinimum: 0 }, minItems: 2 } },
        required: ['wavelength_angstrom', 'flux'],
        additionalProperties: false,
      },
    ],
  };
  const field = strict(
    {
      name: str('The field\'s name, as in field_column', { minLength: 1 }),
      area_arcmin2: { type: 'number', exclusiveMinimum: 0, description: 'Area on the sky (arcmin²)' },
      source_plane_area_arcmin2: { type: 'number', exclusiveMinimum: 0, description: 'Source-plane area behind a lens (arcmin², at most area_arcmin2)' },
      limits: { type: 'object', description: 'Limiting flux per line', properties: Object.fromEntries(LINES.map((l) => [l, limit])), additionalProperties: false, minProperties: 1 },
    },
    FIELD_KEYS,
    'One field of the survey',
    ['name', 'area_arcmin2', 'limits'],
  );
  const fit = strict(
    {
      eddington_ratio: {
        type: 'object',
        description: 'Log-normal prior of the Eddington ratio',
        properties: { mean_log: { type: 'number', minimum: -4, maximum: 2 }, sigma_log: { type: 'number', exclusiveMinimum: 0 } },
        additionalProperties: false,
      },
      mstar_range: pair('log M* range of the fit, increasing (default [7, 12])'),
      walkers: { type: 'integer', minimum: 8, maximum: 200, multipleOf: 2, description: 'Ensemble walkers, even (default 16)' },
      steps: { type: 'integer', minimum: 100, maximum: 100000, description: 'Cap on the steps per walker: the sampler stops earlier once the kept chain is 50 autocorrelation times long (default 4000)' },
      burn: { type: 'integer', minimum: 0, description: 'Steps dropped at the start, fewer than steps (default 300, at most a quarter of steps)' },
    },
    FIT_KEYS,
    'The selection-aware relation fit',
  );
  const densities = strict(
    {
      log_mbh_bins: numberList('Bin edges of log M_BH, increasing', 2),
      log_lbol_bins: numberList('Bin edges of log L_bol, increasing', 2),
      z_ranges: { type: 'array', items: pair('[lo, hi) redshift range'), minItems: 1, description: 'Redshift ranges of the densities' },
    },
    DENSITY_KEYS,
    'Bins of the space densities',
  );
  return strict(
    {
      fields: { type: 'array', items: field, minItems: 1, description: 'The survey\'s fields' },
      field_column: str('Catalog column naming each object\'s field (needed with more than one field)', { minLength: 1 }),
      wavelength_range_angstrom: pair('Observed wavelength range of the spectra (Å), increasing, positive'),
      min_fwhm_kms: { type: 'number', minimum: 0, description: 'Narrowest FWHM counted as broad (km/s)' },
      min_snr: { type: 'number', minimum: 0, description: 'Signal-to-noise ratio a line needs' },
      flux_unit: str('Unit of the limits, e.g. "1e-18 erg s-1 cm-2"'),
      relation_fit: fit,
      densities,
    },
    SURVEY_KEYS,
    'The survey\'s selection, for space densities and the selection-aware relation (dawn-census population)',
    ['fields', 'wavelength_range_angstrom'],
  );
}

/**
 * The JSON Schema (draft 2020-12) of census.config.yaml, built from the validator's key lists
 * and the core's records (calibrations, bolometric methods, cosmologies, dust curves, local
 * relations, readings, canonical columns). `npm run schema` writes it to {@link CONFIG_SCHEMA_PATH}.
 * It describes what the validator accepts; checks it cannot express (a unit's dimension, a UCD
 * word, an ORCID check character, increasing bin edges) are the validator's alone.
 */
export function buildConfigSchema(): JsonSchema {
  const s = DEFAULT_SETTINGS;
  const top: Record<string, JsonSchema> = {
    title: str('Title of the catalog, shown on the site'),
    group: str('The group that publishes it'),
    description: str('What the catalog is, a paragraph'),
    licence: str('Licence of the catalog, e.g. CC-BY-4.0'),
    citation: str('Preferred citation, free text'),
    input: {
      description: 'The catalog file (relative to the config file), or a mapping with path, format and comment',
      oneOf: [
        { type: 'string', minLength: 1 },
        {
          type: 'object',
          properties: {
            path: str('Catalog file, relative to the config file', { minLength: 1 }),
            format: oneOfIds(INPUT_FORMATS, 'Format, when the extension does not say'),
            comment: str('One character starting a comment line (CSV/TSV), e.g. "%"', { minLength: 1, maxLength: 1, pattern: '^[^\\s",]$' }),
            gzip_max_ratio: rule(NUMBER_RULES.gzipRatio, 'Most times a gzip catalog may expand its compressed size, read so far', DEFAULT_GZIP_LIMITS.maxRatio),
            gzip_max_gb: rule(NUMBER_RULES.positive, 'Most gigabytes (1e9 bytes) a gzip catalog may expand to', DEFAULT_GZIP_LIMITS.maxBytes / 1e9),
          },
          required: ['path'],
          additionalProperties: false,
        },
      ],
    },
    columns: columnsSchema(),
    cosmology: oneOfIds(COSMOLOGY_IDS, 'Cosmology preset', s.cosmology),
    calibrations: calibrationsSchema('Virial calibration per broad line', true),
    bolometric: oneOfIds(BOLOMETRIC_IDS, 'Bolometric-luminosity method', s.bolometric),
    bc5100: rule(NUMBER_RULES.positive, 'Bolometric correction at 5100 Å', s.bc5100),
    eddington_per_msun: rule(NUMBER_RULES.positive, 'Eddington luminosity per solar mass (erg/s)', s.eddingtonPerMsun),
    efficiency: rule(NUMBER_RULES.efficiency, 'Radiative efficiency ε', s.efficiency),
    z_seed: rule(NUMBER_RULES.zSeed, 'Redshift at which seeds form', s.zSeed),
    lambda_seed: rule(NUMBER_RULES.positive, 'Eddington ratio of seed growth', s.lambdaSeed),
    duty_cycle: rule(NUMBER_RULES.dutyCycle, 'Duty cycle of seed growth', s.dutyCycle),
    seeds: strict(
      { light: rule(NUMBER_RULES.positive, 'Light seed mass (Msun)', s.lightSeedMsun), heavy: rule(NUMBER_RULES.positive, 'Heavy seed mass (Msun)', s.heavySeedMsun) },
      ['light', 'heavy'],
      'Seed masses',
    ),
    local_relation: oneOfIds(LOCAL_RELATION_IDS, 'Local black-hole–host relation', s.localRelation),
    dust_curve: oneOfIds(DUST_CURVE_IDS, 'Dust attenuation curve', s.dustCurve),
    intrinsic_balmer: rule(NUMBER_RULES.positive, 'Intrinsic broad Hα/Hβ', s.intrinsicBalmer),
    line_priority: { type: 'array', items: { type: 'string', enum: [...LINES] }, minItems: 1, uniqueItems: true, description: 'Order in which lines give the mass', default: [...s.linePriority] },
    draws: rule(NUMBER_RULES.draws, 'Monte Carlo draws per object', s.draws),
    seed: rule(NUMBER_RULES.seed, 'Global random seed', s.seed),
    output: {
      description: 'The Parquet catalog (relative to the config file), or a mapping with path and formats',
      oneOf: [
        { type: 'string', minLength: 1 },
        {
          type: 'object',
          properties: {
            path: str('Parquet catalog, relative to the config file', { minLength: 1 }),
            formats: {
              description: 'Further formats written beside the Parquet catalog',
              oneOf: [oneOfIds(EXPORT_FORMATS, 'Export format'), { type: 'array', items: { type: 'string', enum: [...EXPORT_FORMATS] } }],
            },
          },
          additionalProperties: false,
        },
      ],
    },
    site: strict({ base: str('Path the site is served under, e.g. /census/', { default: '/' }) }, ['base'], 'Site options'),
    readings: strict(
      {
        primary: str(`Reading the main catalog is derived under (built-in: ${BUILT_IN_READINGS.map((r) => r.id).join(', ')}, or a custom id)`, { examples: BUILT_IN_READINGS.map((r) => r.id), default: 'standard' }),
        use: { type: 'array', items: { type: 'string', examples: BUILT_IN_READINGS.map((r) => r.id) }, minItems: 1, uniqueItems: true, description: 'Readings to derive, in display order' },
        custom: { type: 'array', items: customReadingSchema(), description: 'Custom readings' },
      },
      READINGS_KEYS,
      'Readings of the broad lines',
    ),
    hbeta_without_continuum: oneOfIds(HBETA_WITHOUT_CONTINUUM_IDS, 'Route of an Hβ mass without a measured continuum', s.hbetaWithoutContinuum),
    implausible_medians_intended: { type: 'boolean', description: 'The median line luminosity or FWHM is outside what broad lines have, on purpose', default: false },
    authors: {
      type: 'array',
      description: 'Authors of the catalog',
      items: {
        oneOf: [
          { type: 'string', minLength: 1 },
          {
            type: 'object',
            properties: {
              name: str('The author\'s name', { minLength: 1 }),
              orcid: str('ORCID iD, 0000-0002-1825-0097 form (the check character is checked by dawn-census)', { pattern: `^\\s*(?:${anyCase('https://orcid.org/')}|${anyCase('http://orcid.org/')})?\\d{4}-\\d{4}-\\d{4}-\\d{3}[\\dX]\\s*$` }),
              affiliation: str('Affiliation'),
            },
            required: ['name'],
            additionalProperties: false,
          },
        ],
      },
    },
    version: { type: ['string', 'number'], description: 'Version of the catalog' },
    doi: str('DOI of the catalog, 10.<registrant>/<suffix>', { pattern: `^\\s*(?:${anyCase('doi:')}|${anyCase('https://')}(?:${anyCase('dx.')})?${anyCase('doi.org/')}|${anyCase('http://')}(?:${anyCase('dx.')})?${anyCase('doi.org/')})?10\\.\\d{4,9}/\\S+\\s*$` }),
    passthrough: {
      type: 'object',
      description: 'File column name → unit, UCD and description of a column copied unchanged',
      additionalProperties: {
        type: 'object',
        properties: { unit: str('VOUnits unit'), ucd: str('IVOA UCD1+ word(s)'), description: str('What the column holds') },
        additionalProperties: false,
      },
    },
    survey: surveySchema(),
  };
  const root = strict(top, CONFIG_KEYS, 'census.config.yaml: the settings of a Dawn Census catalog (see README, "Your own catalog")');
  return { $schema: 'https://json-schema.org/draft/2020-12/schema', title: 'Dawn Census config (census.config.yaml)', ...root };
}

/** The schema as the committed file holds it: two-space JSON with a final newline. */
export function configSchemaText(): string {
  return `${JSON.stringify(buildConfigSchema(), null, 2)}\n`;
}
