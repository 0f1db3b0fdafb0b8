import { describe, expect, it } from 'vitest';
import { autocorrelationTime } from '../../../src/core/population/autocorrelationTime.ts';
import { batchInThread, ensembleSample } from '../../../src/core/population/ensembleSampler.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { expectClose } from '../../helpers/expectClose.ts';

function moments(samples: Float64Array, dim: number, d: number): { mean: number; sd: number } {
  const n = samples.length / dim;
  let s = 0;
  let s2 = 0;
  for (let i = 0; i < n; i++) { const v = samples[i * dim + d] as number; s += v; s2 += v * v; }
  const mean = s / n;
  return { mean, sd: Math.sqrt(s2 / n - mean * mean) };
}

describe('ensembleSample', () => {
  it('recovers the mean and width of a correlated, badly scaled 2-D normal', async () => {
    // Closed form: N(mean (3, −1), sd (0.1, 10), correlation 0.9). Seeded; 32 walkers × 3000 kept steps with an
    // autocorrelation of ~50 steps give ~2000 independent draws: means to ±3 × sd/√2000, widths to ±8 %.
    const rho = 0.9;
    const sd = [0.1, 10];
    const mu = [3, -1];
    const logProb = (t: Float64Array): number => {
      const x = ((t[0] as number) - (mu[0] as number)) / (sd[0] as number);
      const y = ((t[1] as number) - (mu[1] as number)) / (sd[1] as number);
      return -(x * x - 2 * rho * x * y + y * y) / (2 * (1 - rho * rho));
    };
    const r = await ensembleSample(batchInThread(logProb, 2), [3, -1], [0.05, 5], createRng(13), { walkers: 32, steps: 3500, burn: 500 });
    for (let d = 0; d < 2; d++) {
      const m = moments(r.samples, 2, d);
      expectClose(m.mean, mu[d] as number, { atol: (3 * (sd[d] as number)) / Math.sqrt(2000), source: 'closed form: the target mean' });
      expectClose(m.sd, sd[d] as number, { rtol: 0.08, source: 'closed form: the target standard deviation' });
    }
    expect(r.acceptance).toBeGreaterThan(0.2);
    expect(r.acceptance).toBeLessThan(0.9);
  });

  it('is deterministic for a seed and never leaves a hard prior boundary', async () => {
    const logProb = (t: Float64Array): number => ((t[0] as number) < 0 ? -Infinity : -(t[0] as number));
    const a = await ensembleSample(batchInThread(logProb, 1), [1], [0.5], createRng(5), { walkers: 8, steps: 2000, burn: 200 });
    const b = await ensembleSample(batchInThread(logProb, 1), [1], [0.5], createRng(5), { walkers: 8, steps: 2000, burn: 200 });
    expect(Array.from(a.samples)).toEqual(Array.from(b.samples));
    expect(Math.min(...a.samples)).toBeGreaterThanOrEqual(0);
    // Exponential(1): mean 1 (closed form); 8 × 1800 draws with τ of some 10–20 steps, about 700 independent: sd of the
    // mean ≈ 0.04, tolerance ±0.15.
    expectClose(moments(a.samples, 1, 0).mean, 1, { atol: 0.15, source: 'closed form: mean of Exp(1)' });
  });
});

describe('ensembleSample with a convergence criterion', () => {
  it('stops once the kept chain is 50 autocorrelation times long, well before the cap, and reports it', async () => {
    const logProb = (t: Float64Array): number => -0.5 * ((t[0] as number) ** 2 + ((t[1] as number) / 3) ** 2);
    const r = await ensembleSample(batchInThread(logProb, 2), [0.5, 0.5], [0.1, 0.1], createRng(21), { walkers: 16, steps: 20_000, burn: 200, tauFactor: 50 });
    expect(r.converged).toBe(true);
    expect(r.stepsRun).toBeLessThan(20_000);
    expect(r.stepsRun - r.burn).toBeGreaterThanOrEqual(50 * Math.max(...r.tau));
    expect(r.samples.length).toBe((r.stepsRun - r.burn) * 16 * 2);
    // Closed form: sd 1 and 3; the kept chain holds ≥ 16 × 50 independent draws: widths to ±10 %.
    expectClose(moments(r.samples, 2, 1).sd, 3, { rtol: 0.1, source: 'closed form: the target standard deviation' });
  });

  it('runs to the cap and says it did not converge when the cap is too short', async () => {
    const logProb = (t: Float64Array): number => -0.5 * (t[0] as number) ** 2;
    const r = await ensembleSample(batchInThread(logProb, 1), [0], [0.1], createRng(3), { walkers: 8, steps: 150, burn: 50, tauFactor: 50 });
    expect(r.converged).toBe(false);
    expect(r.stepsRun).toBe(150);
  });

  it('draws the same chain whether the batch is answered at once or later', async () => {
    const logProb = (t: Float64Array): number => -0.5 * (t[0] as number) ** 2;
    const sync = batchInThread(logProb, 1);
    const later = async (th: Float64Array, n: number): Promise<Float64Array> => { await new Promise((res) => setTimeout(res, 0)); return sync(th, n) as Float64Array; };
    const a = await ensembleSample(sync, [0], [0.1], createRng(8), { walkers: 8, steps: 40, burn: 10 });
    const b = await ensembleSample(later, [0], [0.1], createRng(8), { walkers: 8, steps: 40, burn: 10 });
    expect(Array.from(b.samples)).toEqual(Array.from(a.samples));
  });
});

