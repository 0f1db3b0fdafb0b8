/**
 * POPULATION MODEL OF THE INVENTED DEMO CATALOG
 * =============================================
 * Everything here is invented: the "Cinderwake Deep Near-Infrared Spectroscopic Survey"
 * (CINDERWAKE, ids CDW-#####), its fields, programmes and notes (see demoNames.ts). The
 * numbers are drawn from a simple model so that the catalog looks like what a deep
 * near-infrared spectroscopic survey of broad-line AGN candidates at z ≈ 4–11 reports, and
 * so that the science core can be checked against it: each object's measured quantities are
 * made by INVERTING the same published calibrations the catalog build applies, so a
 * noise-free catalog derives back to the model's masses exactly (up to the rounding of the
 * written values).
 *
 * Per object (row k is drawn from its own generator seeded by (seed, k): rows do not depend on n):
 *  1. Redshift. With probability 1 − tailFraction (0.88) a normal (mean 5.3, sd 0.9)
 *     truncated to 4 ≤ z ≤ 7; otherwise a tail z = 7 + Exp(scale 1.2) truncated at z = 11.
 *     Rounded to 1e-4.
 *  2. Coverage of the invented spectrograph (0.9–5.3 µm, like the reddest near-infrared
 *     spectrographs in use). Broad Hα (6565 Å vacuum) stays in the band with room for its
 *     wings to z ≈ 7.0: at z ≤ 7 the mass line is broad Hα. For 7 < z ≤ 9.8 only Hβ
 *     (4863 Å) is covered: those objects get fwhm_hbeta, flux_hbeta and lam_l_5100 (the
 *     rest-frame 5100 Å continuum is at 4.6–5.5 µm, taken as measured from the spectrum's red
 *     end or the photometry) and no Hα. Above z = 9.8 both Balmer lines are gone and the few
 *     objects there (about 0.8 % of the catalog) are measured in Mg II 2799 Å: fwhm_mgii and
 *     lam_l_3000 (no line flux). A Balmer decrement needs both lines, so only at z ≤ 7.
 *  3. The intrinsic population (the forward model the population step fits; demoHosts.ts):
 *     host log M* from the stellar mass function at the object's redshift (Schechter shapes of
 *     Song et al. 2016, ApJ 825, 5, nearest record in z) on 7 ≤ log M* ≤ 12; the black hole about
 *     the demo's INTRINSIC RELATION log M_BH = 6.9 + 1.05 (log M* − 10) with 0.5 dex scatter
 *     (DEMO_MODEL.truth, also written to data-demo/truth.json); log λ_Edd ~ N(−0.6, 0.4)
 *     (cut at ±5σ), the distribution the demo config's survey block states; the virial mass the
 *     line's calibration recovers = true mass + N(0, the calibration's scatter: 0.4 dex Hα,
 *     0.43 Hβ, 0.4 Mg II). The RV15 local relation at log M* = 10 is 6.40, so the intrinsic
 *     black holes sit 0.5 dex above it; the detected ones sit higher still (selection).
 *  4. Super-Eddington objects arise from the upper tail of that distribution and the selection
 *     (a detected object is brighter than typical at its mass).
 *  5. Luminosities: L_bol = λ · 1.26e38 · M_BH (Shen et al. 2011 convention);
 *     λL5100 = L_bol / 10.33 (BC5100, Richards et al. 2006);
 *     λL3000 = L_bol / 5.15 (BC3000, Richards et al. 2006 as used by Shen et al. 2011);
 *     L_Hα = 5.25e42 (λL5100/1e44)^1.157 (Greene & Ho 2005, ApJ 630, 122, eq. 1);
 *     L_Hβ = L_Hα / 2.86 (case B, Osterbrock & Ferland 2006).
 *  6. Line widths by inverting the virial calibrations named in census.config.yaml at the
 *     VIRIAL mass (step 3), so a noise-free row derives back to the virial mass:
 *     Hα: log M = log 1.075 + 6.57 + 0.47 log(L_Hα/1e42) + 2.06 log(FWHM/1e3)
 *         (Reines & Volonteri 2015, ApJ 813, 82);
 *     Hβ (7 < z ≤ 9.8): log M = 6.91 + 0.5 log(λL5100/1e44) + 2 log(FWHM/1e3)
 *         (Vestergaard & Peterson 2006, ApJ 641, 689);
 *     Mg II (z > 9.8): log M = 6.74 + 0.62 log(λL3000/1e44) + 2 log(FWHM/1e3)
 *         (Shen et al. 2011, ApJS 194, 45);
 *     Hβ width next to a measured Hα (some of the Balmer-decrement objects):
 *         FWHM_Hβ = 1.07e3 (FWHM_Hα/1e3)^1.03 (Greene & Ho 2005 eq. 3).
 *  8. Lensing: 8 % of the objects sit behind the invented HEARTHSTONE-CL cluster with μ
 *     log-uniform in 1.5–10 and a 10–30 % error; observed fluxes and λL5100 are × μ.
 *  9. Dust: the objects with a measured broad Balmer decrement (15 % of the catalog, all at
 *     z ≤ 7 with detected Hα) have E(B−V) = 0.05 + |N(0, 0.35)| ≤ 0.88, so Hα/Hβ runs from
 *     about 3 to 8 with the Calzetti et al. 2000 curve (k_Hα = 3.325, k_Hβ = 4.597 at the
 *     vacuum wavelengths);
 *     their Hα and Hβ fluxes are attenuated. All other objects are dust-free, so that a
 *     derivation that corrects dust only where a decrement is given recovers the model.
 * 10. Fluxes: F = μ · L · 10^(−0.4 A) / (4π D_L²) with the Planck18 luminosity distance
 *     (demoCosmology.ts, matches astropy's Planck18 to 1e-6). Written in 1e-18 erg s^-1 cm^-2.
 *     Each object has a line-flux noise floor σ₀ uniform in 0.06–0.14 (1e-18 cgs), so the
 *     survey limit is at S/N ≥ 5.
 *     Selection, the demo config's survey block: the intrinsic object (step 3) is redrawn at
 *     the object's redshift until the line the mass comes from is broad, FWHM ≥ 1000 km/s,
 *     and its observed flux reaches the survey limit, F ≥ 0.75e-18 cgs in every field;
 *     Balmer-decrement objects also need F_Hβ ≥ 5 σ₀; Mg II objects need an observed
 *     λL3000 ≥ 5e43 erg s^-1 instead of a line flux. (The fit models the flux and width cuts;
 *     the dust, the magnification and the Hβ cut of the decrement objects it does not.)
 *     For the flux-limit objects (10 % of the catalog, all at z ≤ 7) the condition is
 *     F < 3 σ₀ instead, and the written flux is the 3σ limit 3 σ₀ with
 *     flux_halpha_is_limit = true and no error. The selection shapes the distributions of
 *     steps 3–4 (fainter objects drop out at high z), not the catalog fractions.
 * 11. Noise (off with noiseFree): flux error σ = √(σ₀² + (0.05 F)²); FWHM error
 *     FWHM · (0.04 + 0.6 / SNR) (Mg II: 10–25 %); λL5100 and λL3000 error 8–20 %;
 *     log M* error 0.15–0.4 dex; μ error
 *     10–30 %; each measured value = truth + error · N(0, 1) (kept positive). The Balmer
 *     decrement is the ratio of the measured fluxes with the propagated error.
 * 12. No host mass for 20 % of the objects (empty log_mstar).
 *
 * The fractions are targets over the whole catalog; the per-branch probabilities below are
 * derived from them so the expected catalog fractions equal the targets.
 */
