import { LINES, type LineId } from '../../core/derive/types.ts';
import { DEFAULT_EDDINGTON_RATIO_DISTRIBUTION } from '../../core/population/eddingtonRatioDistribution.ts';
import type { FluxLimit, SurveyField } from '../../core/population/surveySpec.ts';
import { converterFor } from './checkUnit.ts';
import { closestNames } from './closestNames.ts';
import type { SurveyConfig } from './SurveyConfig.ts';

type Obj = Record<string, unknown>;
const isObj = (v: unknown): v is Obj => typeof v === 'object' && v !== null && !Array.isArray(v);
const show = (v: unknown): string => (typeof v === 'string' ? JSON.stringify(v) : v === null || v === undefined ? 'nothing' : Array.isArray(v) ? 'a list' : typeof v === 'object' ? 'a mapping' : String(v));

/** Keys of the `survey:` block. */
export const SURVEY_KEYS = ['fields', 'field_column', 'wavelength_range_angstrom', 'min_fwhm_kms', 'min_snr', 'flux_unit', 'relation_fit', 'densities'] as const;
/** Keys of one `survey.fields[i]` entry. */
export const FIELD_KEYS = ['name', 'area_arcmin2', 'source_plane_area_arcmin2', 'limits'];
/** Keys of `survey.relation_fit`. */
/**
 * Sampler defaults: the run stops once the kept chain is 50 autocorrelation times long (checked every 100 steps),
 * at the latest after DEFAULT_STEP_CAP steps; the first DEFAULT_BURN steps are dropped (at most a quarter of the cap).
 */
export const DEFAULT_STEP_CAP = 4000;
export const DEFAULT_BURN = 300;

export const FIT_KEYS = ['eddington_ratio', 'mstar_range', 'walkers', 'steps', 'burn'];
/** Keys of `survey.densities`. */
export const DENSITY_KEYS = ['log_mbh_bins', 'log_lbol_bins', 'z_ranges'];

/**
 * Checks the `survey:` block (see README, "Space densities and the selection-aware relation"). `fail` throws the
 * config's one-line error; every message names the key path.
 */
