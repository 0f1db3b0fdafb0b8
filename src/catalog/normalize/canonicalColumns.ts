import { LINES, type LineId } from '../../core/derive/types.ts';
import { VO_UNITS, type QuantityKind } from '../../core/units/index.ts';

/** What a canonical column holds: a physical quantity (converted with src/core/units), text or a flag. */
export type CanonicalKind = QuantityKind | 'text' | 'bool';

/** A bound a value must satisfy; `reason` is what the row problem says when it does not. */
export interface ValueLimit {
  op: '>' | '>=' | '<=';
  bound: number;
  reason: string;
}

/** One canonical input column: what the census reads from a group's catalog. */
export interface CanonicalColumn {
  /** Canonical name, as used in the config's `columns:` and in the output. */
  name: string;
  kind: CanonicalKind;
  /** Canonical unit (what values are converted to), spelled in VOUnits as written to output files (the units module's VO_UNITS); '' where dimensionless, text or a flag. */
  unit: string;
  /** The canonical unit as people write it, shown in row messages when the file gives no unit ('km/s', 'erg/s'). */
  unitText: string;
  description: string;
  /** IVOA UCD1+ word(s), where the list has one. */
  ucd?: string;
  /** 'id' and 'z' are required; 'value' is a measurement; 'error' a 1σ error; 'flag' a boolean. */
  role: 'id' | 'value' | 'error' | 'flag';
  /** For 'error' and 'flag' columns: the measured column they belong to. */
  of?: string;
  /** For 'error' columns: symmetric (`_err`), lower (`_err_lo`) or upper (`_err_hi`). */
  side?: 'both' | 'lo' | 'hi';
  /** Checks every non-empty value must pass, in canonical units, in order. */
  limits: readonly ValueLimit[];
}

const POSITIVE: readonly ValueLimit[] = [{ op: '>', bound: 0, reason: 'must be positive' }];
const NON_NEGATIVE: readonly ValueLimit[] = [{ op: '>=', bound: 0, reason: 'must not be negative' }];
const between = (lo: number, hi: number, loOp: '>' | '>=' = '>='): ValueLimit[] => [
  { op: loOp, bound: lo, reason: `must be between ${lo} and ${hi}` },
  { op: '<=', bound: hi, reason: `must be between ${lo} and ${hi}` },
];

/** Largest broad-line FWHM accepted, km/s: wider is taken as a unit or typing mistake (common practice, no source). */
export const MAX_FWHM_KMS = 30000;

const LINE_LABEL: Record<LineId, string> = { halpha: 'Hα', hbeta: 'Hβ', mgii: 'Mg II λ2798', civ: 'C IV λ1549' };

interface BaseColumn {
  name: string;
  kind: CanonicalKind;
  /** Readable canonical unit; the VOUnits form comes from the kind. */
  unitText: string;
  description: string;
  ucd?: string;
  limits: readonly ValueLimit[];
  /** Has `_err`, `_err_lo`, `_err_hi` companions. */
  measured: boolean;
  /** Has an `_is_limit` companion. */
  limitFlag?: boolean;
}

const lineColumns = (line: LineId): BaseColumn[] => [
  {
    name: `fwhm_${line}`,
    kind: 'velocity',
    unitText: 'km/s',
    description: `FWHM of the broad ${LINE_LABEL[line]} line`,
    ucd: 'spect.line.width',
    limits: [...POSITIVE, { op: '<=', bound: MAX_FWHM_KMS, reason: `must be at most ${MAX_FWHM_KMS} km/s` }],
    measured: true,
  },
  {
    name: `fwhm_${line}_core`,
    kind: 'velocity',
    unitText: 'km/s',
    description: `Intrinsic core FWHM of the broad ${LINE_LABEL[line]} line, where the group measured one (used by readings that take core widths)`,
    ucd: 'spect.line.width',
    limits: [...POSITIVE, { op: '<=', bound: MAX_FWHM_KMS, reason: `must be at most ${MAX_FWHM_KMS} km/s` }],
    measured: true,
  },
  {
    name: `flux_${line}`,
    kind: 'flux',
    unitText: 'erg s-1 cm-2',
    description: `Observed flux of the broad ${LINE_LABEL[line]} line (before magnification and dust corrections)`,
    ucd: 'phot.flux;spect.line',
    limits: POSITIVE,
    measured: true,
    limitFlag: true,
  },
  {
    name: `lum_${line}`,
    kind: 'luminosity',
    unitText: 'erg/s',
    description: `Observed luminosity of the broad ${LINE_LABEL[line]} line (used when no flux is given)`,
    ucd: 'phys.luminosity;spect.line',
    limits: POSITIVE,
    measured: true,
  },
];

const continuum = (lam: number): BaseColumn => ({
  name: `lam_l_${lam}`,
  kind: 'luminosity',
  unitText: 'erg/s',
  description: `Continuum λL_λ at ${lam} Å, observed (before magnification)`,
  ucd: 'phys.luminosity;spect.continuum',
  limits: POSITIVE,
  measured: true,
});

