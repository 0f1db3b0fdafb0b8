import type { DeriveSettings, DerivedObject, ObjectInputs } from '../derive/types.ts';
import type { Rng } from '../random/rng.ts';
import type { DrawBank } from '../random/drawBank.ts';
import { planObject } from '../derive/objectPlan.ts';
import type { Reading } from './reading.ts';
import type { ReadingFlagId } from './readingFlags.ts';
import { readingInputs, type ReadingObjectInputs } from './readingInputs.ts';
import { isIdentityReading, readingSettings } from './readingSettings.ts';

/** deriveObject's signature (src/core/derive/deriveObject.ts); injected so tests and workers pass theirs. */
export type DeriveObjectFn = (inputs: ObjectInputs, settings: DeriveSettings, random: Rng | DrawBank) => DerivedObject;

/** L_bol routes that multiply a λL5100 (measured, or from L(Hα) or L(Hβ)) by BC5100. */
const BC5100_ROUTES = new Set(['halpha', 'hbeta', 'bc5100']);

/**
 * Derives one object under a reading: its inputs transformed (core or deflated widths, dust
 * dropped), the settings overlaid, and, for line-based bolometric factors, BC5100 divided by the
 * factor of the line this object's L_bol comes from. Then the ordinary deriveObject runs with the
 * caller's random stream or bank of deviates: every reading of an object draws the same deviates
 * for the same measurement (a deflated or core width takes the measured width's), so shifts
 * between readings are paired draw by draw. Passing one bank to every reading of an object
 * gives the same results as passing each a fresh stream with the object's seed, and draws once. The reading's own
 * flags are merged into the result's (sorted), and `no_dust_correction` gives way to
 * `dust_off_by_reading` where the reading switched dust off.
 * @param inputs - the object's validated inputs, with core widths where the catalog has them.
 * @param base - the run's settings.
 * @param reading - the reading.
 * @param deriveObject - the derivation (src/core/derive/deriveObject.ts).
 * @param random - the object's random stream, freshly seeded from (seed, id), or its DrawBank.
 */
export function deriveUnderReading(
  inputs: ReadingObjectInputs,
  base: DeriveSettings,
  reading: Reading,
  deriveObject: DeriveObjectFn,
  random: Rng | DrawBank,
): DerivedObject {
  if (isIdentityReading(reading)) return deriveObject(inputs, base, random);
  const t = readingInputs(reading, inputs);
  let settings = readingSettings(reading, base);
  const flags = new Set<ReadingFlagId>(t.flags);
  const plan = planObject(t.inputs, settings);
  if (plan.mass) {
    const w = t.widths[plan.mass.line];
    if (w === 'core') flags.add('width_from_core');
    else if (w === 'core_fallback') flags.add('core_width_fallback');
    else if (w === 'deflated') flags.add('width_deflated');
  }
  const b = reading.bolometric;
  const route = plan.lbol?.route;
  if (route !== undefined && b.mode !== 'standard') {
    if (b.mode === 'line_factors' && (route === 'halpha' || route === 'hbeta')) {
      settings = { ...settings, bc5100: settings.bc5100 / (route === 'halpha' ? b.halpha : b.hbeta) };
    } else if (b.mode === 'line_factors' || !BC5100_ROUTES.has(route)) flags.add('lbol_route_unchanged');
  }
  const d = deriveObject(t.inputs, settings, random);
  const all = new Set<string>(d.flags);
  if (reading.dust === 'none') all.delete('no_dust_correction');
  for (const f of flags) all.add(f);
  return { ...d, flags: [...all].sort() };
}
