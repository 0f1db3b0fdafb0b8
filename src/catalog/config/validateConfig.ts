import { isAbsolute, resolve } from 'node:path';
import { LINES, type DeriveSettings, type LineId } from '../../core/derive/types.ts';
import { CANONICAL_BY_NAME } from '../normalize/canonicalColumns.ts';
import type { TableFormat } from '../readers/types.ts';
import type { CensusConfig, ColumnMapping } from './CensusConfig.ts';
import { closestNames } from './closestNames.ts';
import { ConfigError } from './ConfigError.ts';
import { defaultConfig } from './defaultConfig.ts';
import {
  BOLOMETRIC_IDS,
  CALIBRATION_IDS_BY_LINE,
  COSMOLOGY_IDS,
  DUST_CURVE_IDS,
  HBETA_WITHOUT_CONTINUUM_IDS,
  INPUT_FORMATS,
  LOCAL_RELATION_IDS,
} from './knownIds.ts';
import { checkUnit } from './checkUnit.ts';
import { validateReadingsConfig } from './readingsConfig.ts';
import {
  EXPORT_FORMATS,
  normalizeDoi,
  normalizeOrcid,
  ucdProblem,
  unitProblem,
  type CatalogAuthor,
  type ExportFormat,
  type PassthroughDeclaration,
  type Publication,
} from './publicationConfig.ts';
import { validateSurvey } from './validateSurvey.ts';

/** Top-level keys of a census config. */
export const CONFIG_KEYS = [
  'title', 'group', 'description', 'licence', 'citation', 'input', 'columns', 'cosmology', 'calibrations',
  'bolometric', 'bc5100', 'eddington_per_msun', 'efficiency', 'z_seed', 'lambda_seed', 'duty_cycle', 'seeds',
  'local_relation', 'dust_curve', 'intrinsic_balmer', 'line_priority', 'draws', 'seed', 'output', 'site', 'readings',
  'hbeta_without_continuum', 'implausible_medians_intended', 'authors', 'version', 'doi', 'passthrough', 'survey',
] as const;

/** Largest number of Monte Carlo draws per object. */
export const MAX_DRAWS = 100000;

type Obj = Record<string, unknown>;

/** How a value is shown in a message: strings quoted, containers by their kind. */
export function describeValue(v: unknown): string {
  if (typeof v === 'string') return JSON.stringify(v.length > 60 ? `${v.slice(0, 57)}...` : v);
  if (v === null || v === undefined) return 'nothing';
  if (Array.isArray(v)) return 'a list';
  if (typeof v === 'object') return 'a mapping';
  return String(v);
}

const isObj = (v: unknown): v is Obj => typeof v === 'object' && v !== null && !Array.isArray(v);

/** Rules on numbers shared by the config file, the command-line overrides and the JSON Schema (`schema`: the same range in JSON Schema words). */
export const NUMBER_RULES = {
  draws: { ok: (x: number) => Number.isInteger(x) && x >= 1 && x <= MAX_DRAWS, what: `an integer between 1 and ${MAX_DRAWS}`, schema: { type: 'integer', minimum: 1, maximum: MAX_DRAWS } },
  seed: { ok: (x: number) => Number.isSafeInteger(x) && x >= 0, what: 'an integer of at least 0', schema: { type: 'integer', minimum: 0, maximum: Number.MAX_SAFE_INTEGER } },
  positive: { ok: (x: number) => Number.isFinite(x) && x > 0, what: 'a positive number', schema: { type: 'number', exclusiveMinimum: 0 } },
  efficiency: { ok: (x: number) => Number.isFinite(x) && x > 0 && x < 1, what: 'a number between 0 and 1', schema: { type: 'number', exclusiveMinimum: 0, exclusiveMaximum: 1 } },
  dutyCycle: { ok: (x: number) => Number.isFinite(x) && x > 0 && x <= 1, what: 'a number between 0 and 1', schema: { type: 'number', exclusiveMinimum: 0, maximum: 1 } },
  zSeed: { ok: (x: number) => Number.isFinite(x) && x > 0, what: 'a number greater than 0', schema: { type: 'number', exclusiveMinimum: 0 } },
  gzipRatio: { ok: (x: number) => Number.isFinite(x) && x >= 2, what: 'a number of at least 2', schema: { type: 'number', minimum: 2 } },
} as const;

/**
 * Checks a parsed config document and fills in defaults. `label` names the file in messages;
 * relative paths (`input.path`, `output`) are resolved against `baseDir`. Throws ConfigError
 * (one line: `<label>: <key path> ...`) at the first problem.
 */
