import { splitFlags } from './flagText.ts';

/** The `<quantity>_is_limit` column that says whether a derived column is a bound. */
export const LIMIT_COLUMN: Readonly<Record<string, string>> = {
  log_mbh: 'log_mbh_is_limit',
  log_lbol: 'log_lbol_is_limit',
  log_edd_ratio: 'log_edd_ratio_is_limit',
  log_mseed: 'log_mseed_is_limit',
  lambda_req_light: 'lambda_req_is_limit',
  lambda_req_heavy: 'lambda_req_is_limit',
  delta_log_mbh_local: 'delta_log_mbh_local_is_limit',
  local_offset_sigma: 'delta_log_mbh_local_is_limit',
};

/** The flag that marks the same bound in catalogs written before the `_is_limit` columns. */
const UPPER_FLAG: Readonly<Record<string, string>> = {
  log_mbh: 'mbh_upper_limit',
  log_lbol: 'lbol_upper_limit',
  log_mseed: 'mbh_upper_limit',
  lambda_req_light: 'mbh_upper_limit',
  lambda_req_heavy: 'mbh_upper_limit',
  delta_log_mbh_local: 'mbh_upper_limit',
  local_offset_sigma: 'mbh_upper_limit',
};

/**
 * '<' where a derived column of `row` is an upper limit, '>' where it is a lower limit, ''
 * where it is a measurement: from the `_is_limit` columns, the Eddington ratio's direction
 * from its flags, and for older catalogs the flags alone; a line luminosity (and an L5100 made
 * from it) from the input's `flux_<line>_is_limit`. A bound is shown with its sign and
 * never with a 16–84 % interval.
 * @param column - a derived column name, e.g. 'log_mbh'.
 * @param row - the catalog row (column name → value).
 */
export function limitMark(column: string, row: Readonly<Record<string, unknown>>): '<' | '>' | '' {
  // A broad line's luminosity from an upper-limit flux is an upper limit; so is the L5100 made
  // from it when no continuum was measured (derived from Hα when there is Hα, else from Hβ).
  const lum = /^log_lum_(halpha|hbeta|mgii|civ)$/.exec(column);
  if (lum) return row[`flux_${lum[1]}_is_limit`] === true ? '<' : '';
  if (column === 'log_l5100') {
    if (row.lam_l_5100 !== null && row.lam_l_5100 !== undefined) return '';
    const from = row.log_lum_halpha !== null && row.log_lum_halpha !== undefined ? 'halpha' : 'hbeta';
    return row[`flux_${from}_is_limit`] === true ? '<' : '';
  }
  const flags = splitFlags(row.flags);
  if (column === 'log_edd_ratio') {
    if (flags.includes('edd_ratio_lower_limit')) return '>';
    if (flags.includes('edd_ratio_upper_limit')) return '<';
    // a bound without its direction flag is an upper limit, as every other bound
    return row.log_edd_ratio_is_limit === true ? '<' : '';
  }
  const col = LIMIT_COLUMN[column];
  if (!col) return '';
  const marked = row[col];
  if (marked === true) return '<';
  if (marked === undefined || marked === null) return flags.includes(UPPER_FLAG[column] ?? '') ? '<' : '';
  return '';
}
