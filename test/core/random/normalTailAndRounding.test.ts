import { describe, expect, it } from 'vitest';
import { createRng, percentiles16_50_84, quantile, standardNormal } from '../../../src/core/random/index.ts';
import { normalCdf } from './normalCdf.ts';

describe('the ziggurat\'s tail beyond R = 3.4426 (Marsaglia 1964 exponential rejection)', () => {
  it('puts the normal share of 4e6 draws beyond ±R on each side, and within the tail the normal share beyond 4 and 4.5', () => {
    const R = 3.442619855899; // Marsaglia & Tsang 2000, 128 layers
    const n = 4_000_000;
    const rng = createRng(777);
    let below = 0;
    let above = 0;
    let beyond4 = 0;
    let beyond45 = 0;
    for (let i = 0; i < n; i++) {
      const x = standardNormal(rng);
      if (x < -R) below++;
      else if (x > R) above++;
      const a = Math.abs(x);
      if (a > 4) beyond4++;
      if (a > 4.5) beyond45++;
    }
    // Expected counts from the normal tail Q(x) = 1 − Φ(x) (test/core/random/normalCdf.ts); Poisson 5σ bounds.
    const q = (x: number) => 1 - normalCdf(x);
    const within = (k: number, mean: number) => expect(Math.abs(k - mean), `${k} against ${mean.toFixed(1)}`).toBeLessThan(5 * Math.sqrt(mean));
    within(below, n * q(R)); // ≈ 1153
    within(above, n * q(R));
    // Among the tail draws, the Gaussian tail (not a plain exponential) beyond 4: Q(4)/Q(R) = 0.110 (exponential: 0.146).
    within(beyond4, 2 * n * q(4)); // ≈ 253
    within(beyond45, 2 * n * q(4.5)); // ≈ 27
  });
});

describe('interpolation rounded as numpy does', () => {
  it('quantile and percentiles16_50_84 give numpy.percentile\'s doubles, which take a + (b − a)t below t = 0.5 and b − (b − a)(1 − t) from 0.5 up', () => {
    // Computed with numpy 1.24.2: np.percentile([a, b], [16, 50, 84]) and np.quantile([a, b], 0.3); each pair
    // chosen so the two forms of the interpolation round differently at one of these t.
    const cases: [number, number, [number, number, number], number][] = [
      [-0.286, 1.394, [-0.017199999999999993, 0.5539999999999999, 1.1252], 0.21800000000000003],
      [0.047, 1.81, [0.32908000000000004, 0.9285, 1.52792], 0.5759000000000001],
      [-1.892, -0.356, [-1.64624, -1.124, -0.6017600000000001], -1.4312],
      [0.779, 3.158, [1.15964, 1.9685, 2.77736], 1.4927000000000001],
    ];
    for (const [a, b, [p16, p50, p84], q30] of cases) {
      expect(percentiles16_50_84(new Float64Array([b, a])), `[${a}, ${b}]`).toEqual({ p16, p50, p84 });
      expect(quantile(new Float64Array([b, a]), 0.3)).toBe(q30);
      expect(quantile(new Float64Array([a, b]), 0.5)).toBe(p50);
    }
  });
});
