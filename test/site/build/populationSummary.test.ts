import { describe, expect, it } from 'vitest';
import { normalizePopulationSummary } from '../../../src/site/build/populationSummary.ts';

const q = (p16: number, p50: number, p84: number) => ({ p16, p50, p84 });
// an invented summary in the shape dawn-census population writes (src/catalog/population/runPopulation.ts)
const written = {
  cosmology: 'planck18',
  seed: 1,
  survey: { fields: [{ name: 'F1', areaArcmin2: 10, sourcePlaneAreaArcmin2: null }], wavelengthRangeAngstrom: [9000, 53000], minFwhmKms: 1000, minSnr: 5 },
  objects: 40,
  withVmax: 30,
  belowSurveyLimit: 5,
  densities: [{ quantity: 'log_mbh', zRange: [4, 5], bins: [{ lo: 6, hi: 6.5, count: 2, phi: 1e-6, phiLo: 4e-7, phiHi: 2e-6, phiP16: 8e-7, phiP84: 1.3e-6 }] }],
  relation: {
    objects: 28, assumedMstarErr: 2, medianLogMstar: 9.8, pivotLogMstar: 10,
    intrinsic: { alpha: q(6.5, 6.7, 6.9), beta: q(0.9, 1.1, 1.3), sigma: q(0.4, 0.5, 0.6) },
    naive: { alpha: q(7.3, 7.4, 7.5), beta: q(0.3, 0.4, 0.5), sigma: q(0.2, 0.3, 0.4) },
    selectionBiasDex: 0.8, detectableFraction: 0.01, localRelation: 'rv15_agn', offsetFromLocal: q(-0.2, 0.1, 0.4), offsetSigmas: 0.33,
    sentence: 'Corrected for selection, the sample is consistent with the local relation within 0.3σ.',
  },
  assumptions: { eddingtonRatio: { meanLog: -0.6, sigmaLog: 0.4 }, sampler: { walkers: 16, steps: 800, burn: 300 } },
};

describe('normalizePopulationSummary', () => {
  it('keeps every part the page shows from a summary as written', () => {
    const s = normalizePopulationSummary(written);
    expect(s.relation?.sentence).toBe(written.relation.sentence);
    expect(s.relation?.intrinsic.beta).toEqual(q(0.9, 1.1, 1.3));
    expect(s.densities).toEqual([{ quantity: 'log_mbh', zLo: 4, zHi: 5, bins: [written.densities[0]!.bins[0]] }]);
    expect(s.wavelengthRangeAngstrom).toEqual([9000, 53000]);
    expect(s.eddingtonRatio).toEqual({ meanLog: -0.6, sigmaLog: 0.4 });
    expect(s.sampler).toEqual({ walkers: 16, steps: 800, burn: 300 });
    expect(s.fields).toEqual([{ name: 'F1', areaArcmin2: 10, sourcePlaneAreaArcmin2: null }]);
  });

  it('turns a missing or malformed relation into null, and a run without a fit keeps its note', () => {
    const s = normalizePopulationSummary({ ...written, relation: null, relationNote: 'fewer than 8 objects with a V_max and a host mass: no relation fit' });
    expect(s.relation).toBeNull();
    expect(s.relationNote).toContain('fewer than 8');
    expect(normalizePopulationSummary({ ...written, relation: { ...written.relation, intrinsic: { alpha: 'x' } } }).relation).toBeNull();
  });

  it('drops density bins and functions it cannot read, and tolerates a summary that is not an object', () => {
    const s = normalizePopulationSummary({ densities: [{ quantity: 'log_mbh', zRange: [4, 5], bins: [{ lo: 6 }] }, { quantity: 'mass', zRange: [4, 5], bins: [] }] });
    expect(s.densities).toEqual([{ quantity: 'log_mbh', zLo: 4, zHi: 5, bins: [] }]);
    expect(normalizePopulationSummary('not json').relation).toBeNull();
    expect(normalizePopulationSummary(null).densities).toEqual([]);
  });
});
