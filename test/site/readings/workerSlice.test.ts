import { describe, expect, it } from 'vitest';
import { workerSlice } from '../../../src/site/readings/workerSlice.ts';

describe('the slice of the population each worker derives', () => {
  it('covers every object once, in order, for any number of workers', () => {
    for (const n of [0, 1, 5, 400, 9999]) {
      for (const k of [1, 2, 3, 4]) {
        const slices = Array.from({ length: k }, (_, i) => workerSlice(n, i, k));
        expect(slices[0]![0]).toBe(0);
        for (let i = 1; i < k; i++) expect(slices[i]![0]).toBe(slices[i - 1]![1]);
        expect(slices[k - 1]![1]).toBe(n);
      }
    }
  });

  it('gives equal slices but the last', () => {
    expect([0, 1, 2].map((i) => workerSlice(10, i, 3))).toEqual([[0, 4], [4, 8], [8, 10]]);
  });
});
