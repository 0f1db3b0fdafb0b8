import { describe, expect, it } from 'vitest';
import { chartSettings } from '../../../src/site/charts/chartSettings.ts';

describe('chartSettings', () => {
  it('reads the settings inside the metadata provenance record', () => {
    const s = chartSettings({ settings: { cosmology: 'wmap9', zSeed: 25, efficiency: 0.2, lightSeedMsun: 50, heavySeedMsun: 3e4, localRelation: 'kh13_mbulge', eddingtonPerMsun: 1.3e38 }, cosmology: { id: 'wmap9' } });
    expect(s).toEqual({ cosmology: 'wmap9', zSeed: 25, efficiency: 0.2, lightSeedMsun: 50, heavySeedMsun: 3e4, localRelation: 'kh13_mbulge', eddingtonPerMsun: 1.3e38 });
  });

  it('reads the config spelling and takes defaults for the rest', () => {
    const s = chartSettings({ z_seed: 18, seeds: { light: 200, heavy: 1e6 }, local_relation: 'rv15_early' });
    expect(s.zSeed).toBe(18);
    expect(s.lightSeedMsun).toBe(200);
    expect(s.heavySeedMsun).toBe(1e6);
    expect(s.localRelation).toBe('rv15_early');
    expect(s.cosmology).toBe('planck18');
  });
});
