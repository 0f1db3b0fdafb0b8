/**
 * Bolometric corrections measured for compact red broad-line sources, as cited records.
 * They are much smaller than the quasar corrections the standard route uses; a reading
 * (src/core/readings) picks one of them.
 */

/** A fixed ratio L_bol / λL5100 measured for these sources. */
export interface L5100RatioRecord {
  readonly id: string;
  /** L_bol / λL5100 (dimensionless). */
  readonly ratio: number;
  readonly reference: string;
  readonly notes: string;
}

/**
 * L_bol / λL5100 = 5 for the two luminous sources Greene et al. 2025 studied, "roughly half the
 * value for standard AGN" (abstract); their corrections lower inferred L_bol by about ten compared
 * with published values (abstract).
 */
export const GREENE25_L5100_RATIO: L5100RatioRecord = {
  id: 'greene25_l5100',
  ratio: 5,
  reference:
    'Greene et al. 2025, "What you see is what you get: empirically measured bolometric luminosities of Little Red Dots", arXiv:2509.05434 (abstract)',
  notes: 'Measured on two luminous sources; applied here wherever L_bol comes from λL5100, measured or estimated from a broad Balmer line.',
};

/** Factors by which L_bol at a given broad-line luminosity is lower than the low-redshift line-based route gives. */
export interface LineLbolFactorsRecord {
  readonly id: string;
  /** L_bol(standard route) / L_bol(these sources) at the same broad Hα luminosity. */
  readonly halpha: number;
  /** The same for broad Hβ. */
  readonly hbeta: number;
  readonly reference: string;
  readonly notes: string;
}

/**
 * In 37 sources at z ≈ 3–7 the L(Hα, broad)–L_bol relation is enhanced by ~40 in L(Hα, broad)
 * relative to low-redshift type 1 AGN, and by ~10 for Hβ (Yanagisawa et al. 2026, abstract): at a
 * given broad-line luminosity L_bol is ~40× (Hα) or ~10× (Hβ) lower than the standard route gives.
 */
export const YANAGISAWA26_LINE_FACTORS: LineLbolFactorsRecord = {
  id: 'yanagisawa26_lines',
  halpha: 40,
  hbeta: 10,
  reference: 'Yanagisawa et al. 2026, "A Scaling Relation of LRDs between Broad Hα and Bolometric Luminosities", arXiv:2606.09726 (abstract)',
  notes: 'Approximate factors ("~40", "~10"); applied to the broad-line routes (Hα, Hβ through Greene & Ho 2005 and BC5100). Continuum routes are left as they are.',
};

/** The bolometric routes a reading can take, by id. */
export const SMALL_BOLOMETRIC_RECORDS = { greene25_l5100: GREENE25_L5100_RATIO, yanagisawa26_lines: YANAGISAWA26_LINE_FACTORS } as const;