describe('ensembleSample with the differential-evolution move', () => {
  // A correlated, badly scaled 3-D normal: x ~ N(0, 1), y | x ~ N(0.8 x, 0.3), z ~ N(0, 2) (closed form).
  const logProb = (t: Float64Array): number => -0.5 * ((t[0] as number) ** 2 + (((t[1] as number) - 0.8 * (t[0] as number)) / 0.3) ** 2 + ((t[2] as number) / 2) ** 2);

  it('recovers the target’s widths and stops in far fewer steps than the stretch move', async () => {
    const opts = { walkers: 16, steps: 5000, burn: 300, tauFactor: 50 };
    const de = await ensembleSample(batchInThread(logProb, 3), [0.5, 0.5, 0.5], [0.1, 0.1, 0.1], createRng(2), { ...opts, move: 'differential' });
    const st = await ensembleSample(batchInThread(logProb, 3), [0.5, 0.5, 0.5], [0.1, 0.1, 0.1], createRng(2), opts);
    expect(de.converged).toBe(true);
    expect(de.stepsRun - de.burn).toBeGreaterThanOrEqual(50 * Math.max(...de.tau));
    // Closed form: sd of x 1, of y √(0.64 + 0.09) ≈ 0.854, of z 2; ≥ 16 × 50 independent draws: widths to ±10 %.
    expectClose(moments(de.samples, 3, 0).sd, 1, { rtol: 0.1, source: 'closed form: the target standard deviation' });
    expectClose(moments(de.samples, 3, 1).sd, Math.sqrt(0.64 + 0.09), { rtol: 0.1, source: 'closed form: the target standard deviation' });
    expectClose(moments(de.samples, 3, 2).sd, 2, { rtol: 0.1, source: 'closed form: the target standard deviation' });
    // Internal: this seeded run accepts about a third of the proposals; 0.2–0.5 is the healthy range.
    expect(de.acceptance).toBeGreaterThan(0.2);
    expect(de.acceptance).toBeLessThan(0.5);
    // On this target the stretch move's τ is some 35–45 steps and differential evolution's about 10 (internal, seeded).
    expect(Math.max(...de.tau)).toBeLessThan(0.5 * Math.max(...st.tau));
    expect(de.stepsRun).toBeLessThan(st.stepsRun / 2);
  });

  it('is deterministic for a seed and never leaves a hard prior boundary', async () => {
    const half = (t: Float64Array): number => ((t[0] as number) < 0 ? -Infinity : -(t[0] as number));
    const a = await ensembleSample(batchInThread(half, 1), [1], [0.5], createRng(5), { walkers: 8, steps: 1500, burn: 200, move: 'differential' });
    const b = await ensembleSample(batchInThread(half, 1), [1], [0.5], createRng(5), { walkers: 8, steps: 1500, burn: 200, move: 'differential' });
    expect(Array.from(a.samples)).toEqual(Array.from(b.samples));
    expect(Math.min(...a.samples)).toBeGreaterThanOrEqual(0);
    // Exponential(1): mean 1 (closed form); 8 × 1300 draws, a few hundred independent: tolerance ±0.15.
    expectClose(moments(a.samples, 1, 0).mean, 1, { atol: 0.15, source: 'closed form: mean of Exp(1)' });
  });
});

/** A batch log density that records every batch it is asked for (a copy of the positions). */
function recording(logProb: (t: Float64Array) => number, dim: number): { batches: Float64Array[]; fn: (th: Float64Array, n: number) => Float64Array } {
  const batches: Float64Array[] = [];
  const inner = batchInThread(logProb, dim);
  return { batches, fn: (th, n) => { batches.push(th.slice(0, n * dim)); return inner(th, n) as Float64Array; } };
}

