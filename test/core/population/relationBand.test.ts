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

  it('is empty without samples', () => {
    expect(relationBand([], [], [9, 10])).toEqual([]);
  });
});
