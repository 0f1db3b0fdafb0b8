import { describe, expect, it } from 'vitest';
import { parsePopulationArgs } from '../../../src/catalog/cli/populationArgs.ts';

describe('parsePopulationArgs', () => {
  it('reads --threads as a whole number, in both spellings', () => {
    expect(parsePopulationArgs(['-c', 'x.yaml', '--threads', '2']).threads).toBe(2);
    expect(parsePopulationArgs(['-c', 'x.yaml', '--threads=3']).threads).toBe(3);
    expect(parsePopulationArgs(['-c', 'x.yaml']).threads).toBeUndefined();
  });

  it('refuses a thread count that is not a whole number from 1 to 256, naming the value', () => {
    for (const bad of ['0', '1.5', 'two', '300']) expect(() => parsePopulationArgs(['--threads', bad])).toThrow(`--threads must be a whole number from 1 to 256, got "${bad}"`);
  });
});
