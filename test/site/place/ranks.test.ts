import { describe, expect, it } from 'vitest';
import { nearestNeighbours } from '../../../src/site/place/neighbours.ts';
import { ordinalPercentile, percentileRank } from '../../../src/site/place/ranks.ts';

describe('percentileRank', () => {
  it('counts values below and half the ties, ignoring missing ones', () => {
    expect(percentileRank([1, 2, 3, 4, null, NaN], 2.5)).toEqual({ percentile: 50, n: 4 });
    expect(percentileRank([1, 2, 2, 4], 2)).toEqual({ percentile: 50, n: 4 });
    expect(percentileRank([1, 2, 3, 4], 10)).toEqual({ percentile: 100, n: 4 });
    expect(percentileRank([], 1)).toEqual({ percentile: null, n: 0 });
  });

  it('writes ordinals', () => {
    expect([1, 2, 3, 4, 11, 12, 13, 21, 22, 37.4, 100].map(ordinalPercentile)).toEqual(['1st', '2nd', '3rd', '4th', '11th', '12th', '13th', '21st', '22nd', '37th', '100th']);
  });
});

describe('nearestNeighbours', () => {
  it('standardises each coordinate by its spread before measuring distance', () => {
    // x spreads over 0..300, y over 0..3: without standardising, x would dominate
    const pop = [
      { id: 'a', c: [0, 0] },
      { id: 'b', c: [100, 3] },
      { id: 'c', c: [200, 0] },
      { id: 'd', c: [300, 3] },
    ];
    const got = nearestNeighbours([110, 0], pop, (p) => p.c, 2);
    // sd(x) = 129.10, sd(y) = 1.7321 (sample sd, computed by hand):
    // a: hypot(110/129.1, 0) = 0.852; c: hypot(90/129.1, 0) = 0.697; b: hypot(10/129.1, 3/1.7321) = 1.734
    expect(got.map((n) => n.item.id)).toEqual(['c', 'a']);
    expect(got[0]!.distance).toBeCloseTo(90 / 129.0994, 4);
  });

  it('skips members missing a coordinate and returns nothing for an incomplete target', () => {
    const pop = [{ c: [1, null] }, { c: [2, 2] }, { c: [3, 3] }];
    expect(nearestNeighbours([2, 2], pop, (p) => p.c, 5)).toHaveLength(2);
    expect(nearestNeighbours([2, null], pop, (p) => p.c, 5)).toEqual([]);
  });
});
