import type { LineId } from '../../core/derive/types.ts';
import { VO_LOG_LUMINOSITY, VO_UNITS } from '../../core/units/index.ts';
import type { LIMIT_KEYS, PackedField } from '../derive/packedDerived.ts';
import type { ColumnDoc } from './columnDoc.ts';

/** Which part of the settings a derived column's reference comes from (see derivedReference.ts). */
export type ReferenceTopic =
  | 'cosmology'
  | 'lineLuminosity'
  | 'continuum'
  | 'virial'
  | 'bolometric'
  | 'eddington'
  | 'growth'
  | 'local';

/** A derived output column: its documentation and the field of `DerivedObject` it holds. */
export interface DerivedColumnSpec extends Omit<ColumnDoc, 'group' | 'reference'> {
  source: PackedField | 'mbhMethod' | 'lbolMethod' | 'flags';
  topic?: ReferenceTopic;
}

const LOG_LUM = VO_LOG_LUMINOSITY;
const LOG_MASS = VO_UNITS.logMass;
const DEX = VO_UNITS.logDimensionless;

const LINE_LABEL: Record<LineId, { label: string; ucd: string }> = {
  halpha: { label: 'broad Hα', ucd: 'phys.luminosity;em.line.Halpha' },
  hbeta: { label: 'broad Hβ', ucd: 'phys.luminosity;em.line.Hbeta' },
  mgii: { label: 'broad Mg II λ2798', ucd: 'phys.luminosity;em.line' },
  civ: { label: 'broad C IV λ1549', ucd: 'phys.luminosity;em.line' },
};

/** The `log_lum_<line>` column of one line. */
export function lineLuminosityColumn(line: LineId): DerivedColumnSpec {
  const { label, ucd } = LINE_LABEL[line];
  return {
    name: `log_lum_${line}`,
    kind: 'float',
    unit: LOG_LUM,
    description: `log10 of the ${label} luminosity after magnification and dust corrections (nominal inputs)`,
    ucd,
    source: `logLum.${line}`,
    topic: 'lineLuminosity',
  };
}

const f = (
  name: string,
  source: PackedField,
  unit: string,
  description: string,
  ucd: string | undefined,
  topic: ReferenceTopic | undefined,
): DerivedColumnSpec => ({ name, kind: 'float', unit, description, source, ...(ucd ? { ucd } : {}), ...(topic ? { topic } : {}) });

/** Derived columns before the per-line luminosities. */
export const DERIVED_HEAD: readonly DerivedColumnSpec[] = [
  f('age_gyr', 'ageGyr', 'Gyr', 'Age of the universe at the redshift of the object', 'time.age', 'cosmology'),
  f('dl_mpc', 'dlMpc', 'Mpc', 'Luminosity distance', 'pos.distance', 'cosmology'),
];

const limitColumn = (name: string, q: (typeof LIMIT_KEYS)[number], what: string): DerivedColumnSpec => ({
  name,
  kind: 'bool',
  description: `True where ${what} is a bound, not a measurement (it rests on an upper-limit flux); its percentiles are then empty`,
  ucd: 'meta.code.qual',
  source: `isLimit.${q}`,
});

/** `<quantity>_is_limit` columns, written beside the flags. */
export const LIMIT_COLUMNS: readonly DerivedColumnSpec[] = [
  limitColumn('log_mbh_is_limit', 'logMbh', 'log_mbh (an upper limit)'),
  limitColumn('log_lbol_is_limit', 'logLbol', 'log_lbol (an upper limit)'),
  limitColumn('log_edd_ratio_is_limit', 'logEddRatio', 'log_edd_ratio (upper or lower: see the flags edd_ratio_upper_limit, edd_ratio_lower_limit)'),
  limitColumn('log_mseed_is_limit', 'logMseed', 'log_mseed (an upper limit)'),
  limitColumn('lambda_req_is_limit', 'lambdaReq', 'lambda_req_light and lambda_req_heavy (upper limits)'),
  limitColumn('delta_log_mbh_local_is_limit', 'deltaLogMbhLocal', 'delta_log_mbh_local and local_offset_sigma (upper limits)'),
];

