import type { Rng } from '../random/rng.ts';
import { standardNormal } from '../random/standardNormal.ts';
import { autocorrelationTime } from './autocorrelationTime.ts';

/**
 * Log posterior of many positions at once: `thetas` holds `count` positions of `dim` parameters each, flattened;
 * returns their log densities (−∞ outside the prior). May answer later (a pool of worker threads), but must be a
 * pure function of the positions, so that the chain does not depend on who evaluates them.
 */
export type BatchLogProb = (thetas: Float64Array, count: number) => Float64Array | Promise<Float64Array>;

/** Options of the affine-invariant ensemble sampler. */
export interface EnsembleOptions {
  /** Number of walkers (even, ≥ 2 × dimensions + 2). */
  readonly walkers: number;
  /** Cap on the steps per walker, burn-in included: the run stops here if it has not converged earlier. */
  readonly steps: number;
  /** Steps discarded at the start. */
  readonly burn: number;
  /**
   * Stop early once the kept chain is at least `tauFactor` autocorrelation times long for every parameter
   * (Foreman-Mackey et al. 2013 advise ≥ 50) and the burn-in is at least 5 τ. Checked every `checkEvery` steps.
   * Omit for a fixed-length run of `steps`.
   */
  readonly tauFactor?: number;
  /** Steps between convergence checks (default 100). */
  readonly checkEvery?: number;
  /** Stretch scale a (Goodman & Weare 2010 use 2). */
  readonly stretch?: number;
  /**
   * The proposal: 'stretch' (Goodman & Weare 2010, the default) or 'differential' (differential evolution, ter Braak
   * 2006, Statistics and Computing 16, 239: x + γ (x_j − x_k) with two other walkers j ≠ k of the complementary
   * half and γ = 2.38/√(2 dim) (1 + 0.1 z), z standard normal, as Nelson et al. 2014, ApJS 210, 11, draw it).
   */
  readonly move?: 'stretch' | 'differential';
  /** Called after each step with (step, cap), e.g. for a progress bar. */
  readonly onStep?: (step: number, steps: number) => void;
}

/** Posterior samples after burn-in, walker-major within each step. */
export interface EnsembleResult {
  /** (stepsRun − burn) × walkers samples of `dim` parameters each, flattened. */
  readonly samples: Float64Array;
  readonly dim: number;
  /** Fraction of proposals accepted (0.2–0.5 is healthy). */
  readonly acceptance: number;
  /** Steps run (≤ the cap). */
  readonly stepsRun: number;
  readonly burn: number;
  /** Integrated autocorrelation time per parameter over the kept chain, steps (Infinity when not measurable). */
  readonly tau: number[];
  /** Whether the kept chain is ≥ tauFactor τ long (always false without tauFactor). */
  readonly converged: boolean;
}

/**
 * Affine-invariant ensemble MCMC with the stretch move (Goodman & Weare 2010, CAMCoS 5, 65,
 * eqs. 7 and 10) or the differential-evolution move (ter Braak 2006; see {@link EnsembleOptions.move}), updating
 * the two halves of the ensemble in turn as Foreman-Mackey et al. 2013 (PASP 125, 306, Algorithm 3) do; written
 * here from the papers. The proposals of one half depend only on the
 * other half, so they are evaluated as one batch (in parallel when `logProb` uses threads). The random numbers
 * are drawn in a fixed order whatever evaluates the batch: deterministic for a given Rng.
 * @param logProb - log posterior density of a batch of positions.
 * @param start - centre of the initial ball, one value per parameter.
 * @param spread - width of the initial ball per parameter.
 * @param rng - the random stream.
 * @param opts - walkers, step cap, burn-in, convergence criterion.
 */
