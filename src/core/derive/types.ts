/**
 * The contract between the science core and everything that calls it (the catalog build,
 * the worker pool, the browser's compare form): what one object's inputs look like, the
 * settings of a derivation, and what comes out. Canonical units throughout; the unit is in
 * the name where it is not obvious.
 */

/** The broad lines a mass can be measured from. */
export const LINES = ['halpha', 'hbeta', 'mgii', 'civ'] as const;
export type LineId = (typeof LINES)[number];

/**
 * A measured value with 1σ errors. `errLo`/`errHi` may differ (asymmetric, drawn as a
 * split normal); one side given alone is taken as symmetric; both absent or 0 means the
 * value is taken as exact.
 */
export interface Measured {
  value: number;
  errLo?: number;
  errHi?: number;
}

/** Measurements of one broad line. Flux and luminosity are observed: before magnification and dust corrections. */
export interface LineInputs {
  fwhmKms?: Measured;
  /** Observed line flux, erg s^-1 cm^-2. */
  fluxCgs?: Measured;
  /** Observed line luminosity, erg s^-1 (used when no flux is given). */
  lumErgS?: Measured;
  /** True where the flux (or luminosity) is an upper limit: `value` is the limit. */
  fluxIsLimit?: boolean;
}

/** One object's inputs, already parsed, unit-converted and validated. */
export interface ObjectInputs {
  id: string;
  z: number;
  lines: Partial<Record<LineId, LineInputs>>;
  /** Continuum λL_λ at 5100, 3000 and 1350 Å, erg s^-1, observed (before magnification). */
  lamL5100?: Measured;
  lamL3000?: Measured;
  lamL1350?: Measured;
  /** Lensing magnification (dimensionless, ≥ 1 for a magnified source). */
  mu?: Measured;
  /** log10 of stellar mass in solar masses (already magnification-corrected by the group). */
  logMstar?: Measured;
  /** Stellar velocity dispersion, km s^-1. */
  sigmaStarKms?: Measured;
  /** V-band attenuation toward the broad-line region, mag. */
  av?: Measured;
  /** Observed broad Hα/Hβ flux ratio (used for A_V when `av` is absent). */
  balmerDecrement?: Measured;
}

export type CosmologyId = 'planck18' | 'planck15' | 'wmap9' | 'flat70';
export type DustCurveId = 'calzetti00' | 'ccm89' | 'smc';
export type BolometricMethodId =
  | 'halpha_gh05_bc5100' // L_Hα → L5100 (Greene & Ho 2005 eq. 1 inverted) × BC5100
  | 'bc5100'
  | 'bc3000'
  | 'bc1350'
  | 'netzer19'; // Netzer 2019 luminosity-dependent corrections, from the first continuum present (5100, 3000, 1350)
export type HbetaWithoutContinuum = 'line' | 'gh05_eq2';
export type LocalRelationId = 'rv15_agn' | 'rv15_early' | 'kh13_mbulge' | 'kh13_sigma';

/** Every choice a derivation makes. The catalog records these in its metadata. */
export interface DeriveSettings {
  cosmology: CosmologyId;
  /** Virial calibration id for each line (see src/core/virial/calibrations.ts). */
  calibrations: Record<LineId, string>;
  /** Which line's mass becomes `log_mbh` when several are measured: the first present with a measured (not limited) luminosity. */
  linePriority: LineId[];
  /**
   * An Hβ width whose calibration takes λL5100, with no continuum measured: 'line' uses the
   * calibration on L(Hβ) itself (Vestergaard & Peterson 2006 eq. 6, `vp06_hbeta_line`);
   * 'gh05_eq2' estimates λL5100 from L(Hβ) by inverting Greene & Ho 2005 eq. 2 (flagged
   * `l5100_from_hbeta`).
   */
  hbetaWithoutContinuum: HbetaWithoutContinuum;
  bolometric: BolometricMethodId;
  /** Fixed bolometric correction at 5100 Å used by 'halpha_gh05_bc5100', 'bc5100' and the L(Hβ) route (default 9.26, Shen et al. 2011). */
  bc5100: number;
  /** Eddington luminosity per solar mass, erg s^-1. */
  eddingtonPerMsun: number;
  /** Radiative efficiency ε. */
  efficiency: number;
  /** Redshift at which seeds form. */
  zSeed: number;
  /** Constant Eddington ratio assumed for the required seed mass. */
  lambdaSeed: number;
  /** Fraction of the time spent accreting. */
  dutyCycle: number;
  lightSeedMsun: number;
  heavySeedMsun: number;
  localRelation: LocalRelationId;
  dustCurve: DustCurveId;
  /** Intrinsic broad Hα/Hβ (case B: 2.86). */
  intrinsicBalmer: number;
  draws: number;
  seed: number;
}

/** Which derived quantities are bounds rather than measurements. */
export interface LimitMarks {
  logMbh: boolean;
  logLbol: boolean;
  logEddRatio: boolean;
  logMseed: boolean;
  lambdaReq: boolean;
  deltaLogMbhLocal: boolean;
}

/** 16th, 50th and 84th percentiles of a Monte Carlo distribution. */
export interface Percentiles {
  p16: number;
  p50: number;
  p84: number;
}

/**
 * What deriveObject returns. Plain values are nominal (central inputs, no noise); `pct`
 * holds the Monte Carlo percentiles including measurement errors and intrinsic scatter.
 * `null` where a quantity cannot be derived (the reason is in `flags`).
 */
export interface DerivedObject {
  ageGyr: number;
  dlMpc: number;
  /** log10 of each line's luminosity after magnification and dust correction, erg s^-1. */
  logLum: Partial<Record<LineId, number>>;
  logL5100: number | null;
  logMbh: number | null;
  mbhMethod: string | null;
  logLbol: number | null;
  lbolMethod: string | null;
  logEddRatio: number | null;
  /** Fraction of draws with λ_Edd > 1; null when the Eddington ratio is a bound or unconstrained. */
  pSuperEddington: number | null;
  logMseed: number | null;
  lambdaReqLight: number | null;
  lambdaReqHeavy: number | null;
  deltaLogMbhLocal: number | null;
  /** Offset from the local relation in units of the combined scatter (the relation's intrinsic scatter ⊕ measurement). */
  localOffsetSigma: number | null;
  /**
   * Probability that the black hole lies above a local black hole of the same host quantity:
   * the fraction of draws with offset + N(0, intrinsic scatter) > 0 (the same combined scatter
   * as `localOffsetSigma`, so P ≈ Φ(localOffsetSigma)). Null when the offset is a bound.
   */
  pAboveLocal: number | null;
  pct: {
    logMbh: Percentiles | null;
    logLbol: Percentiles | null;
    logEddRatio: Percentiles | null;
    logMseed: Percentiles | null;
    deltaLogMbhLocal: Percentiles | null;
  };
  /**
   * True where the value is a bound, not a measurement (its percentiles are then null): an
   * upper limit for logMbh, logLbol, logMseed, lambdaReq (both seeds) and deltaLogMbhLocal;
   * upper or lower for logEddRatio (see the flags edd_ratio_upper_limit / edd_ratio_lower_limit).
   */
  isLimit: LimitMarks;
  /** Short machine-readable flags, e.g. 'mbh_upper_limit', 'no_host_mass', 'calibration_out_of_range', 'no_dust_correction'. */
  flags: string[];
}