import type { DemoObject } from './demoTruth.ts';
import { drawDemoObject } from './demoTruth.ts';
import type { DemoRow } from './demoRow.ts';

export { DEMO_COLUMNS, type DemoRow } from './demoRow.ts';
export { DEMO_SURVEY, DEMO_FIELDS } from './demoNames.ts';
export type { DemoObject, DemoTruth } from './demoTruth.ts';

/** A catalog row (alias used by the benchmarks). */
export type Row = DemoRow;

/** Parameters of the population model (see the block above). */
export const DEMO_MODEL = {
  redshift: { min: 4, bulkMean: 5.3, bulkSd: 0.9, bulkMax: 7.0, tailFraction: 0.12, tailScale: 1.2, hbetaMax: 9.8, max: 11 },
  /** The intrinsic black-hole–host relation: log M_BH = alpha + beta (log M* − pivot) + N(0, sigma). */
  truth: { alpha: 6.9, beta: 1.05, sigma: 0.5, pivotLogMstar: 10 },
  logEddRatio: { meanLog: -0.6, sigmaLog: 0.4 },
  host: { logMstarMin: 7, logMstarMax: 12 },
  /** Target fractions of the whole catalog. */
  fractions: { limit: 0.1, noHost: 0.2, lensed: 0.08, balmer: 0.15, hbetaFwhmAmongBalmer: 0.5 },
  lensing: { muMin: 1.5, muMax: 10, relErrMin: 0.1, relErrMax: 0.3 },
  dust: { ebvMin: 0.05, ebvScale: 0.35, ebvMax: 0.88 },
  detection: { noiseFloorMin: 0.06, noiseFloorMax: 0.14, snrMin: 5, limitSigma: 3, surveyLimit: 0.75, lamL3000Min: 5e43, fwhmMinKms: 1000, maxRedraws: 1_000_000 },
  noise: {
    fluxRel: 0.05,
    fwhmRelBase: 0.04,
    fwhmSnrCoeff: 0.6,
    lamL5100RelMin: 0.08,
    lamL5100RelMax: 0.2,
    mgiiFwhmRelMin: 0.1,
    mgiiFwhmRelMax: 0.25,
    logMstarErrMin: 0.15,
    logMstarErrMax: 0.4,
  },
  /** Unit of the written fluxes, erg s^-1 cm^-2. */
  fluxUnitCgs: 1e-18,
  /** The ids are spaced by up to this step (gaps like a parent photometric catalog's). */
  idStep: 7,
} as const;

