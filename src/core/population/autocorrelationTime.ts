/**
 * Integrated autocorrelation time of one parameter of an ensemble chain, in steps: τ = 1 + 2 Σ_{t=1}^{M} ρ(t),
 * with ρ(t) the autocorrelation function averaged over walkers (each walker's normalised by its own variance) and
 * the window M the smallest lag with M ≥ c·τ(M) (Sokal's automatic windowing, c = 5), as Foreman-Mackey et al.
 * 2013 (PASP 125, 306, section 3) and the emcee documentation estimate it; written here from the paper. Direct
 * sums over lags (no FFT): O(steps × walkers × M), well under a second for the chains of a relation fit.
 * @param chain - positions, step-major: chain[(s × walkers + w) × dim + d].
 * @param steps - steps in the chain (from its start; burn-in already left out by the caller's `from`).
 * @param walkers - walkers per step.
 * @param dim - parameters per position.
 * @param d - the parameter.
 * @param from - first step to use (steps before it are burn-in).
 * @param c - window constant (5).
 * @returns τ in steps (≥ 1); Infinity when the window never closes inside the chain (the chain is too short).
 */
export function autocorrelationTime(chain: Float64Array, steps: number, walkers: number, dim: number, d: number, from = 0, c = 5): number {
  const n = steps - from;
  if (n < 4) return Infinity;
  const at = (s: number, w: number): number => chain[((from + s) * walkers + w) * dim + d] as number;
  const mean = new Float64Array(walkers);
  const v0 = new Float64Array(walkers);
  for (let w = 0; w < walkers; w++) {
    let m = 0;
    for (let s = 0; s < n; s++) m += at(s, w);
    m /= n;
    mean[w] = m;
    let v = 0;
    for (let s = 0; s < n; s++) v += (at(s, w) - m) ** 2;
    v0[w] = v / n;
  }
  let tau = 1;
  for (let t = 1; t < n; t++) {
    let rho = 0;
    let used = 0;
    for (let w = 0; w < walkers; w++) {
      if (!((v0[w] as number) > 0)) continue;
      let cov = 0;
      const m = mean[w] as number;
      for (let s = 0; s + t < n; s++) cov += (at(s, w) - m) * (at(s + t, w) - m);
      rho += cov / n / (v0[w] as number);
      used++;
    }
    if (used === 0) return Infinity;
    tau += (2 * rho) / used;
    if (t >= c * tau) return Math.max(1, tau);
  }
  return Infinity;
}
