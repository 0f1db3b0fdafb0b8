import type { Rng } from '../random/rng.ts';
import { standardNormal } from '../random/standardNormal.ts';

/** Options of the affine-invariant ensemble sampler. */
export interface EnsembleOptions {
  /** Number of walkers (even, ≥ 2 × dimensions + 2). */
  readonly walkers: number;
  /** Steps per walker, burn-in included. */
  readonly steps: number;
  /** Steps discarded at the start. */
  readonly burn: number;
  /** Stretch scale a (Goodman & Weare 2010 use 2). */
  readonly stretch?: number;
  /** Called after each step with (step, steps), e.g. for a progress bar. */
  readonly onStep?: (step: number, steps: number) => void;
}

/** Posterior samples after burn-in, walker-major within each step. */
export interface EnsembleResult {
  /** (steps − burn) × walkers samples of `dim` parameters each, flattened. */
  readonly samples: Float64Array;
  readonly dim: number;
  /** Fraction of proposals accepted (0.2–0.5 is healthy). */
  readonly acceptance: number;
}

/**
 * Affine-invariant ensemble MCMC with the stretch move (Goodman & Weare 2010, CAMCoS 5, 65,
 * eqs. 7 and 10), updating the two halves of the ensemble in turn as Foreman-Mackey et al. 2013
 * (PASP 125, 306, Algorithm 3) do; written here from the papers. Deterministic for a given Rng.
 * @param logProb - log posterior density (−∞ outside the prior).
 * @param start - centre of the initial ball, one value per parameter.
 * @param spread - width of the initial ball per parameter.
 * @param rng - the random stream.
 * @param opts - walkers, steps, burn-in.
 */
export function ensembleSample(
  logProb: (theta: Float64Array) => number,
  start: readonly number[],
  spread: readonly number[],
  rng: Rng,
  opts: EnsembleOptions,
): EnsembleResult {
  const dim = start.length;
  const { walkers, steps, burn } = opts;
  if (walkers % 2 !== 0 || walkers < 2 * dim + 2) throw new RangeError(`ensembleSample: walkers must be even and ≥ ${2 * dim + 2}, got ${walkers}`);
  if (!(burn >= 0 && burn < steps)) throw new RangeError(`ensembleSample: burn must be in [0, steps), got ${burn}`);
  const a = opts.stretch ?? 2;
  const pos = new Float64Array(walkers * dim);
  const lp = new Float64Array(walkers);
  for (let w = 0; w < walkers; w++) {
    // Redraw a walker until it starts inside the prior (bounded tries, then fail loudly).
    for (let tries = 0; ; tries++) {
      for (let d = 0; d < dim; d++) pos[w * dim + d] = (start[d] as number) + (spread[d] as number) * standardNormal(rng);
      lp[w] = logProb(pos.subarray(w * dim, (w + 1) * dim));
      if (Number.isFinite(lp[w])) break;
      if (tries > 1000) throw new RangeError('ensembleSample: no starting point with finite log probability');
    }
  }
  const kept = steps - burn;
  const samples = new Float64Array(kept * walkers * dim);
  const proposal = new Float64Array(dim);
  const half = walkers / 2;
  let accepted = 0;
  for (let s = 0; s < steps; s++) {
    for (let set = 0; set < 2; set++) {
      const first = set * half;
      const other = (1 - set) * half;
      for (let i = 0; i < half; i++) {
        const w = first + i;
        const j = other + Math.floor(rng.next() * half);
        // z ~ g(z) ∝ 1/√z on [1/a, a]: z = ((a − 1) u + 1)² / a.
        const u = rng.next();
        const zz = ((a - 1) * u + 1) ** 2 / a;
        for (let d = 0; d < dim; d++) proposal[d] = (pos[j * dim + d] as number) + zz * ((pos[w * dim + d] as number) - (pos[j * dim + d] as number));
        const lpNew = logProb(proposal);
        const logAccept = (dim - 1) * Math.log(zz) + lpNew - (lp[w] as number);
        if (Number.isFinite(lpNew) && Math.log(rng.next()) < logAccept) {
          pos.set(proposal, w * dim);
          lp[w] = lpNew;
          accepted++;
        }
      }
    }
    if (s >= burn) samples.set(pos, (s - burn) * walkers * dim);
    opts.onStep?.(s + 1, steps);
  }
  return { samples, dim, acceptance: accepted / (steps * walkers) };
}
