import { describe, expect, it } from 'vitest';
import { createRng } from '../../../src/core/random/createRng.ts';
import { selectionBias } from '../../../src/core/population/fitRelation.ts';
import { erdf, simulateAndFit, surveyWith, TRUTH } from '../../helpers/populationInjection.ts';

describe('fitRelation with the selection in the likelihood', () => {
  it('recovers the relation behind a survey that also requires a broad width', { timeout: 600_000 }, async () => {
    const { fit, naive, built, sim } = await simulateAndFit(surveyWith(1000), 6000, createRng(7), 400);
    for (const [p, truth] of [[fit.alpha, TRUTH.alpha], [fit.beta, TRUTH.beta], [fit.sigma, TRUTH.sigma]] as const) {
      const halfWidth = (p.p84 - p.p16) / 2;
      expect(Math.abs(p.p50 - truth)).toBeLessThan(2.5 * halfWidth);
    }
    // The naive fit's slope is flattened by the selection (Lauer et al. 2007, ApJ 670, 249: the bias is largest where
    // black holes are least massive); here it is below 0.6 against a true 1.05.
    expect(naive.beta.p50).toBeLessThan(0.6);
    // The selection bias at the sample's median M* is positive and close to the naive fit's excess there.
    const xs = sim.objects.map((o) => o.x).sort((a, b) => a - b);
    const mMed = xs[Math.floor(xs.length / 2)] as number;
    const weights = built.tables.map((_, t) => built.index.filter((i) => i === t).length);
    const bias = selectionBias(TRUTH.alpha, TRUTH.beta, TRUTH.sigma, mMed, built.tables, weights, erdf);
    expect(bias).toBeGreaterThan(0.3);
  });
});
