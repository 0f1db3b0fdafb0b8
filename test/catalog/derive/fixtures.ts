import { defaultSettings } from '../../../src/catalog/config/defaultConfig.ts';
import type { DeriveSettings, ObjectInputs } from '../../../src/core/derive/types.ts';

/** URL of the test stand-in for deriveObject. */
export const STAND_IN = new URL('./standIns/deriveObjectStandIn.ts', import.meta.url).href;
/** URL of a stand-in that stalls on the id STALL and exits its worker on the id EXIT. */
export const MISBEHAVING = new URL('./standIns/misbehavingDeriveModule.ts', import.meta.url).href;
/** URL of a module that exports no deriveObject. */
export const BROKEN = new URL('./standIns/brokenDeriveModule.ts', import.meta.url).href;

/** Default settings with few draws, for fast tests. */
export function testSettings(draws = 50): DeriveSettings {
  return { ...defaultSettings(), draws, seed: 7 };
}

/** `n` simple objects with a broad Hα width (one in 5 without lines). */
export function someInputs(n: number, prefix = 'obj'): ObjectInputs[] {
  return Array.from({ length: n }, (_, i) => ({
    id: `${prefix}-${i}`,
    z: 4 + (i % 7) * 0.5,
    lines: i % 5 === 4 ? {} : { halpha: { fwhmKms: { value: 1000 + 37 * i, errLo: 100, errHi: 100 } } },
  }));
}