export function validateSurvey(doc: unknown, fail: (msg: string) => never): SurveyConfig {
  if (!isObj(doc)) return fail(`survey must be a mapping (fields, wavelength_range_angstrom, ...), got ${show(doc)}`);
  const keys = (o: Obj, allowed: readonly string[], prefix: string): void => {
    for (const k of Object.keys(o)) {
      if (allowed.includes(k)) continue;
      const near = closestNames(k, allowed, 1)[0];
      fail(`unknown key "${prefix}${k}"` + (near ? ` (did you mean "${prefix}${near}"?)` : `; known: ${allowed.join(', ')}`));
    }
  };
  const positive = (key: string, v: unknown): number => (typeof v === 'number' && Number.isFinite(v) && v > 0 ? v : fail(`${key} must be a positive number, got ${show(v)}`));
  const nonNegative = (key: string, v: unknown): number => (typeof v === 'number' && Number.isFinite(v) && v >= 0 ? v : fail(`${key} must be a number of at least 0, got ${show(v)}`));
  const int = (key: string, v: unknown, lo: number, hi: number): number =>
    (typeof v === 'number' && Number.isInteger(v) && v >= lo && v <= hi ? v : fail(`${key} must be an integer from ${lo} to ${hi}, got ${show(v)}`));
  const pair = (key: string, v: unknown): [number, number] => {
    if (!Array.isArray(v) || v.length !== 2 || !v.every((x) => typeof x === 'number' && Number.isFinite(x)) || !((v[0] as number) < (v[1] as number))) {
      return fail(`${key} must be a list of two increasing numbers, got ${show(v)}`);
    }
    return [v[0] as number, v[1] as number];
  };
  const edges = (key: string, v: unknown): number[] => {
    if (!Array.isArray(v) || v.length < 2 || !v.every((x, i) => typeof x === 'number' && Number.isFinite(x) && (i === 0 || x > (v[i - 1] as number)))) {
      return fail(`${key} must be a list of at least two increasing numbers (bin edges), got ${show(v)}`);
    }
    return v as number[];
  };
  keys(doc, SURVEY_KEYS, 'survey.');

  let fluxScale = 1;
  if (doc.flux_unit !== undefined) {
    if (typeof doc.flux_unit !== 'string') fail(`survey.flux_unit must be a unit such as "1e-18 erg s-1 cm-2", got ${show(doc.flux_unit)}`);
    const conv = converterFor(doc.flux_unit as string, 'flux', 'survey.flux_unit');
    if ('problem' in conv) fail(`survey.flux_unit: ${conv.problem}`);
    else fluxScale = conv.convert(1);
  }

  const range = pair('survey.wavelength_range_angstrom', doc.wavelength_range_angstrom);
  if (range[0] <= 0) fail(`survey.wavelength_range_angstrom must be positive, got ${range[0]}`);
  const minFwhmKms = doc.min_fwhm_kms === undefined ? 0 : nonNegative('survey.min_fwhm_kms', doc.min_fwhm_kms);
  const minSnr = doc.min_snr === undefined ? 0 : nonNegative('survey.min_snr', doc.min_snr);

  if (!Array.isArray(doc.fields) || doc.fields.length === 0) fail(`survey.fields must be a non-empty list of fields (name, area_arcmin2, limits), got ${show(doc.fields)}`);
  const limitColumns: Partial<Record<LineId, string>> = {};
  const names = new Set<string>();
  const fields: SurveyField[] = (doc.fields as unknown[]).map((raw, i) => {
    const at = `survey.fields[${i}]`;
    if (!isObj(raw)) return fail(`${at} must be a mapping (name, area_arcmin2, limits), got ${show(raw)}`);
    keys(raw, FIELD_KEYS, `${at}.`);
    if (typeof raw.name !== 'string' || raw.name.trim() === '') return fail(`${at}.name must be the field's name, got ${show(raw.name)}`);
    if (names.has(raw.name)) fail(`${at}.name: field "${raw.name}" is listed twice`);
    names.add(raw.name);
    if (raw.area_arcmin2 === undefined) fail(`${at} (${raw.name}) has no area_arcmin2: a field's area is needed for its volume`);
    const areaArcmin2 = positive(`${at}.area_arcmin2`, raw.area_arcmin2);
    const src = raw.source_plane_area_arcmin2;
    if (src !== undefined) {
      positive(`${at}.source_plane_area_arcmin2`, src);
      if ((src as number) > areaArcmin2) fail(`${at}.source_plane_area_arcmin2 (${src}) is larger than the field's area (${areaArcmin2}); lensing shrinks the source plane`);
    }
    if (!isObj(raw.limits) || Object.keys(raw.limits).length === 0) return fail(`${at}.limits must map at least one line (${LINES.join(', ')}) to a limiting flux`);
    keys(raw.limits, LINES, `${at}.limits.`);
    const limits: Partial<Record<LineId, FluxLimit>> = {};
    for (const [line, v] of Object.entries(raw.limits) as [LineId, unknown][]) {
      const key = `${at}.limits.${line}`;
      if (typeof v === 'number') limits[line] = { kind: 'constant', fluxCgs: positive(key, v) * fluxScale };
      else if (isObj(v) && typeof v.column === 'string') {
        keys(v, ['column'], `${key}.`);
        if (limitColumns[line] !== undefined && limitColumns[line] !== v.column) fail(`${key}.column: one column per line for all fields (already "${limitColumns[line]}")`);
        limitColumns[line] = v.column;
        // The per-object value replaces this placeholder object by object (see populationInputs).
        limits[line] = { kind: 'constant', fluxCgs: Number.NaN };
      } else if (isObj(v)) {
        keys(v, ['wavelength_angstrom', 'flux'], `${key}.`);
        const lam = edges(`${key}.wavelength_angstrom`, v.wavelength_angstrom);
        const flux = v.flux;
        if (!Array.isArray(flux) || flux.length !== lam.length) fail(`${key}.flux must list one limit per wavelength (${lam.length}), got ${show(flux)}`);
        const fluxCgs = (flux as unknown[]).map((f, j) => positive(`${key}.flux[${j}]`, f) * fluxScale);
        limits[line] = { kind: 'table', lamObsAngstrom: lam, fluxCgs };
      } else {
        fail(`${key} must be a flux, { column: <name> } or { wavelength_angstrom: [...], flux: [...] }, got ${show(v)}`);
      }
    }
    return { name: raw.name, areaArcmin2, ...(src !== undefined ? { sourcePlaneAreaArcmin2: src as number } : {}), limits };
  });
  let fieldColumn: string | undefined;
  if (doc.field_column !== undefined) {
    if (typeof doc.field_column !== 'string' || doc.field_column.trim() === '') fail(`survey.field_column must be a column name, got ${show(doc.field_column)}`);
    fieldColumn = doc.field_column as string;
  } else if (fields.length > 1) {
    fail('survey.field_column is needed with more than one field: name the column that says which field each object is in');
  }

  const fitDoc = doc.relation_fit === undefined ? {} : doc.relation_fit;
  if (!isObj(fitDoc)) return fail(`survey.relation_fit must be a mapping, got ${show(fitDoc)}`);
  keys(fitDoc, FIT_KEYS, 'survey.relation_fit.');
  let eddingtonRatio = DEFAULT_EDDINGTON_RATIO_DISTRIBUTION;
  if (fitDoc.eddington_ratio !== undefined) {
    const e = fitDoc.eddington_ratio;
    if (!isObj(e)) return fail(`survey.relation_fit.eddington_ratio must be a mapping with mean_log and sigma_log, got ${show(e)}`);
    keys(e, ['mean_log', 'sigma_log'], 'survey.relation_fit.eddington_ratio.');
    const meanLog = e.mean_log === undefined ? eddingtonRatio.meanLog : (typeof e.mean_log === 'number' && e.mean_log >= -4 && e.mean_log <= 2 ? e.mean_log : fail(`survey.relation_fit.eddington_ratio.mean_log must be a number from -4 to 2, got ${show(e.mean_log)}`));
    const sigmaLog = e.sigma_log === undefined ? eddingtonRatio.sigmaLog : positive('survey.relation_fit.eddington_ratio.sigma_log', e.sigma_log);
    eddingtonRatio = { meanLog, sigmaLog, reference: 'set in the config' };
  }
  const mStarRange = fitDoc.mstar_range === undefined ? ([7, 12] as [number, number]) : pair('survey.relation_fit.mstar_range', fitDoc.mstar_range);
  const walkers = fitDoc.walkers === undefined ? 16 : int('survey.relation_fit.walkers', fitDoc.walkers, 8, 200);
  if (walkers % 2 !== 0) fail(`survey.relation_fit.walkers must be even, got ${walkers}`);
  const steps = fitDoc.steps === undefined ? DEFAULT_STEP_CAP : int('survey.relation_fit.steps', fitDoc.steps, 100, 100000);
  const burn = fitDoc.burn === undefined ? Math.min(DEFAULT_BURN, Math.floor(steps / 4)) : int('survey.relation_fit.burn', fitDoc.burn, 0, steps - 1);

  const dDoc = doc.densities === undefined ? {} : doc.densities;
  if (!isObj(dDoc)) return fail(`survey.densities must be a mapping, got ${show(dDoc)}`);
  keys(dDoc, DENSITY_KEYS, 'survey.densities.');
  const step = (a: number, b: number, s: number): number[] => Array.from({ length: Math.round((b - a) / s) + 1 }, (_, i) => a + i * s);
  const logMbhEdges = dDoc.log_mbh_bins === undefined ? step(5, 10, 0.5) : edges('survey.densities.log_mbh_bins', dDoc.log_mbh_bins);
  const logLbolEdges = dDoc.log_lbol_bins === undefined ? step(43, 47, 0.5) : edges('survey.densities.log_lbol_bins', dDoc.log_lbol_bins);
  let zRanges: [number, number][] = [];
  if (dDoc.z_ranges === undefined) zRanges = [[4, 6], [6, 8], [8, 11]];
  else if (!Array.isArray(dDoc.z_ranges) || dDoc.z_ranges.length === 0) fail(`survey.densities.z_ranges must be a list of [lo, hi] pairs, got ${show(dDoc.z_ranges)}`);
  else zRanges = (dDoc.z_ranges as unknown[]).map((r, i) => pair(`survey.densities.z_ranges[${i}]`, r));

  return {
    spec: { fields, lamObsRangeAngstrom: range, minFwhmKms, minSnr },
    ...(fieldColumn !== undefined ? { fieldColumn } : {}),
    limitColumns,
    fluxScale,
    fit: { eddingtonRatio, mStarRange, walkers, steps, burn },
    densities: { logMbhEdges, logLbolEdges, zRanges },
  };
}
