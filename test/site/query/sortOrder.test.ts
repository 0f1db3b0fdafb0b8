import { describe, expect, it } from 'vitest';
import { sortOrder } from '../../../src/site/query/sortOrder.ts';

describe('sortOrder', () => {
  it('sorts numbers both ways and keeps missing values last', () => {
    const v = [3, null, 1, 2, Number.NaN];
    expect(Array.from(sortOrder(v, 'ascending'))).toEqual([2, 3, 0, 1, 4]);
    expect(Array.from(sortOrder(v, 'descending'))).toEqual([0, 3, 2, 1, 4]);
  });
  it('sorts text numerically aware and is stable for ties', () => {
    expect(Array.from(sortOrder(['DC-10', 'DC-2', 'dc-2', 'DC-1'], 'ascending'))).toEqual([3, 1, 2, 0]);
  });
});
