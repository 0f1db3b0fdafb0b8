import type { Reading } from '../../core/readings/reading.ts';
import { BUILT_IN_READINGS, builtInReading } from '../../core/readings/builtInReadings.ts';
import { parseReadingSpec, ReadingSpecError } from '../../core/readings/parseReadingSpec.ts';

/** Which readings a run derives, and which of them fills the main catalog. */
export interface ReadingsConfig {
  /** Id of the reading the main catalog is derived under (default 'standard'). */
  primary: string;
  /** Every reading of the readings table, in display order (the built-ins, then custom ones, unless `use` says otherwise). */
  readings: Reading[];
}

/** The readings of a run whose config names none: the four built-ins, primary 'standard'. */
export function defaultReadingsConfig(): ReadingsConfig {
  return { primary: 'standard', readings: [...BUILT_IN_READINGS] };
}

/** Keys of the config's `readings:` block. */
export const READINGS_KEYS = ['primary', 'use', 'custom'] as const;
const KEYS = READINGS_KEYS;
const show = (v: unknown): string => (typeof v === 'string' ? JSON.stringify(v) : Array.isArray(v) ? 'a list' : v && typeof v === 'object' ? 'a mapping' : String(v));

/**
 * Reads the config's `readings:` key: `primary` (an id), `use` (ids, in display order) and
 * `custom` (a list of custom readings, see parseReadingSpec). `fail` turns a one-line message
 * (starting with the key path) into the config error.
 */
export function validateReadingsConfig(raw: unknown, fail: (msg: string) => never): ReadingsConfig {
  const cfg = defaultReadingsConfig();
  if (raw === null || raw === undefined) return cfg;
  if (typeof raw !== 'object' || Array.isArray(raw)) return fail(`readings must be a mapping with primary, use and custom, got ${show(raw)}`);
  const o = raw as Record<string, unknown>;
  for (const k of Object.keys(o)) if (!(KEYS as readonly string[]).includes(k)) fail(`unknown key "readings.${k}"; known: ${KEYS.join(', ')}`);
  const custom: Reading[] = [];
  if (o.custom !== undefined && o.custom !== null) {
    if (!Array.isArray(o.custom)) fail(`readings.custom must be a list of readings, got ${show(o.custom)}`);
    (o.custom as unknown[]).forEach((spec, i) => {
      try {
        const r = parseReadingSpec(spec, `readings.custom[${i}]`);
        if (builtInReading(r.id) || custom.some((c) => c.id === r.id)) fail(`readings.custom[${i}].id "${r.id}" is already taken`);
        custom.push(r);
      } catch (error) {
        if (error instanceof ReadingSpecError) fail(error.message);
        throw error;
      }
    });
  }
  const all = [...BUILT_IN_READINGS, ...custom];
  const known = all.map((r) => r.id);
  let readings = all;
  if (o.use !== undefined && o.use !== null) {
    if (!Array.isArray(o.use) || o.use.length === 0) fail(`readings.use must be a non-empty list of reading ids, got ${show(o.use)}`);
    readings = (o.use as unknown[]).map((id, i) => {
      const r = all.find((x) => x.id === id);
      if (!r) return fail(`readings.use[${i}]: unknown reading ${show(id)}; known: ${known.join(', ')}`);
      if ((o.use as unknown[]).indexOf(id) !== i) fail(`readings.use lists "${String(id)}" twice`);
      return r;
    });
  }
  if (o.primary !== undefined && o.primary !== null) {
    if (typeof o.primary !== 'string' || !readings.some((r) => r.id === o.primary)) {
      fail(`readings.primary: unknown reading ${show(o.primary)}; known: ${readings.map((r) => r.id).join(', ')}`);
    }
    cfg.primary = o.primary as string;
  } else if (!readings.some((r) => r.id === 'standard')) cfg.primary = readings[0]!.id;
  cfg.readings = readings;
  return cfg;
}