export function validateConfig(doc: unknown, label: string, baseDir: string): CensusConfig {
  const fail = (msg: string): never => {
    throw new ConfigError(`${label}: ${msg}`);
  };
  const cfg = defaultConfig();
  if (doc === null || doc === undefined) return cfg;
  if (!isObj(doc)) return fail(`must be a mapping of keys to values, got ${describeValue(doc)}`);

  const checkKeys = (o: Obj, allowed: readonly string[], prefix: string): void => {
    for (const k of Object.keys(o)) {
      if (allowed.includes(k)) continue;
      const near = closestNames(k, allowed, 1)[0];
      fail(`unknown key "${prefix}${k}"` + (near ? ` (did you mean "${prefix}${near}"?)` : `; known: ${allowed.join(', ')}`));
    }
  };
  const oneOf = <T extends string>(key: string, v: unknown, known: readonly T[], what: string): T => {
    if (typeof v === 'string' && (known as readonly string[]).includes(v)) return v as T;
    return fail(`${key}: unknown ${what} ${describeValue(v)}; known: ${known.join(', ')}`);
  };
  const num = (key: string, v: unknown, rule: { ok: (x: number) => boolean; what: string }): number => {
    if (typeof v === 'number' && rule.ok(v)) return v;
    return fail(`${key} must be ${rule.what}, got ${describeValue(v)}`);
  };
  const str = (key: string, v: unknown, what = 'a string'): string => {
    if (typeof v === 'string') return v;
    return fail(`${key} must be ${what}, got ${describeValue(v)}`);
  };
  const path = (p: string): string => (isAbsolute(p) ? p : resolve(baseDir, p));

  checkKeys(doc, CONFIG_KEYS, '');
  const s: DeriveSettings = cfg.settings;
  const has = (k: string): boolean => doc[k] !== undefined && doc[k] !== null;

  for (const k of ['title', 'group', 'description', 'licence', 'citation'] as const) {
    if (has(k)) cfg[k] = str(k, doc[k]);
  }

  if (has('input')) {
    let input = doc.input;
    if (typeof input === 'string') input = { path: input };
    if (!isObj(input)) fail(`input must be a mapping with path and format, got ${describeValue(input)}`);
    const i = input as Obj;
    checkKeys(i, ['path', 'format', 'comment', 'gzip_max_ratio', 'gzip_max_gb'], 'input.');
    const p = str('input.path', i.path, 'the catalog file name (relative to the config file)');
    if (p.trim() === '') fail('input.path is empty');
    cfg.input = { path: path(p) };
    if (i.format !== undefined && i.format !== null) {
      cfg.input.format = oneOf<TableFormat>('input.format', i.format, INPUT_FORMATS, 'format');
    }
    if (i.comment !== undefined && i.comment !== null) {
      const c = str('input.comment', i.comment, 'one character that starts a comment line, e.g. "%"');
      if ([...c].length !== 1 || c.length !== 1 || /[\s",]/.test(c)) fail(`input.comment must be one character other than a blank, quote or comma, got ${JSON.stringify(c)}`);
      cfg.input.comment = c;
    }
    if (i.gzip_max_ratio !== undefined && i.gzip_max_ratio !== null) cfg.input.gzipMaxRatio = num('input.gzip_max_ratio', i.gzip_max_ratio, NUMBER_RULES.gzipRatio);
    if (i.gzip_max_gb !== undefined && i.gzip_max_gb !== null) cfg.input.gzipMaxGb = num('input.gzip_max_gb', i.gzip_max_gb, NUMBER_RULES.positive);
  }

  if (has('columns')) {
    if (!isObj(doc.columns)) fail(`columns must be a mapping of canonical column names, got ${describeValue(doc.columns)}`);
    for (const [name, raw] of Object.entries(doc.columns as Obj)) {
      const col = CANONICAL_BY_NAME.get(name);
      if (!col) {
        const near = closestNames(name, CANONICAL_BY_NAME.keys(), 1)[0];
        fail(`columns: unknown column "${name}"` + (near ? ` (did you mean "${near}"?)` : ''));
      }
      const m: ColumnMapping = {};
      if (typeof raw === 'string') {
        m.source = raw;
      } else if (isObj(raw)) {
        checkKeys(raw, ['source', 'unit'], `columns.${name}.`);
        if (raw.source !== undefined && raw.source !== null) m.source = str(`columns.${name}.source`, raw.source);
        if (raw.unit !== undefined && raw.unit !== null) m.unit = str(`columns.${name}.unit`, raw.unit);
      } else if (raw !== null) {
        fail(`columns.${name} must be a mapping with source and/or unit, got ${describeValue(raw)}`);
      }
      if (m.source !== undefined && m.source.trim() === '') fail(`columns.${name}.source is empty`);
      if (m.unit !== undefined && col) {
        const problem = checkUnit(m.unit, col.kind, name);
        if (problem) fail(`columns.${name}.unit: ${problem}`);
      }
      cfg.columns[name] = m;
    }
  }

  if (has('cosmology')) s.cosmology = oneOf('cosmology', doc.cosmology, COSMOLOGY_IDS, 'cosmology');

  if (has('calibrations')) {
    const c = doc.calibrations;
    if (!isObj(c)) fail(`calibrations must be a mapping of line to calibration, got ${describeValue(c)}`);
    checkKeys(c as Obj, LINES, 'calibrations.');
    for (const line of LINES) {
      const v = (c as Obj)[line];
      if (v === undefined || v === null) continue;
      const known = CALIBRATION_IDS_BY_LINE[line];
      const other = LINES.find((l) => l !== line && CALIBRATION_IDS_BY_LINE[l].includes(v as string));
      if (other && typeof v === 'string') {
        fail(`calibrations.${line}: calibration "${v}" is for ${other}, not ${line}; known: ${known.join(', ')}`);
      }
      s.calibrations[line] = oneOf(`calibrations.${line}`, v, known, 'calibration');
    }
  }

  if (has('hbeta_without_continuum')) {
    s.hbetaWithoutContinuum = oneOf('hbeta_without_continuum', doc.hbeta_without_continuum, HBETA_WITHOUT_CONTINUUM_IDS, 'route');
  }
  if (has('implausible_medians_intended')) {
    const v = doc.implausible_medians_intended;
    if (typeof v !== 'boolean') fail(`implausible_medians_intended must be true or false, got ${describeValue(v)}`);
    cfg.implausibleMediansIntended = v as boolean;
  }

  if (has('bolometric')) s.bolometric = oneOf('bolometric', doc.bolometric, BOLOMETRIC_IDS, 'bolometric method');
  if (has('bc5100')) s.bc5100 = num('bc5100', doc.bc5100, NUMBER_RULES.positive);
  if (has('eddington_per_msun')) s.eddingtonPerMsun = num('eddington_per_msun', doc.eddington_per_msun, NUMBER_RULES.positive);
  if (has('efficiency')) s.efficiency = num('efficiency', doc.efficiency, NUMBER_RULES.efficiency);
  if (has('z_seed')) s.zSeed = num('z_seed', doc.z_seed, NUMBER_RULES.zSeed);
  if (has('lambda_seed')) s.lambdaSeed = num('lambda_seed', doc.lambda_seed, NUMBER_RULES.positive);
  if (has('duty_cycle')) s.dutyCycle = num('duty_cycle', doc.duty_cycle, NUMBER_RULES.dutyCycle);

  if (has('seeds')) {
    const sd = doc.seeds;
    if (!isObj(sd)) fail(`seeds must be a mapping with light and heavy (Msun), got ${describeValue(sd)}`);
    checkKeys(sd as Obj, ['light', 'heavy'], 'seeds.');
    const o = sd as Obj;
    if (o.light !== undefined && o.light !== null) s.lightSeedMsun = num('seeds.light', o.light, NUMBER_RULES.positive);
    if (o.heavy !== undefined && o.heavy !== null) s.heavySeedMsun = num('seeds.heavy', o.heavy, NUMBER_RULES.positive);
  }

  if (has('local_relation')) s.localRelation = oneOf('local_relation', doc.local_relation, LOCAL_RELATION_IDS, 'local relation');
  if (has('dust_curve')) s.dustCurve = oneOf('dust_curve', doc.dust_curve, DUST_CURVE_IDS, 'dust curve');
  if (has('intrinsic_balmer')) s.intrinsicBalmer = num('intrinsic_balmer', doc.intrinsic_balmer, NUMBER_RULES.positive);

  if (has('line_priority')) {
    const lp = doc.line_priority;
    if (!Array.isArray(lp) || lp.length === 0) {
      fail(`line_priority must be a non-empty list of lines (${LINES.join(', ')}), got ${describeValue(lp)}`);
    }
    const seen: LineId[] = [];
    (lp as unknown[]).forEach((v, i) => {
      const line = oneOf<LineId>(`line_priority[${i}]`, v, LINES, 'line');
      if (seen.includes(line)) fail(`line_priority lists "${line}" twice`);
      seen.push(line);
    });
    s.linePriority = seen;
  }

  if (has('draws')) s.draws = num('draws', doc.draws, NUMBER_RULES.draws);
  if (has('seed')) s.seed = num('seed', doc.seed, NUMBER_RULES.seed);

  if (has('output')) {
    let out = doc.output;
    if (typeof out === 'string') out = { path: out };
    if (!isObj(out)) fail(`output must be a file name or a mapping with path and formats, got ${describeValue(out)}`);
    const o = out as Obj;
    checkKeys(o, ['path', 'formats'], 'output.');
    if (o.path !== undefined && o.path !== null) {
      const p = str('output.path', o.path, 'a file name (relative to the config file)');
      if (p.trim() === '') fail('output is empty');
      cfg.output = path(p);
    }
    if (o.formats !== undefined && o.formats !== null) {
      const list = Array.isArray(o.formats) ? o.formats : [o.formats];
      cfg.outputFormats = [...new Set(list.map((f, i) => oneOf<ExportFormat>(`output.formats[${i}]`, f, EXPORT_FORMATS, 'format')))];
    }
  }

  if (has('authors') || has('version') || has('doi')) {
    const pub: Publication = { authors: [] };
    if (has('authors')) {
      if (!Array.isArray(doc.authors)) fail(`authors must be a list of names or mappings with name and orcid, got ${describeValue(doc.authors)}`);
      for (const [i, a] of (doc.authors as unknown[]).entries()) {
        const key = `authors[${i}]`;
        const entry = typeof a === 'string' ? { name: a } : a;
        if (!isObj(entry)) fail(`${key} must be a name or a mapping with name and orcid, got ${describeValue(a)}`);
        const e = entry as Obj;
        checkKeys(e, ['name', 'orcid', 'affiliation'], `${key}.`);
        const name = str(`${key}.name`, e.name, 'the author\'s name');
        if (name.trim() === '') fail(`${key}.name is empty`);
        const author: CatalogAuthor = { name: name.trim() };
        if (e.orcid !== undefined && e.orcid !== null) {
          const o = str(`${key}.orcid`, e.orcid);
          const id = normalizeOrcid(o);
          if (!id) fail(`${key}.orcid ${describeValue(o)} is not an ORCID iD (0000-0002-1825-0097 form, with a valid check character)`);
          author.orcid = id as string;
        }
        if (e.affiliation !== undefined && e.affiliation !== null) author.affiliation = str(`${key}.affiliation`, e.affiliation);
        pub.authors.push(author);
      }
    }
    if (has('version')) pub.version = String(typeof doc.version === 'number' ? doc.version : str('version', doc.version));
    if (has('doi')) {
      const d = str('doi', doc.doi);
      const doi = normalizeDoi(d);
      if (!doi) fail(`doi ${describeValue(d)} is not a DOI (10.<registrant>/<suffix>, e.g. 10.5281/zenodo.1234567)`);
      pub.doi = doi as string;
    }
    cfg.publication = pub;
  }

  if (has('passthrough')) {
    if (!isObj(doc.passthrough)) fail(`passthrough must be a mapping of file column names to unit, ucd and description, got ${describeValue(doc.passthrough)}`);
    const decl: Record<string, PassthroughDeclaration> = {};
    for (const [name, raw] of Object.entries(doc.passthrough as Obj)) {
      if (!isObj(raw)) fail(`passthrough.${name} must be a mapping with unit, ucd and/or description, got ${describeValue(raw)}`);
      const r = raw as Obj;
      checkKeys(r, ['unit', 'ucd', 'description'], `passthrough.${name}.`);
      const d: PassthroughDeclaration = {};
      if (r.unit !== undefined && r.unit !== null) {
        d.unit = str(`passthrough.${name}.unit`, r.unit);
        const why = unitProblem(d.unit);
        if (why) fail(`passthrough.${name}.unit: ${why}`);
      }
      if (r.ucd !== undefined && r.ucd !== null) {
        d.ucd = str(`passthrough.${name}.ucd`, r.ucd);
        const why = ucdProblem(d.ucd);
        if (why) fail(`passthrough.${name}.ucd: ${why}`);
      }
      if (r.description !== undefined && r.description !== null) d.description = str(`passthrough.${name}.description`, r.description);
      decl[name] = d;
    }
    cfg.passthrough = decl;
  }

  if (has('readings')) cfg.readings = validateReadingsConfig(doc.readings, fail);

  if (has('site')) {
    const site = doc.site;
    if (!isObj(site)) fail(`site must be a mapping with base, got ${describeValue(site)}`);
    checkKeys(site as Obj, ['base'], 'site.');
    const b = (site as Obj).base;
    if (b !== undefined && b !== null) cfg.site.base = normalizeBase(str('site.base', b));
  }

  if (has('survey')) cfg.survey = validateSurvey(doc.survey, fail);
  return cfg;
}

/** A site base path with exactly one leading and one trailing '/': '' → '/', 'census' → '/census/'. */
export function normalizeBase(base: string): string {
  const inner = base.trim().replace(/^\/+|\/+$/g, '');
  return inner === '' ? '/' : `/${inner}/`;
}
