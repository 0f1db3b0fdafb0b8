import type { DerivedObject, Measured, ObjectInputs, Percentiles } from '../../core/derive/types.ts';
import type { CatalogRow } from '../charts/types.ts';

const meanErr = (m: Measured | undefined): number | null => {
  if (!m) return null;
  const e = [m.errLo, m.errHi].filter((x): x is number => x !== undefined && x > 0);
  return e.length ? e.reduce((a, b) => a + b, 0) / e.length : null;
};

const pct = (p: Percentiles | null, base: string): Record<string, number | null> => ({
  [`${base}_p16`]: p?.p16 ?? null,
  [`${base}_p50`]: p?.p50 ?? null,
  [`${base}_p84`]: p?.p84 ?? null,
});

/**
 * A new object's inputs and derived values as a catalog row (the Parquet's snake_case columns),
 * so the charts, ranks and neighbours treat it like a catalog object.
 */
export function derivedRow(inputs: ObjectInputs, d: DerivedObject): CatalogRow {
  const mbh = pct(d.pct.logMbh, 'log_mbh');
  const lbol = pct(d.pct.logLbol, 'log_lbol');
  const edd = pct(d.pct.logEddRatio, 'log_edd_ratio');
  const seed = pct(d.pct.logMseed, 'log_mseed');
  const local = pct(d.pct.deltaLogMbhLocal, 'delta_log_mbh_local');
  const ha = inputs.lines.halpha;
  const hb = inputs.lines.hbeta;
  return {
    id: inputs.id,
    z: inputs.z,
    log_mstar: inputs.logMstar?.value ?? null,
    log_mstar_err: meanErr(inputs.logMstar),
    age_gyr: d.ageGyr,
    log_mbh: d.logMbh,
    ...mbh,
    log_lbol: d.logLbol,
    ...lbol,
    log_edd_ratio: d.logEddRatio,
    ...edd,
    p_super_eddington: d.pSuperEddington,
    log_mseed: d.logMseed,
    ...seed,
    delta_log_mbh_local: d.deltaLogMbhLocal,
    ...local,
    local_offset_sigma: d.localOffsetSigma,
    p_above_local: d.pAboveLocal,
    log_mbh_is_limit: d.isLimit.logMbh,
    log_lbol_is_limit: d.isLimit.logLbol,
    log_edd_ratio_is_limit: d.isLimit.logEddRatio,
    log_mseed_is_limit: d.isLimit.logMseed,
    lambda_req_is_limit: d.isLimit.lambdaReq,
    delta_log_mbh_local_is_limit: d.isLimit.deltaLogMbhLocal,
    fwhm_halpha: ha?.fwhmKms?.value ?? null,
    fwhm_halpha_err: meanErr(ha?.fwhmKms),
    log_lum_halpha: d.logLum.halpha ?? null,
    fwhm_hbeta: hb?.fwhmKms?.value ?? null,
    fwhm_hbeta_err: meanErr(hb?.fwhmKms),
    log_lum_hbeta: d.logLum.hbeta ?? null,
    flux_halpha_is_limit: ha?.fluxIsLimit ?? false,
    flags: d.flags.join(','),
  };
}
