import { describe, expect, it } from 'vitest';
import { DEMO_MODEL } from '../../../scripts/lib/demoPopulation.ts';
import { drawIntrinsic, drawLogMstar, smfAt } from '../../../scripts/lib/demoHosts.ts';
import { mulberry32 } from '../../../scripts/lib/demoRandom.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('the demo’s intrinsic population', () => {
  it('draws host masses with the Schechter shape of the stellar mass function at the redshift', () => {
    // Expected fractions by integrating the Schechter shape per dex (Song et al. 2016 shape at z = 5, as recorded in
    // demoRelations.ts) numerically; 40 000 draws: binomial sd ≤ 0.0025, tolerance 4 sd = 0.01.
    const rng = mulberry32(5);
    const n = 40_000;
    const draws = Array.from({ length: n }, () => drawLogMstar(rng, 5.1, 7, 12));
    const { logMchar, alpha } = smfAt(5.1);
    const shape = (m: number): number => 10 ** ((1 + alpha) * (m - logMchar)) * Math.exp(-(10 ** (m - logMchar)));
    const integral = (a: number, b: number): number => {
      let s = 0;
      const k = 20_000;
      for (let i = 0; i < k; i++) s += shape(a + ((i + 0.5) * (b - a)) / k);
      return (s * (b - a)) / k;
    };
    for (const cut of [7.5, 8.5, 10]) {
      const expected = integral(cut, 12) / integral(7, 12);
      expectClose(draws.filter((m) => m > cut).length / n, expected, { atol: 0.01, source: `Schechter shape integrated numerically above log M* = ${cut}` });
    }
    expect(Math.min(...draws)).toBeGreaterThanOrEqual(7);
    expect(Math.max(...draws)).toBeLessThanOrEqual(12);
  });

  it('scatters black holes about the stated relation by its scatter, and virial masses about them by the calibration’s', () => {
    // 20 000 draws: the mean residual to ±4 × 0.5/√20000 = 0.014 dex, the scatter to ±2 % (internal check of the model).
    const rng = mulberry32(9);
    const t = DEMO_MODEL.truth;
    const res: number[] = [];
    const vir: number[] = [];
    for (let i = 0; i < 20_000; i++) {
      const d = drawIntrinsic(rng, DEMO_MODEL, 6, 'halpha');
      res.push(d.logMbh - (t.alpha + t.beta * (d.logMstar - t.pivotLogMstar)));
      vir.push(d.logMbhVirial - d.logMbh);
    }
    const mean = (x: number[]): number => x.reduce((a, b) => a + b, 0) / x.length;
    const sd = (x: number[]): number => Math.sqrt(mean(x.map((v) => (v - mean(x)) ** 2)));
    expectClose(mean(res), 0, { atol: 0.014, source: 'the demo truth: residuals about the relation average zero' });
    expectClose(sd(res), t.sigma, { rtol: 0.02, source: 'the demo truth: intrinsic scatter' });
    expectClose(sd(vir), 0.4, { rtol: 0.02, source: 'the RV15 Hα calibration scatter the science core records (0.4 dex)' });
  });
});
