/**
 * The catalog's flags in words. Flags are short codes in the comma-separated `flags` column;
 * a reader should not need the code book to know what one means.
 */
import { FLAG_DESCRIPTIONS } from '../../core/derive/flags.ts';

/** Words for flags the core does not describe (older catalogs). The core's own descriptions come first. */
const FALLBACK: Record<string, string> = {
  invalid_input: 'Some inputs failed validation, so some quantities could not be derived.',
  mbh_upper_limit: 'The line flux is an upper limit, so the black-hole mass is an upper limit too.',
  no_host_mass: 'No host stellar mass (or velocity dispersion) is given, so there is no offset from the local relation.',
  calibration_out_of_range: 'The line luminosity or width lies outside the range of the calibrating sample: the mass is an extrapolation.',
  no_dust_correction: 'No attenuation or Balmer decrement is given, so the line luminosity is not corrected for dust.',
  l5100_from_halpha: 'The 5100 Å continuum is estimated from the broad Hα luminosity, not measured.',
  l5100_from_hbeta: 'The 5100 Å continuum is estimated from the broad Hβ luminosity, not measured.',
  lbol_upper_limit: 'The bolometric luminosity rests on an upper limit.',
  no_mass: 'No black-hole mass could be derived (no usable broad line).',
  no_lbol: 'No bolometric luminosity could be derived (no usable line or continuum).',
};

/** Words the site says instead of the core's (the site shows what the core's words point elsewhere for). */
const SITE_WORDS: Record<string, string> = {
  invalid_input: 'An input value failed validation; no quantity was derived. The rejected value and the reason are listed on the object page.',
};

/** The codes in a `flags` cell, in order, without blanks. */
export function splitFlags(cell: unknown): string[] {
  if (typeof cell !== 'string') return [];
  return cell.split(',').map((s) => s.trim()).filter(Boolean);
}

/** A sentence for one flag code; unknown codes say so rather than guess. */
export function flagText(code: string): string {
  return SITE_WORDS[code] ?? (FLAG_DESCRIPTIONS as Record<string, string>)[code] ?? FALLBACK[code] ?? 'No description is recorded for this flag.';
}