describe('ensembleSample: options, refusals and bookkeeping', () => {
  const gauss = (t: Float64Array): number => -0.5 * (t[0] as number) ** 2;

  it('refuses an odd number of walkers, fewer than 2 × dimensions + 2, a burn-in outside [0, steps), and a prior that no start reaches', async () => {
    // The documented limits of EnsembleOptions (walkers even and ≥ 2 dim + 2; burn in [0, steps)).
    const one = batchInThread(gauss, 1);
    const two = batchInThread((t) => gauss(t) - 0.5 * (t[1] as number) ** 2, 2);
    await expect(ensembleSample(one, [0], [1], createRng(1), { walkers: 7, steps: 10, burn: 0 })).rejects.toThrow('ensembleSample: walkers must be even and ≥ 4, got 7');
    await expect(ensembleSample(two, [0, 0], [1, 1], createRng(1), { walkers: 4, steps: 10, burn: 0 })).rejects.toThrow('ensembleSample: walkers must be even and ≥ 6, got 4');
    await expect(ensembleSample(one, [0], [1], createRng(1), { walkers: 8, steps: 10, burn: -1 })).rejects.toThrow('ensembleSample: burn must be in [0, steps), got -1');
    await expect(ensembleSample(one, [0], [1], createRng(1), { walkers: 8, steps: 10, burn: 10 })).rejects.toThrow('ensembleSample: burn must be in [0, steps), got 10');
    await expect(ensembleSample(batchInThread(() => -Infinity, 1), [0], [1], createRng(1), { walkers: 4, steps: 10, burn: 0 })).rejects.toThrow('ensembleSample: no starting point with finite log probability');
    // The limits themselves are allowed: 2 dim + 2 walkers, burn 0 and steps − 1.
    expect((await ensembleSample(two, [0, 0], [1, 1], createRng(1), { walkers: 6, steps: 10, burn: 0 })).samples.length).toBe(10 * 6 * 2);
    expect((await ensembleSample(one, [0], [1], createRng(1), { walkers: 4, steps: 10, burn: 9 })).samples.length).toBe(4);
  });

  it('draws the starting ball as start + spread × N(0, 1) per parameter, and redraws only the walkers outside the prior', async () => {
    // Closed form: each coordinate N(start, spread²); 400 walkers: means to 4 spread/√400, sds to ±20 %, and no
    // coordinate beyond 6 spreads (probability 2e-9 each).
    const start = [10, -20];
    const spread = [1, 2];
    const rec = recording((t) => ((t[0] as number) > 10.5 ? -Infinity : 0), 2);
    await ensembleSample(rec.fn, start, spread, createRng(17), { walkers: 400, steps: 1, burn: 0 });
    const ball = rec.batches[0] as Float64Array;
    expect(ball.length).toBe(800);
    for (let d = 0; d < 2; d++) {
      for (let w = 0; w < 400; w++) expect(Math.abs((ball[w * 2 + d] as number) - (start[d] as number))).toBeLessThan(6 * (spread[d] as number));
      const m = moments(ball, 2, d);
      expectClose(m.mean, start[d] as number, { atol: (4 * (spread[d] as number)) / 20, source: 'closed form: mean of the starting ball' });
      expectClose(m.sd, spread[d] as number, { rtol: 0.2, source: 'closed form: width of the starting ball' });
    }
    // P(x > start + spread/2) = 1 − Φ(0.5) ≈ 0.31 (normal tables) of the first draws are outside: exactly those are redrawn.
    let outside = 0;
    for (let w = 0; w < 400; w++) if ((ball[w * 2] as number) > 10.5) outside++;
    expect(outside).toBeGreaterThan(80);
    expect((rec.batches[1] as Float64Array).length).toBe(2 * outside);
  });

  it('evaluates each step as two batches of half the walkers and reports every step to onStep', async () => {
    // Foreman-Mackey et al. 2013, Algorithm 3: the two halves are updated in turn, each from the other half.
    const rec = recording(gauss, 1);
    const calls: [number, number][] = [];
    const r = await ensembleSample(rec.fn, [0], [1], createRng(4), { walkers: 8, steps: 30, burn: 5, onStep: (s, n) => calls.push([s, n]) });
    expect(rec.batches.length).toBe(1 + 2 * 30);
    for (const b of rec.batches.slice(1)) {
      expect(b.length).toBe(4);
      for (const x of b) expect(Number.isFinite(x)).toBe(true);
    }
    expect(calls).toEqual(Array.from({ length: 30 }, (_, i) => [i + 1, 30]));
    expect(r.stepsRun).toBe(30);
  });

  it('reports, without a criterion, the autocorrelation time of the kept chain', async () => {
    // autocorrelationTime is checked against emcee 3.1.6 integrated_time in its own test; here the sampler must
    // measure it over the samples it returns (burn-in left out).
    const r = await ensembleSample(batchInThread(gauss, 1), [0], [1], createRng(6), { walkers: 8, steps: 400, burn: 100 });
    expect(r.converged).toBe(false);
    expect(r.tau.length).toBe(1);
    expect(r.tau[0]).toBe(autocorrelationTime(r.samples, 300, 8, 1, 0, 0));
    expect(Number.isFinite(r.tau[0])).toBe(true);
  });

  it('checks convergence every checkEvery kept steps and stops at such a step', async () => {
    // burn 130, checkEvery 50: checks at 180, 230, …; onStep's last report is the last step run.
    let last = 0;
    const r = await ensembleSample(batchInThread(gauss, 1), [0], [1], createRng(12), { walkers: 8, steps: 5000, burn: 130, tauFactor: 20, checkEvery: 50, move: 'differential', onStep: (s) => { last = s; } });
    expect(r.converged).toBe(true);
    expect((r.stepsRun - 130) % 50).toBe(0);
    expect(last).toBe(r.stepsRun);
    expect(r.stepsRun - 130).toBeGreaterThanOrEqual(20 * Math.max(...r.tau));
    expect(130).toBeGreaterThanOrEqual(5 * Math.max(...r.tau));
  });

  it('does not stop while the burn-in is shorter than 5 autocorrelation times, however long the kept chain', async () => {
    // Foreman-Mackey et al. 2013 / EnsembleOptions.tauFactor: both criteria must hold. τ here is well above 1 step,
    // so a burn-in of 2 steps never qualifies and the run goes to the cap.
    const r = await ensembleSample(batchInThread(gauss, 1), [0], [1], createRng(12), { walkers: 8, steps: 1500, burn: 2, tauFactor: 5, checkEvery: 50 });
    expect(Math.max(...r.tau)).toBeGreaterThan(1);
    expect(r.stepsRun - r.burn).toBeGreaterThanOrEqual(5 * Math.max(...r.tau));
    expect(r.converged).toBe(false);
    expect(r.stepsRun).toBe(1500);
  });
});

