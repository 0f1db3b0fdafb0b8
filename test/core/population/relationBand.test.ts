import { describe, expect, it } from 'vitest';
import { relationBand } from '../../../src/core/population/relationBand.ts';
import { RELATION_PIVOT } from '../../../src/core/population/relationLikelihood.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { standardNormal } from '../../../src/core/random/standardNormal.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('relationBand', () => {
  it('gives ±1σ of α at the pivot when only α varies (normal samples: 16th–84th percentiles are ±1σ)', () => {
    const rng = createRng(11);
    const n = 20000;
    const alpha = Float64Array.from({ length: n }, () => 7 + 0.1 * standardNormal(rng));
    const beta = new Float64Array(n).fill(1.2);
    const [p] = relationBand(alpha, beta, [RELATION_PIVOT]);
    // the percentiles of 20000 normal draws are within ~0.01σ of ±1σ (standard error of a quantile); 0.004 dex allows 4 of them
    expectClose(p!.mid, 7, { atol: 0.004, source: 'common practice, no source: median of a normal' });
    expectClose(p!.hi - p!.mid, 0.1, { atol: 0.004, source: 'common practice, no source: 84th percentile of a normal is +1σ' });
    expectClose(p!.mid - p!.lo, 0.1, { atol: 0.004, source: 'common practice, no source: 16th percentile is −1σ' });
  });

  it('widens away from the pivot with the slope’s spread, and has no width at the pivot when only β varies', () => {
    const rng = createRng(12);
    const n = 20000;
    const alpha = new Float64Array(n).fill(7);
    const beta = Float64Array.from({ length: n }, () => 1 + 0.2 * standardNormal(rng));
    const band = relationBand(alpha, beta, [RELATION_PIVOT - 1, RELATION_PIVOT, RELATION_PIVOT + 2]);
    expect(band[1]!.hi - band[1]!.lo).toBe(0);
    // at Δx = −1 and +2 the mean's spread is 0.2 × |Δx|: 16–84 % width 0.4 and 0.8 dex (within the quantiles' sampling error)
    expectClose(band[0]!.hi - band[0]!.lo, 0.4, { atol: 0.012, source: 'internal: linear in β, ±1σ of a normal' });
    expectClose(band[2]!.hi - band[2]!.lo, 0.8, { atol: 0.024, source: 'internal: linear in β, ±1σ of a normal' });
    expectClose(band[2]!.mid, 7 + 2, { atol: 0.01, source: 'internal: α + median β · Δx' });
  });

  it('takes the nearest rank below at 16, 50 and 84 %, over the pairs that both arrays have', () => {
    // numpy 1.24.2 percentile(α + β (x − 10), [16, 50, 84], method='lower') over the ten pairs: (6.8, 7.0, 7.2) at
    // x = 10 and (8.15, 8.625, 8.7) at x = 11.5. The two extra α samples have no β and must not count.
    const alpha = [7.3, 6.9, 7.1, 7.0, 6.8, 7.2, 7.4, 6.7, 7.05, 6.95, 100, -100];
    const beta = [1.0, 1.2, 0.8, 1.1, 0.9, 1.0, 1.3, 0.7, 1.05, 0.95];
    const expected = [[6.8, 7.0, 7.2], [8.15, 8.625, 8.7]] as const;
    relationBand(alpha, beta, [10, 11.5]).forEach((p, i) => {
      const [lo, mid, hi] = expected[i]!;
      const source = `computed with numpy 1.24.2 percentile(method='lower'), x = ${p.x}`;
      expectClose(p.lo, lo, { rtol: 1e-15, source });
      expectClose(p.mid, mid, { rtol: 1e-15, source });
      expectClose(p.hi, hi, { rtol: 1e-15, source });
    });
  });

  it('is empty without samples', () => {
    expect(relationBand([], [], [9, 10])).toEqual([]);
  });
});