export async function ensembleSample(
  logProb: BatchLogProb,
  start: readonly number[],
  spread: readonly number[],
  rng: Rng,
  opts: EnsembleOptions,
): Promise<EnsembleResult> {
  const dim = start.length;
  const { walkers, steps, burn } = opts;
  if (walkers % 2 !== 0 || walkers < 2 * dim + 2) throw new RangeError(`ensembleSample: walkers must be even and ≥ ${2 * dim + 2}, got ${walkers}`);
  if (!(burn >= 0 && burn < steps)) throw new RangeError(`ensembleSample: burn must be in [0, steps), got ${burn}`);
  const a = opts.stretch ?? 2;
  const checkEvery = opts.checkEvery ?? 100;
  const differential = opts.move === 'differential';
  const gamma0 = 2.38 / Math.sqrt(2 * dim);
  const pos = new Float64Array(walkers * dim);
  const lp = new Float64Array(walkers).fill(-Infinity);
  // Draw the starting ball in rounds: every walker still outside the prior is redrawn (bounded rounds, then fail).
  for (let round = 0; ; round++) {
    const todo = [];
    for (let w = 0; w < walkers; w++) if (!Number.isFinite(lp[w])) todo.push(w);
    if (todo.length === 0) break;
    if (round > 1000) throw new RangeError('ensembleSample: no starting point with finite log probability');
    const batch = new Float64Array(todo.length * dim);
    todo.forEach((w, i) => {
      for (let d = 0; d < dim; d++) batch[i * dim + d] = (start[d] as number) + (spread[d] as number) * standardNormal(rng);
    });
    const out = await logProb(batch, todo.length);
    todo.forEach((w, i) => {
      if (Number.isFinite(out[i])) { pos.set(batch.subarray(i * dim, (i + 1) * dim), w * dim); lp[w] = out[i] as number; }
    });
  }
  const chain = new Float64Array(steps * walkers * dim);
  const half = walkers / 2;
  const proposals = new Float64Array(half * dim);
  const zs = new Float64Array(half);
  let accepted = 0;
  let stepsRun = steps;
  let tau: number[] = [];
  let converged = false;
  for (let s = 0; s < steps; s++) {
    for (let set = 0; set < 2; set++) {
      const first = set * half;
      const other = (1 - set) * half;
      for (let i = 0; i < half; i++) {
        const w = first + i;
        const j = other + Math.floor(rng.next() * half);
        if (differential) {
          // A second walker k ≠ j of the same half; the proposal is symmetric (zs = 1: no Jacobian term).
          const k = other + ((j - other + 1 + Math.floor(rng.next() * (half - 1))) % half);
          const g = gamma0 * (1 + 0.1 * standardNormal(rng));
          zs[i] = 1;
          for (let d = 0; d < dim; d++) proposals[i * dim + d] = (pos[w * dim + d] as number) + g * ((pos[j * dim + d] as number) - (pos[k * dim + d] as number));
          continue;
        }
        // z ~ g(z) ∝ 1/√z on [1/a, a]: z = ((a − 1) u + 1)² / a.
        const zz = ((a - 1) * rng.next() + 1) ** 2 / a;
        zs[i] = zz;
        for (let d = 0; d < dim; d++) proposals[i * dim + d] = (pos[j * dim + d] as number) + zz * ((pos[w * dim + d] as number) - (pos[j * dim + d] as number));
      }
      const lpNew = await logProb(proposals, half);
      for (let i = 0; i < half; i++) {
        const w = first + i;
        const logAccept = (dim - 1) * Math.log(zs[i] as number) + (lpNew[i] as number) - (lp[w] as number);
        if (Number.isFinite(lpNew[i]) && Math.log(rng.next()) < logAccept) {
          pos.set(proposals.subarray(i * dim, (i + 1) * dim), w * dim);
          lp[w] = lpNew[i] as number;
          accepted++;
        }
      }
    }
    chain.set(pos, s * walkers * dim);
    opts.onStep?.(s + 1, steps);
    const done = s + 1;
    if (opts.tauFactor !== undefined && done > burn && (done - burn) % checkEvery === 0) {
      tau = Array.from({ length: dim }, (_, d) => autocorrelationTime(chain, done, walkers, dim, d, burn));
      const worst = Math.max(...tau);
      if (Number.isFinite(worst) && done - burn >= opts.tauFactor * worst && burn >= 5 * worst) {
        converged = true;
        stepsRun = done;
        break;
      }
    }
  }
  if (!converged) tau = Array.from({ length: dim }, (_, d) => autocorrelationTime(chain, stepsRun, walkers, dim, d, burn));
  const samples = chain.slice(burn * walkers * dim, stepsRun * walkers * dim);
  return { samples, dim, acceptance: accepted / (stepsRun * walkers), stepsRun, burn, tau, converged };
}

/**
 * Wraps a log density of one position as a {@link BatchLogProb} evaluated in this thread.
 * @param logProb - log density of one position.
 * @param dim - parameters per position.
 */
export function batchInThread(logProb: (theta: Float64Array) => number, dim: number): BatchLogProb {
  return (thetas, count) => Float64Array.from({ length: count }, (_, i) => logProb(thetas.subarray(i * dim, (i + 1) * dim)));
}