/** Derived columns after the per-line luminosities, in output order. */
export const DERIVED_TAIL: readonly DerivedColumnSpec[] = [
  f('log_l5100', 'logL5100', LOG_LUM, 'log10 of the continuum λL_λ at 5100 Å (measured, or from broad Hα), magnification-corrected', 'phys.luminosity;em.opt', 'continuum'),
  f('log_mbh', 'logMbh', LOG_MASS, 'log10 of the virial black-hole mass from the first line of the line priority that is measured (nominal inputs)', 'phys.mass', 'virial'),
  { name: 'mbh_method', kind: 'string', description: 'Line and calibration that gave log_mbh', ucd: 'meta.code', source: 'mbhMethod' },
  f('log_lbol', 'logLbol', LOG_LUM, 'log10 of the bolometric luminosity', 'phys.luminosity', 'bolometric'),
  { name: 'lbol_method', kind: 'string', description: 'Bolometric correction that gave log_lbol', ucd: 'meta.code', source: 'lbolMethod' },
  f('log_edd_ratio', 'logEddRatio', DEX, 'log10 of the Eddington ratio L_bol / L_Edd', 'phys.luminosity;arith.ratio', 'eddington'),
  f('p_super_eddington', 'pSuperEddington', '', 'Monte Carlo probability that the Eddington ratio exceeds 1 (empty when log_edd_ratio is a bound or unconstrained)', 'stat.probability', 'eddington'),
  f('log_mseed', 'logMseed', LOG_MASS, 'log10 of the seed mass at z_seed that grows to the black-hole mass at the assumed Eddington ratio, efficiency and duty cycle', 'phys.mass', 'growth'),
  f('lambda_req_light', 'lambdaReqLight', '', 'Constant Eddington ratio a light seed needs to grow into the black hole by the observed redshift', 'phys.luminosity;arith.ratio', 'growth'),
  f('lambda_req_heavy', 'lambdaReqHeavy', '', 'Constant Eddington ratio a heavy seed needs to grow into the black hole by the observed redshift', 'phys.luminosity;arith.ratio', 'growth'),
  f('delta_log_mbh_local', 'deltaLogMbhLocal', DEX, 'Offset of log_mbh from the local scaling relation at the host stellar mass or velocity dispersion', 'phys.mass;arith.diff', 'local'),
  f('local_offset_sigma', 'localOffsetSigma', '', "delta_log_mbh_local divided by the relation's intrinsic scatter and the offset's measurement spread (half its 16–84 % width) in quadrature", 'stat.fit.residual;phys.mass', 'local'),
  f('p_above_local', 'pAboveLocal', '', "Monte Carlo probability that the black hole lies above a local black hole of the same host quantity: the relation's intrinsic scatter is included, as in local_offset_sigma (empty when the offset is a bound)", 'stat.probability', 'local'),
  ...LIMIT_COLUMNS,
  {
    name: 'flags',
    kind: 'string',
    // No quote characters: astropy 5.2 misreads a doubled quote in a FITS long-string header (TCOMMn).
    description: 'Comma-separated flags (empty when none), e.g. invalid_input, mbh_upper_limit, no_host_mass, calibration_out_of_range, no_dust_correction',
    ucd: 'meta.code.qual',
    source: 'flags',
  },
];

const PERCENTILE_OF: readonly { base: string; field: 'logMbh' | 'logLbol' | 'logEddRatio' | 'logMseed' | 'deltaLogMbhLocal'; unit: string; ucd: string; what: string; topic: ReferenceTopic }[] = [
  { base: 'log_mbh', field: 'logMbh', unit: LOG_MASS, ucd: 'phys.mass', what: 'log_mbh', topic: 'virial' },
  { base: 'log_lbol', field: 'logLbol', unit: LOG_LUM, ucd: 'phys.luminosity', what: 'log_lbol', topic: 'bolometric' },
  { base: 'log_edd_ratio', field: 'logEddRatio', unit: DEX, ucd: 'phys.luminosity;arith.ratio', what: 'log_edd_ratio', topic: 'eddington' },
  { base: 'log_mseed', field: 'logMseed', unit: LOG_MASS, ucd: 'phys.mass', what: 'log_mseed', topic: 'growth' },
  { base: 'delta_log_mbh_local', field: 'deltaLogMbhLocal', unit: DEX, ucd: 'phys.mass;arith.diff', what: 'delta_log_mbh_local', topic: 'local' },
];

/**
 * Monte Carlo percentile columns `<q>_p16`, `<q>_p50`, `<q>_p84`: the median takes `stat.median`,
 * the others `stat.percentile` (UCD1+ 1.5), after the quantity's own words.
 */
export const DERIVED_PERCENTILES: readonly DerivedColumnSpec[] = PERCENTILE_OF.flatMap(({ base, field, unit, ucd, what, topic }) =>
  (['p16', 'p50', 'p84'] as const).map((p) =>
    f(
      `${base}_${p}`,
      `pct.${field}.${p}`,
      unit,
      `${p.slice(1)}th percentile of the Monte Carlo distribution of ${what} (measurement errors and intrinsic scatter; empty when ${what} is a bound)`,
      p === 'p50' ? `${ucd};stat.median` : `${ucd};stat.percentile`,
      topic,
    ),
  ),
);

/** Every derived column for a catalog that measures `lines`, in output order. */
export function derivedColumnSpecs(lines: readonly LineId[]): DerivedColumnSpec[] {
  return [...DERIVED_HEAD, ...lines.map(lineLuminosityColumn), ...DERIVED_TAIL, ...DERIVED_PERCENTILES];
}