describe('ensembleSample: the differential-evolution proposal', () => {
  it('moves each walker by γ (x_j − x_k), two distinct walkers of the other half, with γ = 2.38/√(2 dim) (1 + 0.1 z)', async () => {
    // ter Braak 2006 (γ0 = 2.38/√(2 dim)) and Nelson et al. 2014, ApJS 210, 11 (the 10 % normal jitter): with 4 walkers in 1-D the other half holds exactly two
    // walkers a, b, so γ = |Δ| / |x_a − x_b| is recovered from each proposal. On a flat target every proposal is
    // accepted (the move is symmetric: log u < 0). Closed form: γ ~ N(γ0, (0.1 γ0)²), γ0 = 2.38/√2; 4000 values:
    // mean to 4 × 0.1 γ0/√4000, sd to ±10 %, every γ within 6 sd.
    const g0 = 2.38 / Math.SQRT2;
    const gammas: number[] = [];
    for (let seed = 0; seed < 20; seed++) {
      const rec = recording(() => 0, 1);
      await ensembleSample(rec.fn, [0], [1], createRng(100 + seed), { walkers: 4, steps: 50, burn: 0, move: 'differential' });
      const pos = Array.from(rec.batches[0] as Float64Array);
      for (let b = 1; b < rec.batches.length; b++) {
        const first = ((b - 1) % 2) * 2;
        const other = 2 - first;
        const prop = rec.batches[b] as Float64Array;
        const spreadOther = Math.abs((pos[other] as number) - (pos[other + 1] as number));
        for (let i = 0; i < 2; i++) {
          gammas.push(Math.abs((prop[i] as number) - (pos[first + i] as number)) / spreadOther);
          pos[first + i] = prop[i] as number;
        }
      }
    }
    expect(gammas.length).toBe(4000);
    for (const g of gammas) expect(Math.abs(g - g0)).toBeLessThan(6 * 0.1 * g0);
    let s = 0;
    let s2 = 0;
    for (const g of gammas) { s += g; s2 += g * g; }
    const mean = s / gammas.length;
    expectClose(mean, g0, { atol: (4 * 0.1 * g0) / Math.sqrt(4000), source: 'closed form: mean of γ, ter Braak 2006 / Nelson et al. 2014' });
    expectClose(Math.sqrt(s2 / gammas.length - mean * mean), 0.1 * g0, { rtol: 0.1, source: 'closed form: sd of γ' });
  });
});
