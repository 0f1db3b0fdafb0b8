/**
 * Flags that change how a number should be read: it is a bound rather than a measurement, an
 * extrapolation beyond the calibrating sample, or rests on an estimated or substituted input
 * or a corrected one with its own uncertainty. The overview's headline counts objects carrying
 * one of these. Flags that only say a quantity is absent (no_mass, no_host_mass, …), which
 * method was used (lbol_fallback, mass_line_fallback), or what holds for nearly every object
 * (no_dust_correction, shown with its own count) are left out so the count says something.
 */
import type { FlagId } from '../../core/derive/flags.ts';

export const READING_FLAGS: readonly FlagId[] = [
  'mbh_upper_limit',
  'lbol_upper_limit',
  'edd_ratio_upper_limit',
  'edd_ratio_lower_limit',
  'edd_ratio_unconstrained',
  'calibration_out_of_range',
  'local_relation_extrapolated',
  'bulge_mass_from_total',
  'l5100_from_hbeta',
  'lensed',
  'low_snr',
];

/** True when `flag` changes how one of the object's numbers should be read. */
export function isReadingFlag(flag: string): boolean {
  return (READING_FLAGS as readonly string[]).includes(flag);
}
