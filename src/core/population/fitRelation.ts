import type { Percentiles } from '../derive/types.ts';
import type { Rng } from '../random/rng.ts';
import { percentiles16_50_84 } from '../random/percentiles.ts';
import { ensembleSample, type BatchLogProb, type EnsembleOptions } from './ensembleSampler.ts';
import type { EddingtonRatioDistribution } from './eddingtonRatioDistribution.ts';
import { criteriaMoments } from './detectionModel.ts';
import { bivariateNormalCdf } from './bivariateNormalCdf.ts';
import { normalCdf } from './normalCdf.ts';
import { RELATION_PIVOT, relationLogLikelihood, type RelationDatum, type RelationGrids, type SelectionTable } from './relationLikelihood.ts';

/** Flat priors of the relation's parameters (bounds inclusive). */
export const RELATION_PRIORS = { alpha: [2, 12], beta: [-2, 4], sigma: [0.02, 2] } as const;

/** Sampler settings of a relation fit (see {@link EnsembleOptions}: `steps` is a cap when `tauFactor` is set). */
export interface RelationFitOptions {
  readonly walkers: number;
  readonly steps: number;
  readonly burn: number;
  readonly tauFactor?: number;
  readonly checkEvery?: number;
  /**
   * The sampler's proposal (see {@link EnsembleOptions}); 'differential' by default: on these nearly Gaussian
   * three-parameter posteriors its autocorrelation time is about a quarter of the stretch move's (some 10 steps
   * against 35–45 with 16 walkers), so the 50 τ rule is met in well under half the steps.
   */
  readonly move?: 'stretch' | 'differential';
  readonly onStep?: (step: number, steps: number) => void;
}

export const DEFAULT_FIT_OPTIONS: RelationFitOptions = { walkers: 24, steps: 1500, burn: 500 };

/** Posterior of a relation fit. */
export interface RelationFit {
  readonly alpha: Percentiles;
  readonly beta: Percentiles;
  readonly sigma: Percentiles;
  /** Flattened (alpha, beta, sigma) triplets after burn-in. */
  readonly samples: Float64Array;
  readonly acceptance: number;
  /** Steps run, burn-in, autocorrelation times of (alpha, beta, sigma) in steps, and whether the run converged. */
  readonly stepsRun: number;
  readonly burn: number;
  readonly tau: number[];
  readonly converged: boolean;
}

/** What the relation's likelihood needs: plain data, so that worker threads can rebuild it. */
export interface RelationProblem {
  readonly data: readonly RelationDatum[];
  readonly tables: readonly SelectionTable[];
  readonly grids: RelationGrids;
  readonly erdf: EddingtonRatioDistribution;
}

/**
 * The log likelihood of a problem as a batch function evaluated in this thread (worker threads run the same).
 * @param p - the problem.
 */
export function relationLikelihoodBatch(p: RelationProblem): BatchLogProb {
  const logLike = relationLogLikelihood(p.data, p.tables, p.grids, p.erdf);
  return (thetas, count) => Float64Array.from({ length: count }, (_, i) => logLike(thetas[3 * i] as number, thetas[3 * i + 1] as number, thetas[3 * i + 2] as number));
}

const column = (samples: Float64Array, d: number): Float64Array => Float64Array.from({ length: samples.length / 3 }, (_, i) => samples[3 * i + d] as number);

/**
 * Samples the posterior of log M_BH = alpha + beta (log M* − 10) with intrinsic scatter sigma under flat priors
 * ({@link RELATION_PRIORS}), with the ensemble sampler. Deterministic for a given Rng, whatever evaluates the
 * likelihood.
 * @param p - objects with their table indices, the selection tables (one flat table without selection for the
 *   naive fit), their grid and the Eddington-ratio distribution.
 * @param rng - the random stream.
 * @param opts - walkers, steps (a cap with tauFactor), burn-in.
 * @param likelihood - the problem's log likelihood for batches of (alpha, beta, sigma), e.g. on worker threads;
 *   by default {@link relationLikelihoodBatch} in this thread.
 */
