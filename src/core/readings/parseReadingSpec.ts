import { LINES, type LineId } from '../derive/types.ts';
import { CALIBRATIONS } from '../virial/calibrations.ts';
import { GREENE25_L5100_RATIO, YANAGISAWA26_LINE_FACTORS } from '../bolometric/smallCorrections.ts';
import type { BolometricChoice, Reading, WidthChoice } from './reading.ts';
import { READING_LIMITS, inReadingLimit, type ReadingLimitKey } from './readingLimits.ts';
import { SCATTERING_DEFLATION } from './builtInReadings.ts';

/** A problem with a reading's description; the message is one line naming the key. */
export class ReadingSpecError extends Error {
  override name = 'ReadingSpecError';
}

/** Keys a custom reading may have. */
export const READING_SPEC_KEYS = [
  'id', 'label', 'premise', 'references', 'calibrations', 'width', 'deflation', 'bolometric', 'l5100_ratio', 'dust', 'efficiency', 'duty_cycle',
] as const;

/** Named bolometric choices a custom reading may take. */
export const READING_BOLOMETRIC_IDS = ['standard', 'greene25_l5100', 'yanagisawa26_lines'] as const;

type Obj = Record<string, unknown>;
const show = (v: unknown): string => (typeof v === 'string' ? JSON.stringify(v) : Array.isArray(v) ? 'a list' : v && typeof v === 'object' ? 'a mapping' : String(v));

/**
 * Reads a custom reading from its plain description (a config file's `readings.custom[i]`, or the
 * browser's form), checking every key: unknown keys, unknown ids and numbers outside
 * READING_LIMITS stop with a one-line ReadingSpecError naming `<at>.<key>`.
 * @param spec - the description (snake_case keys; see README "Readings").
 * @param at - where it sits, for messages (e.g. 'readings.custom[0]').
 */
export function parseReadingSpec(spec: unknown, at: string): Reading {
  const fail = (msg: string): never => {
    throw new ReadingSpecError(`${at}${msg}`);
  };
  if (!spec || typeof spec !== 'object' || Array.isArray(spec)) return fail(` must be a mapping, got ${show(spec)}`);
  const o = spec as Obj;
  for (const k of Object.keys(o)) {
    if (!(READING_SPEC_KEYS as readonly string[]).includes(k)) fail(`: unknown key "${k}"; known: ${READING_SPEC_KEYS.join(', ')}`);
  }
  const has = (k: string): boolean => o[k] !== undefined && o[k] !== null;
  const text = (k: string, required: boolean): string | undefined => {
    if (!has(k)) return required ? fail(`.${k} is required`) : undefined;
    if (typeof o[k] !== 'string' || (o[k] as string).trim() === '') return fail(`.${k} must be a non-empty string, got ${show(o[k])}`);
    return (o[k] as string).trim();
  };
  const num = (k: string, limit: ReadingLimitKey): number | undefined => {
    if (!has(k)) return undefined;
    const x = o[k];
    const r = READING_LIMITS[limit];
    if (typeof x !== 'number' || !inReadingLimit(limit, x)) return fail(`.${k} must be a number between ${r.min} and ${r.max} (${r.reason}), got ${show(x)}`);
    return x;
  };

  const id = text('id', true)!;
  if (!/^[a-z][a-z0-9_]{0,39}$/.test(id)) fail(`.id must be lower-case letters, digits and '_' (at most 40, starting with a letter), got ${show(id)}`);
  const references: string[] = [];
  if (!has('references')) fail('.references is required: name the paper the reading rests on');
  const refs = Array.isArray(o.references) ? o.references : [o.references];
  refs.forEach((r, i) => {
    if (typeof r !== 'string' || r.trim() === '') fail(`.references[${i}] must be a non-empty string, got ${show(r)}`);
    references.push((r as string).trim());
  });

  const calibrations: Partial<Record<LineId, string>> = {};
  if (has('calibrations')) {
    const c = o.calibrations;
    if (!c || typeof c !== 'object' || Array.isArray(c)) fail(`.calibrations must be a mapping of line to calibration, got ${show(c)}`);
    for (const [line, v] of Object.entries(c as Obj)) {
      if (!(LINES as readonly string[]).includes(line)) fail(`.calibrations: unknown line "${line}"; known: ${LINES.join(', ')}`);
      const known = Object.values(CALIBRATIONS).filter((cal) => cal.line === line).map((cal) => cal.id);
      if (typeof v !== 'string' || !known.includes(v)) fail(`.calibrations.${line}: unknown calibration ${show(v)}; known: ${known.join(', ')}`);
      calibrations[line as LineId] = v as string;
    }
  }

  const deflation = num('deflation', 'deflation');
  const widthMode = has('width') ? o.width : deflation !== undefined ? 'deflated' : 'measured';
  let width: WidthChoice;
  if (widthMode === 'measured') {
    if (deflation !== undefined) fail('.deflation is set but width is "measured"; use width "deflated" or "core"');
    width = { mode: 'measured' };
  } else if (widthMode === 'deflated') {
    if (deflation === undefined) fail('.deflation is required when width is "deflated"');
    width = { mode: 'deflated', deflation: deflation!, deflationSource: `${id} (custom reading); range from ${SCATTERING_DEFLATION.source}` };
  } else if (widthMode === 'core') {
    width = {
      mode: 'core',
      fallbackDeflation: deflation ?? SCATTERING_DEFLATION.factor,
      deflationSource: deflation !== undefined ? `${id} (custom reading)` : SCATTERING_DEFLATION.source,
    };
  } else return fail(`.width: unknown width ${show(widthMode)}; known: measured, core, deflated`);

  const ratio = num('l5100_ratio', 'l5100Ratio');
  let bolometric: BolometricChoice = { mode: 'standard' };
  if (has('bolometric')) {
    if (ratio !== undefined) fail('.l5100_ratio and .bolometric both set; give one');
    const b = o.bolometric;
    if (b === 'greene25_l5100') bolometric = { mode: 'l5100_ratio', ratio: GREENE25_L5100_RATIO.ratio, source: GREENE25_L5100_RATIO.reference };
    else if (b === 'yanagisawa26_lines') {
      const y = YANAGISAWA26_LINE_FACTORS;
      bolometric = { mode: 'line_factors', halpha: y.halpha, hbeta: y.hbeta, source: y.reference };
    } else if (b !== 'standard') fail(`.bolometric: unknown bolometric choice ${show(b)}; known: ${READING_BOLOMETRIC_IDS.join(', ')}`);
  } else if (ratio !== undefined) bolometric = { mode: 'l5100_ratio', ratio, source: `${id} (custom reading)` };

  const dust = has('dust') ? o.dust : 'standard';
  if (dust !== 'standard' && dust !== 'none') fail(`.dust: unknown dust choice ${show(dust)}; known: standard, none`);
  const efficiency = num('efficiency', 'efficiency');
  const dutyCycle = num('duty_cycle', 'dutyCycle');
  return {
    id,
    label: text('label', false) ?? id,
    premise: text('premise', true)!,
    references,
    calibrations,
    width,
    bolometric,
    dust: dust as 'standard' | 'none',
    growth: { ...(efficiency !== undefined ? { efficiency } : {}), ...(dutyCycle !== undefined ? { dutyCycle } : {}) },
  };
}