export type DemoModel = typeof DEMO_MODEL;

/** Options of a generated catalog. */
export interface DemoCatalogOptions {
  /** Number of rows. */
  n: number;
  /** Integer seed; the same seed gives the same rows. */
  seed: number;
  /** Write the model's true values instead of noisy measurements (errors are still written). */
  noiseFree?: boolean;
}

/**
 * Draws objects one at a time (for large synthetic catalogs that should not sit in memory).
 * @returns the rows with their model truth
 */
export function* iterateDemoObjects(opts: DemoCatalogOptions): Generator<DemoObject> {
  checkOptions(opts);
  for (let i = 0; i < opts.n; i++) yield drawDemoObject(DEMO_MODEL, opts.seed, i, opts.noiseFree ?? false);
}

/**
 * An invented catalog of `n` broad-line AGN candidates (see the model above).
 * @returns rows with canonical column names; fluxes in 1e-18 erg s^-1 cm^-2
 */
export function generateDemoCatalog(opts: DemoCatalogOptions): DemoRow[] {
  const rows: DemoRow[] = [];
  for (const obj of iterateDemoObjects(opts)) rows.push(obj.row);
  return rows;
}

function checkOptions({ n, seed }: DemoCatalogOptions): void {
  if (!Number.isInteger(n) || n < 0) throw new Error(`generateDemoCatalog: n must be a non-negative integer, got ${n}`);
  if (!Number.isInteger(seed)) throw new Error(`generateDemoCatalog: seed must be an integer, got ${seed}`);
}
