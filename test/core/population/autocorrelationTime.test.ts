import { describe, expect, it } from 'vitest';
import { autocorrelationTime } from '../../../src/core/population/autocorrelationTime.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { standardNormal } from '../../../src/core/random/standardNormal.ts';
import { expectClose } from '../../helpers/expectClose.ts';

/** Walkers each running an AR(1) process x_t = φ x_{t−1} + ε_t. */
function ar1Chain(phi: number, steps: number, walkers: number, seed: number): Float64Array {
  const rng = createRng(seed);
  const chain = new Float64Array(steps * walkers);
  const x = Float64Array.from({ length: walkers }, () => standardNormal(rng) / Math.sqrt(1 - phi * phi));
  for (let s = 0; s < steps; s++) {
    for (let w = 0; w < walkers; w++) {
      x[w] = phi * (x[w] as number) + standardNormal(rng);
      chain[s * walkers + w] = x[w] as number;
    }
  }
  return chain;
}

/**
 * Walkers each running x ← 0.8 x + (u − 0.5) about 5, u from the Park–Miller minimal standard generator
 * (state ← 16807 state mod 2³¹ − 1, exact in doubles): the same numbers in any language, so a Python transcription
 * gives the same chain to the last bit.
 */
function parkMillerChain(steps: number, walkers: number): Float64Array {
  let state = 12345;
  const x = new Float64Array(walkers);
  const chain = new Float64Array(steps * walkers);
  for (let s = 0; s < steps; s++) {
    for (let w = 0; w < walkers; w++) {
      state = (state * 16807) % 2147483647;
      x[w] = 0.8 * (x[w] as number) + (state / 2147483647 - 0.5);
      chain[s * walkers + w] = (x[w] as number) + 5;
    }
  }
  return chain;
}

describe('autocorrelationTime', () => {
  it('equals emcee 3.1.6 integrated_time (c = 5) on the same chain, with and without burn-in, to 1e-10', () => {
    // Computed with emcee 3.1.6 emcee.autocorr.integrated_time(chain, c=5, tol=0) (numpy 1.24.2; scripts/reference/autocorrelationEmcee.py) on the chain of
    // parkMillerChain(3000, 6), shape (3000, 6, 1); emcee forms the walkers' mean autocorrelation by FFT, the code by direct
    // sums, so they agree to rounding. The chain's mean is 5, not 0.
    const chain = parkMillerChain(3000, 6);
    expectClose(autocorrelationTime(chain, 3000, 6, 1, 0), 8.658451525761038, { rtol: 1e-10, source: 'computed with emcee 3.1.6 integrated_time' });
    expectClose(autocorrelationTime(chain, 3000, 6, 1, 0, 500), 8.812145656208024, { rtol: 1e-10, source: 'computed with emcee 3.1.6 integrated_time on chain[500:]' });
  });

  it('leaves out a walker that never moves', () => {
    // emcee 3.1.6 integrated_time on the first four walkers alone, chain[:, :4]: 8.249515634494053 (emcee itself would
    // give NaN with the stuck walkers in).
    const chain = parkMillerChain(3000, 6);
    for (let s = 0; s < 3000; s++) { chain[s * 6 + 4] = 5; chain[s * 6 + 5] = -2; }
    expectClose(autocorrelationTime(chain, 3000, 6, 1, 0), 8.249515634494053, { rtol: 1e-10, source: 'computed with emcee 3.1.6 integrated_time on the moving walkers' });
  });

  it('gives (1 + φ)/(1 − φ) for an AR(1) chain', () => {
    // Closed form: ρ(t) = φ^t, τ = 1 + 2 Σ φ^t = (1 + φ)/(1 − φ) (Sokal 1997). 16 walkers × 20 000 steps: the windowed
    // estimate's relative error is about √(2(2M+1)/N) ≈ 3 % at φ = 0.9 (M ≈ 5τ); tolerance 10 %.
    for (const phi of [0.5, 0.9]) {
      const tau = autocorrelationTime(ar1Chain(phi, 20_000, 16, 3), 20_000, 16, 1, 0);
      expectClose(tau, (1 + phi) / (1 - phi), { rtol: 0.1, source: `closed form for AR(1) with φ = ${phi}` });
    }
  });

  it('ignores the steps before `from`, and says Infinity for a chain too short to measure', () => {
    const chain = ar1Chain(0.5, 2000, 8, 4);
    // A huge offset in the first 100 steps would lengthen τ if it were used.
    for (let i = 0; i < 100 * 8; i++) chain[i] = (chain[i] as number) + 1000;
    expectClose(autocorrelationTime(chain, 2000, 8, 1, 0, 100), 3, { rtol: 0.2, source: 'closed form (1 + 0.5)/(1 − 0.5)' });
    expect(autocorrelationTime(ar1Chain(0.5, 50, 8, 5), 50, 8, 1, 0, 47)).toBe(Infinity);
  });
});