export async function fitRelation(
  p: RelationProblem, rng: Rng, opts: RelationFitOptions = DEFAULT_FIT_OPTIONS, likelihood: BatchLogProb = relationLikelihoodBatch(p),
): Promise<RelationFit> {
  const P = RELATION_PRIORS;
  const inPrior = (a: number, b: number, s: number): boolean =>
    a >= P.alpha[0] && a <= P.alpha[1] && b >= P.beta[0] && b <= P.beta[1] && s >= P.sigma[0] && s <= P.sigma[1];
  // The prior is checked here; only positions inside it are sent to the likelihood.
  const logProb: BatchLogProb = async (thetas, count) => {
    const out = new Float64Array(count).fill(-Infinity);
    const inside: number[] = [];
    for (let i = 0; i < count; i++) if (inPrior(thetas[3 * i] as number, thetas[3 * i + 1] as number, thetas[3 * i + 2] as number)) inside.push(i);
    if (inside.length === 0) return out;
    const batch = new Float64Array(inside.length * 3);
    inside.forEach((i, k) => batch.set(thetas.subarray(3 * i, 3 * i + 3), 3 * k));
    const ll = await likelihood(batch, inside.length);
    inside.forEach((i, k) => { out[i] = ll[k] as number; });
    return out;
  };
  const data = p.data;
  // Start from the observed points' least-squares line, a robust ball inside the priors.
  let sx = 0, sy = 0, sxx = 0, sxy = 0;
  for (const d of data) { sx += d.x; sy += d.y; sxx += d.x * d.x; sxy += d.x * d.y; }
  const n = data.length;
  const varx = sxx / n - (sx / n) ** 2;
  const b0 = varx > 1e-6 ? Math.min(3, Math.max(-1, (sxy / n - (sx / n) * (sy / n)) / varx)) : 1;
  const aLsq = sy / n + b0 * (RELATION_PIVOT - sx / n);
  // The observed points sit above the intrinsic relation when selection matters: scan the intercept below the
  // least-squares one (and a little above) for the best start, so burn-in does not have to travel a dex.
  const offsets = Array.from({ length: 26 }, (_, k) => -2 + 0.1 * k);
  const scan = await logProb(Float64Array.from(offsets.flatMap((d) => [aLsq + d, b0, 0.5])), offsets.length);
  let a0 = aLsq;
  let best = -Infinity;
  offsets.forEach((d, k) => { if ((scan[k] as number) > best) { best = scan[k] as number; a0 = aLsq + d; } });
  const r = await ensembleSample(logProb, [a0, b0, 0.5], [0.1, 0.1, 0.1], rng, { move: 'differential', ...opts });
  const a = column(r.samples, 0);
  const b = column(r.samples, 1);
  const s = column(r.samples, 2);
  return {
    alpha: percentiles16_50_84(a), beta: percentiles16_50_84(b), sigma: percentiles16_50_84(s), samples: r.samples, acceptance: r.acceptance,
    stepsRun: r.stepsRun, burn: r.burn, tau: r.tau, converged: r.converged,
  };
}

/**
 * Mean offset of the detected black holes above the relation at log M* = m, in true mass:
 * E[M | m, detected] − (alpha + beta (m − 10)), averaged over tables with the given weights (e.g. how many objects
 * use each). The expectation is taken on a fine grid of M (±6 sigma, 241 nodes).
 */
export function selectionBias(
  alpha: number, beta: number, sigma: number, m: number, tables: readonly SelectionTable[], weights: readonly number[], erdf: EddingtonRatioDistribution,
): number {
  const mu = alpha + beta * (m - RELATION_PIVOT);
  let num = 0;
  let wsum = 0;
  for (let t = 0; t < tables.length; t++) {
    const tab = tables[t] as SelectionTable;
    const lin = tab.linear;
    if (!lin || !lin.possible || !((weights[t] as number) > 0)) continue;
    const sc2 = tab.calibrationScatter ** 2;
    let e = 0;
    let norm = 0;
    for (let q = 0; q <= 240; q++) {
      const zq = -6 + q / 20;
      const mm = mu + sigma * zq;
      const mo = criteriaMoments(lin, erdf, { mM: mm, mU: mm, vM: 0, vU: sc2, cMU: 0 });
      const p = lin.noWidthCut ? normalCdf(mo.hA) : bivariateNormalCdf(mo.hA, mo.hB, mo.rho);
      const w = Math.exp(-0.5 * zq * zq) * p;
      e += w * mm;
      norm += w;
    }
    if (norm > 0) { num += (weights[t] as number) * (e / norm - mu); wsum += weights[t] as number; }
  }
  return wsum > 0 ? num / wsum : NaN;
}

/**
 * Fraction of the intrinsic population (black holes about the relation, hosts from the stellar mass function's shape
 * over the grid's M* range) the survey would detect, averaged over tables with the given weights.
 */
export function detectableFraction(
  alpha: number, beta: number, sigma: number, tables: readonly SelectionTable[], weights: readonly number[], mStar: Float64Array, erdf: EddingtonRatioDistribution,
): number {
  let num = 0;
  let wsum = 0;
  for (let t = 0; t < tables.length; t++) {
    const tab = tables[t] as SelectionTable;
    const lin = tab.linear;
    const w = weights[t] as number;
    if (!lin || !(w > 0)) continue;
    const sc2 = tab.calibrationScatter ** 2;
    let p = 0;
    let prior = 0;
    for (let j = 0; j < mStar.length; j++) {
      const mu = alpha + beta * ((mStar[j] as number) - RELATION_PIVOT);
      const mo = criteriaMoments(lin, erdf, { mM: mu, mU: mu, vM: sigma * sigma, vU: sigma * sigma + sc2, cMU: sigma * sigma });
      const pj = !lin.possible ? 0 : lin.noWidthCut ? normalCdf(mo.hA) : bivariateNormalCdf(mo.hA, mo.hB, mo.rho);
      p += (tab.massPrior[j] as number) * pj;
      prior += tab.massPrior[j] as number;
    }
    num += w * (p / prior);
    wsum += w;
  }
  return wsum > 0 ? num / wsum : NaN;
}
