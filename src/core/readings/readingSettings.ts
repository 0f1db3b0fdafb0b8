import type { DeriveSettings } from '../derive/types.ts';
import type { Reading } from './reading.ts';

/**
 * The settings of a derivation under `reading`: the run's settings with the reading's
 * calibrations, radiative efficiency, duty cycle and (for an L_bol/λL5100 reading) BC5100 laid
 * over them. Per-object parts (the line-based L_bol factors) are applied by deriveUnderReading.
 * @param reading - the reading.
 * @param base - the run's settings.
 */
export function readingSettings(reading: Reading, base: DeriveSettings): DeriveSettings {
  const b = reading.bolometric;
  return {
    ...base,
    calibrations: { ...base.calibrations, ...reading.calibrations },
    efficiency: reading.growth.efficiency ?? base.efficiency,
    dutyCycle: reading.growth.dutyCycle ?? base.dutyCycle,
    bc5100: b.mode === 'l5100_ratio' ? b.ratio : base.bc5100,
  };
}

/** True when the reading changes nothing: its results are the run's own. */
export function isIdentityReading(reading: Reading): boolean {
  return (
    Object.keys(reading.calibrations).length === 0 &&
    reading.width.mode === 'measured' &&
    reading.bolometric.mode === 'standard' &&
    reading.dust === 'standard' &&
    reading.growth.efficiency === undefined &&
    reading.growth.dutyCycle === undefined
  );
}
