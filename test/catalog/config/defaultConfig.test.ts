import { describe, expect, it } from 'vitest';
import { defaultConfig } from '../../../src/catalog/config/index.ts';

describe('defaultConfig', () => {
  it('holds the documented default settings', () => {
    // The defaults stated in the project brief (Planck18; RV15 Hα, VP06 Hβ, S11 Mg II, VP06 C IV;
    // Hα→L5100 with BC5100 = 9.26 (Shen et al. 2011, ApJS 194, 45, the set with BC3000 = 5.15 and BC1350 = 3.81); 1.26e38; ε = 0.1; seeds at z = 20, λ = 1, duty cycle 1,
    // 1e2/1e5 Msun; RV15 AGN; Calzetti 2000; 2.86; 2000 draws; seed 1).
    expect(defaultConfig().settings).toEqual({
      cosmology: 'planck18',
      calibrations: { halpha: 'rv15_halpha', hbeta: 'vp06_hbeta', mgii: 's11_mgii', civ: 'vp06_civ' },
      linePriority: ['halpha', 'hbeta', 'mgii', 'civ'],
      hbetaWithoutContinuum: 'line',
      bolometric: 'halpha_gh05_bc5100',
      bc5100: 9.26,
      eddingtonPerMsun: 1.26e38,
      efficiency: 0.1,
      zSeed: 20,
      lambdaSeed: 1,
      dutyCycle: 1,
      lightSeedMsun: 100,
      heavySeedMsun: 100000,
      localRelation: 'rv15_agn',
      dustCurve: 'calzetti00',
      intrinsicBalmer: 2.86,
      draws: 2000,
      seed: 1,
    });
  });

  it('maps no columns, reads no file and serves the site from the root', () => {
    const cfg = defaultConfig();
    expect(cfg.columns).toEqual({});
    expect(cfg.input).toBeUndefined();
    expect(cfg.output).toBeUndefined();
    expect(cfg.site).toEqual({ base: '/' });
  });

  it('returns a fresh object each time, so callers may change it', () => {
    const a = defaultConfig();
    a.settings.calibrations.halpha = 'gh05_halpha';
    a.settings.linePriority.pop();
    expect(defaultConfig().settings.calibrations.halpha).toBe('rv15_halpha');
    expect(defaultConfig().settings.linePriority).toHaveLength(4);
  });
});
