/**
 * The flags deriveObject (and the catalog build) attach to an object, with the sentence a
 * reader sees for each. Catalog columns hold the ids, comma-separated; the site explains
 * them with these words.
 */
export const FLAG_DESCRIPTIONS = {
  invalid_input: 'An input value failed validation; no quantity was derived (see the rejection report).',
  mass_line_fallback: 'A line earlier in the priority list has a width but not the luminosity its calibration needs; the mass comes from a later line (see mbh_method).',
  measured_over_limit: 'An upper-limit flux came earlier in the order of preference; a measured line or continuum gave the mass or L_bol instead (see mbh_method, lbol_method).',
  no_mass: 'No broad line had both a width and the luminosity its calibration needs: no black-hole mass.',
  no_lbol: 'No luminosity the bolometric methods can use: no bolometric luminosity.',
  lbol_fallback: 'The configured bolometric method lacked its input; another method was used (see lbol_method).',
  mbh_upper_limit: 'The black-hole mass is an upper limit: it rests on an upper-limit line flux.',
  lbol_upper_limit: 'The bolometric luminosity is an upper limit: it rests on an upper-limit flux.',
  edd_ratio_upper_limit: 'The Eddington ratio is an upper limit.',
  edd_ratio_lower_limit: 'The Eddington ratio is a lower limit (measured luminosity over an upper-limit mass).',
  edd_ratio_unconstrained: 'Mass and bolometric luminosity rest on two different upper-limit fluxes: the Eddington ratio is not bounded either way, so it is left empty.',
  l5100_from_hbeta: 'The 5100 Å luminosity for the Hβ mass or for L_bol was estimated from L(Hβ) (Greene & Ho 2005 eq. 2 inverted, 0.2–0.4 dex uncertain at L(Hβ) ≤ 1e42 erg/s).',
  balmer_from_line_fluxes: 'The Balmer decrement equals the ratio of the broad Hα and Hβ fluxes given: it was formed draw by draw from those fluxes, so their errors are counted once.',
  local_relation_mass_scale: 'The local relation was fitted to black-hole masses on another scale than the calibration of this mass (another virial factor, or dynamical masses): the offset mixes the two scales.',
  implausible: 'A derived value fell outside physical bounds (log M_BH 2–12, log L_bol 38–50) or outside its own 16–84 % interval: it and the values built on it are left empty.',
  calibration_out_of_range: 'Luminosity or width lies outside the range of the virial calibration sample: the mass is an extrapolation.',
  no_dust_correction: 'No A_V or Balmer decrement was given: luminosities are not corrected for dust.',
  balmer_below_intrinsic: 'The Balmer decrement is below its intrinsic value: no dust correction was applied.',
  lensed: 'The object is gravitationally lensed: luminosities were divided by the magnification.',
  no_host_mass: 'No host measurement for the local relation: no offset from it.',
  bulge_mass_from_total: 'The local relation takes a bulge mass; the total stellar mass was used in its place.',
  local_relation_extrapolated: 'The host quantity lies outside the range of the local relation sample.',
  z_above_seed_redshift: 'The object lies at or above the seed redshift: no seed mass or growth rate.',
  low_snr: 'A measurement used has signal-to-noise below 2: its Monte Carlo draws are truncated at zero.',
} as const;

export type FlagId = keyof typeof FLAG_DESCRIPTIONS;