/* The measured quantities; error and flag companions are added below. UCDs are UCD1+ 1.5 words (checked against src/core/metadata/ucdWords.ts by the tests). */
const BASE_COLUMNS: readonly BaseColumn[] = [
  { name: 'id', kind: 'text', unitText: '', description: 'Object identifier, unique in the catalog', ucd: 'meta.id;meta.main', limits: [], measured: false },
  { name: 'z', kind: 'dimensionless', unitText: '', description: 'Redshift', ucd: 'src.redshift', limits: between(0, 30, '>'), measured: false },
  ...LINES.flatMap(lineColumns),
  continuum(5100),
  continuum(3000),
  continuum(1350),
  { name: 'mu', kind: 'dimensionless', unitText: '', description: 'Lensing magnification (1 when not lensed): lensed over intrinsic flux', ucd: 'phot.flux;arith.ratio', limits: POSITIVE, measured: true },
  {
    name: 'log_mstar',
    kind: 'logMass',
    unitText: 'log10 Msun',
    description: 'log10 of the stellar mass in solar masses (magnification-corrected)',
    ucd: 'phys.mass',
    limits: between(5, 13),
    measured: true,
  },
  { name: 'sigma_star', kind: 'velocity', unitText: 'km/s', description: 'Stellar velocity dispersion', ucd: 'phys.veloc.dispersion', limits: POSITIVE, measured: true },
  { name: 'av', kind: 'magnitude', unitText: 'mag', description: 'V-band attenuation toward the broad-line region', ucd: 'phys.absorption;em.opt.V', limits: between(0, 10), measured: true },
  { name: 'balmer_decrement', kind: 'dimensionless', unitText: '', description: 'Observed broad Hα/Hβ flux ratio', ucd: 'phot.flux;arith.ratio;spect.line', limits: POSITIVE, measured: true },
  { name: 'ra', kind: 'angle', unitText: 'deg', description: 'Right ascension, equatorial (in the frame and equinox of the group\'s catalog)', ucd: 'pos.eq.ra;meta.main', limits: between(0, 360), measured: false },
  { name: 'dec', kind: 'angle', unitText: 'deg', description: 'Declination, equatorial (in the frame and equinox of the group\'s catalog)', ucd: 'pos.eq.dec;meta.main', limits: between(-90, 90), measured: false },
];

const ERROR_SIDES = [
  { suffix: '_err', side: 'both', what: '1σ error' },
  { suffix: '_err_lo', side: 'lo', what: 'Lower 1σ error' },
  { suffix: '_err_hi', side: 'hi', what: 'Upper 1σ error' },
] as const;

const voUnit = (kind: CanonicalKind): string => (kind === 'text' || kind === 'bool' ? '' : VO_UNITS[kind]);

function expand(base: BaseColumn): CanonicalColumn[] {
  const role = base.name === 'id' ? 'id' : 'value';
  const unit = voUnit(base.kind);
  const out: CanonicalColumn[] = [
    { name: base.name, kind: base.kind, unit, unitText: base.unitText, description: base.description, ucd: base.ucd, role, limits: base.limits },
  ];
  if (base.measured) {
    // An error of a log quantity is in dex, whatever the value's zero point.
    const errUnit = base.kind === 'logMass' ? 'dex' : unit;
    const errText = base.kind === 'logMass' ? 'dex' : base.unitText;
    for (const e of ERROR_SIDES) {
      out.push({
        name: base.name + e.suffix,
        kind: base.kind,
        unit: errUnit,
        unitText: errText,
        description: `${e.what} of ${base.name}`,
        ucd: base.ucd ? `stat.error;${base.ucd}` : 'stat.error',
        role: 'error',
        of: base.name,
        side: e.side,
        limits: NON_NEGATIVE,
      });
    }
  }
  if (base.limitFlag) {
    out.push({
      name: `${base.name}_is_limit`,
      kind: 'bool',
      unit: '',
      unitText: '',
      description: `True where ${base.name} (or the line luminosity) is an upper limit`,
      ucd: 'meta.code.error',
      role: 'flag',
      of: base.name,
      limits: [],
    });
  }
  return out;
}

/**
 * Every canonical input column, in output order: id, z, per-line FWHM/flux/luminosity, the
 * continuum luminosities, magnification, stellar mass, velocity dispersion, attenuation,
 * Balmer decrement and the position (ra, dec in degrees), each measured one followed by its `_err`, `_err_lo`, `_err_hi` (and the
 * line fluxes by `_is_limit`). The Parquet writer and the site reuse it for column metadata.
 */
export const CANONICAL_COLUMNS: readonly CanonicalColumn[] = BASE_COLUMNS.flatMap(expand);

/** Canonical columns by name. */
export const CANONICAL_BY_NAME: ReadonlyMap<string, CanonicalColumn> = new Map(CANONICAL_COLUMNS.map((c) => [c.name, c]));
