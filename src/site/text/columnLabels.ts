/**
 * Short readable names of the catalog's columns, for table headers and object pages. The
 * column's own name is always shown too (it is what SQL uses); units come from the metadata.
 */
const LABELS: Record<string, string> = {
  id: 'Identifier',
  row: 'Input row',
  z: 'Redshift',
  ra: 'Right ascension',
  dec: 'Declination',
  mu: 'Magnification',
  log_mstar: 'Stellar mass',
  sigma_star: 'Stellar velocity dispersion',
  av: 'Attenuation A_V',
  balmer_decrement: 'Balmer decrement Hα/Hβ',
  age_gyr: 'Age of the universe',
  dl_mpc: 'Luminosity distance',
  log_l5100: 'Continuum λL(5100 Å)',
  log_mbh: 'Black-hole mass',
  mbh_method: 'Mass from',
  log_lbol: 'Bolometric luminosity',
  lbol_method: 'Bolometric correction',
  log_edd_ratio: 'Eddington ratio (log)',
  p_super_eddington: 'Probability above Eddington',
  log_mseed: 'Required seed mass',
  lambda_req_light: 'Eddington ratio a light seed needs',
  lambda_req_heavy: 'Eddington ratio a heavy seed needs',
  delta_log_mbh_local: 'Offset from the local relation',
  local_offset_sigma: 'Offset in σ',
  p_above_local: 'Probability above the local relation',
  flags: 'Flags',
};

const LINE: Record<string, string> = { halpha: 'Hα', hbeta: 'Hβ', mgii: 'Mg II', civ: 'C IV' };

/** A readable label for `column`, or the column name itself. */
export function columnLabel(column: string): string {
  if (LABELS[column]) return LABELS[column]!;
  let m = /^(fwhm|flux|lum)_(halpha|hbeta|mgii|civ)(_err|_err_lo|_err_hi|_is_limit)?$/.exec(column);
  if (m) {
    const what = m[1] === 'fwhm' ? 'FWHM' : m[1] === 'flux' ? 'Flux' : 'Luminosity';
    const suffix = m[3] === '_is_limit' ? ' is an upper limit' : m[3] === '_err' ? ' error' : m[3] === '_err_lo' ? ' lower error' : m[3] ? ' upper error' : '';
    return `${what} ${LINE[m[2]!]}${suffix}`;
  }
  if ((m = /^log_lum_(halpha|hbeta|mgii|civ)$/.exec(column))) return `${LINE[m[1]!]} luminosity (corrected)`;
  if ((m = /^lam_l_(\d+)(_err.*)?$/.exec(column))) return `Continuum λL(${m[1]} Å)${m[2] ? ' error' : ''}`;
  if ((m = /^(.+)_(err|err_lo|err_hi)$/.exec(column)) && LABELS[m[1]!]) return `${LABELS[m[1]!]} ${m[2] === 'err' ? 'error' : m[2] === 'err_lo' ? 'lower error' : 'upper error'}`;
  if ((m = /^(.+)_p(16|50|84)$/.exec(column)) && LABELS[m[1]!]) return `${LABELS[m[1]!]}, ${m[2]}th percentile`;
  return column;
}

const SUP: Record<string, string> = { '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '-': '⁻', '+': '' };

/**
 * Units written one way across the site: powers as superscripts with the minus sign, a space
 * between factors, log units as "log <unit>", solar masses as M☉. 'log(solMass)' → 'log M☉',
 * 'erg s-1' and 'erg/s' → 'erg s⁻¹', 'erg s-1 cm-2' → 'erg s⁻¹ cm⁻²', 'km/s' → 'km s⁻¹'.
 * '' for none.
 */
export function unitText(unit: string | undefined): string {
  if (!unit) return '';
  // VOUnits as the catalog writes them: dex(x) is log x, '.' joins factors, '**' marks a power.
  let u = unit.trim().replace(/^dex\((.*)\)$/, 'log($1)').replace(/\*\*/g, '').replace(/\.(?=[A-Za-z])/g, ' ');
  let log = '';
  const m = /^log(?:10)?\s*\((.*)\)$/.exec(u) ?? /^log(?:10)?\s+(.*)$/.exec(u);
  if (m) {
    log = 'log ';
    u = m[1]!;
  }
  u = u.replace(/solMass|Msun/g, 'M☉').replace(/solLum|Lsun/g, 'L☉');
  // a/b/c → a b⁻¹ c⁻¹
  const [head, ...divisors] = u.split('/');
  const parts = [head!.trim(), ...divisors.map((d) => d.trim() + '-1')].join(' ').split(/\s+/).filter(Boolean);
  const written = parts.map((p) => p.replace(/^([A-Za-zµμ☉Å]+)\^?([+-]?\d+)$/, (_, b: string, e: string) => b + [...e].map((c) => SUP[c] ?? c).join('')));
  return log + written.join(' ');
}
