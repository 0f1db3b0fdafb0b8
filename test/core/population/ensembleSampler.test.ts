import { describe, expect, it } from 'vitest';
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
    const a = await ensembleSample(batchInThread(logProb, 1), [1], [0.5], createRng(5), { walkers: 8, steps: 200, burn: 50 });
    const b = await ensembleSample(batchInThread(logProb, 1), [1], [0.5], createRng(5), { walkers: 8, steps: 200, burn: 50 });
    expect(Array.from(a.samples)).toEqual(Array.from(b.samples));
    expect(Math.min(...a.samples)).toBeGreaterThanOrEqual(0);
    // Exponential(1): mean 1 (closed form); 8 × 150 draws, autocorrelated: ±0.25.
    expectClose(moments(a.samples, 1, 0).mean, 1, { atol: 0.25, source: 'closed form: mean of Exp(1)' });
  });
});
