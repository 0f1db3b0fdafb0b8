import { describe, expect, it } from 'vitest';
import { closestNames, editDistance } from '../../../src/catalog/config/closestNames.ts';

describe('closestNames', () => {
  it('counts insertions, deletions and substitutions ignoring case', () => {
    expect(editDistance('kitten', 'sitting')).toBe(3); // textbook example (common practice, no source)
    expect(editDistance('FWHM', 'fwhm')).toBe(0);
    expect(editDistance('', 'abc')).toBe(3);
    expect(editDistance('ligth', 'light')).toBe(1); // a swap of neighbours counts once
  });

  it('suggests names within a third of their length, nearest first', () => {
    expect(closestNames('cosmolgy', ['cosmology', 'seed', 'draws'])).toEqual(['cosmology']);
    expect(closestNames('F_HA', ['F_HB', 'F_HA_ERR', 'REDSHIFT', 'F_H'])).toEqual(['F_H', 'F_HB', 'F_HA_ERR']);
  });

  it('suggests nothing when no name is close', () => {
    expect(closestNames('colour', ['draws', 'seed'])).toEqual([]);
  });
});
