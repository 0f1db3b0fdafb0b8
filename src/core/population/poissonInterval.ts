import { logNormalCdf } from './normalCdf.ts';

/** A two-sided confidence interval on the mean of a Poisson count. */
export interface PoissonInterval {
  /** The observed count. */
  readonly n: number;
  /** Lower limit on the mean (0 for n = 0). */
  readonly lower: number;
  /** Upper limit on the mean. */
  readonly upper: number;
}

/** Reference for the exact small-count limits. */
export const GEHRELS86_REFERENCE = 'Gehrels 1986, ApJ 303, 336, eqs. 1–2 (exact limits of Tables 1 and 2)';

// ln P(N ≤ n | mean λ) = ln Σ_{k=0..n} e^{−λ} λ^k / k!, summed in log space around the largest term.
function logPoissonCdf(n: number, lambda: number): number {
  if (lambda === 0) return 0;
  const lnL = Math.log(lambda);
  const kMax = Math.min(n, Math.floor(lambda));
  let lnTerm = -lambda;
  let lnPeak = lnTerm;
  for (let k = 1; k <= kMax; k++) {
    lnTerm += lnL - Math.log(k);
    lnPeak = lnTerm;
  }
  // Sum outward from the peak (k = kMax) in both directions until terms no longer matter.
  let sum = 1;
  let t = 0;
  for (let k = kMax; k >= 1; k--) {
    t += Math.log(k) - lnL;
    const r = Math.exp(t);
    sum += r;
    if (r < 1e-17 * sum) break;
  }
  t = 0;
  for (let k = kMax + 1; k <= n; k++) {
    t += lnL - Math.log(k);
    const r = Math.exp(t);
    sum += r;
    if (r < 1e-17 * sum) break;
  }
  return lnPeak + Math.log(sum);
}

// ln P(N ≥ n | mean λ) for n ≥ 1. Below λ = n the terms from k = n on fall off (each is the last
// times λ/(k + 1) < 1) and are summed directly, so a small tail keeps its digits; from λ = n on the
// tail is at least about a half and 1 − P(N ≤ n − 1) loses nothing.
function logPoissonUpperTail(n: number, lambda: number, lnFactN: number): number {
  if (lambda === 0) return -Infinity;
  if (lambda >= n) return Math.log1p(-Math.exp(logPoissonCdf(n - 1, lambda)));
  let sum = 1;
  let r = 1;
  for (let k = n + 1; k < n + 100000; k++) {
    r *= lambda / k;
    sum += r;
    if (r < 1e-17 * sum) break;
  }
  return -lambda + n * Math.log(lambda) - lnFactN + Math.log(sum);
}

// The λ in [0, ∞) at which the monotone function g(λ) equals lnTarget, by bisection (g decreasing
// unless `increasing`).
function solveMean(g: (lambda: number) => number, lnTarget: number, increasing: boolean, start: number): number {
  const below = (lambda: number): boolean => (increasing ? g(lambda) < lnTarget : g(lambda) > lnTarget);
  let lo = 0;
  let hi = start;
  while (below(hi)) hi *= 2;
  for (let i = 0; i < 200 && hi - lo > 1e-14 * hi; i++) {
    const mid = 0.5 * (lo + hi);
    if (below(mid)) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/**
 * Exact confidence limits on a Poisson mean from an observed count (Gehrels 1986, eqs. 1
 * and 2): the upper limit λ_u solves P(N ≤ n | λ_u) = 1 − CL, the lower λ_l solves
 * P(N ≥ n | λ_l) = 1 − CL, each one-sided at CL = Φ(S). S = 1 gives the "1σ" limits of his
 * Tables 1 and 2 (n = 1: 0.173 – 3.300), the usual error bars on a small count.
 * @param n - observed count, a non-negative integer.
 * @param sigmas - S, the Gaussian-equivalent width of each one-sided limit (default 1).
 */
export function poissonInterval(n: number, sigmas = 1): PoissonInterval {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`poissonInterval: count must be a non-negative integer, got ${n}`);
  if (!(sigmas > 0)) throw new RangeError(`poissonInterval: sigmas must be positive, got ${sigmas}`);
  // Both limits leave 1 − CL = Φ(−S) outside, taken as such (not as 1 − Φ(S), which keeps only
  // 1e-16 / Φ(−S) of its digits: 3.5e-10 relative at S = 5).
  const lnAlpha = logNormalCdf(-sigmas);
  const start = Math.max(10, 2 * n + 20);
  const upper = solveMean((lambda) => logPoissonCdf(n, lambda), lnAlpha, false, start);
  // P(N ≥ n | λ_l) = 1 − CL, solved in the upper tail itself, which is small here.
  let lnFactN = 0;
  for (let k = 2; k <= n; k++) lnFactN += Math.log(k);
  const lower = n === 0 ? 0 : solveMean((lambda) => logPoissonUpperTail(n, lambda, lnFactN), lnAlpha, true, start);
  return { n, lower, upper };
}
