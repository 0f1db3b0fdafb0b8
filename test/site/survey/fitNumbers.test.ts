import { describe, expect, it } from 'vitest';
import type { RelationSummaryView } from '../../../src/site/build/populationSummary.ts';
import { fitNumbers, formatQuantiles } from '../../../src/site/survey/fitNumbers.ts';

const q = (p16: number, p50: number, p84: number) => ({ p16, p50, p84 });
const rel: RelationSummaryView = {
  objects: 28, assumedMstarErr: 2, medianLogMstar: 9.8, pivotLogMstar: 10,
  intrinsic: { alpha: q(6.5, 6.7, 6.95), beta: q(0.9, 1.1, 1.3), sigma: q(0.4, 0.5, 0.6) },
  naive: { alpha: q(7.3, 7.4, 7.5), beta: q(0.3, 0.4, 0.5), sigma: q(0.2, 0.3, 0.4) },
  selectionBiasDex: 0.812, detectableFraction: 0.0024, localRelation: 'rv15_agn', offsetFromLocal: q(-0.9, -0.6, -0.3), offsetSigmas: 2.04,
  sentence: 'invented',
};

describe('fitNumbers', () => {
  it('writes a median with the distances to its 84th and 16th percentiles, minus signs as minus', () => {
    expect(formatQuantiles(q(6.5, 6.7, 6.95))).toBe('6.70 (+0.25 / −0.20)');
    expect(formatQuantiles(q(-0.9, -0.6, -0.3))).toBe('−0.60 (+0.30 / −0.30)');
  });

  it('gives both fits, the bias, the detectable fraction, the offset and the count, in that order', () => {
    const rows = fitNumbers(rel);
    expect(rows.map((r) => r.key)).toEqual(['alpha', 'beta', 'sigma', 'naive-alpha', 'naive-beta', 'naive-sigma', 'bias', 'detectable', 'offset', 'objects']);
    const by = Object.fromEntries(rows.map((r) => [r.key, r]));
    expect(by.bias!.value).toBe('0.81');
    expect(by.detectable!.value).toBe('0.24 %');
    expect(by.offset!.note).toContain('2.0σ from zero');
    expect(by.objects!.note).toBe('2 without an M* error were given 0.3 dex');
  });
});
