import { describe, expect, it } from 'vitest';
import { getCosmology } from '../../../src/core/cosmology/index.ts';
import { logMassAfter } from '../../../src/core/growth/index.ts';
import { cosmicTimeTicks, formatAge } from '../../../src/site/charts/cosmicTimeTicks.ts';
import { growthTracks } from '../../../src/site/charts/growthTracks.ts';
import { massVsRedshift } from '../../../src/site/charts/massVsRedshift.ts';
import { chartSettings } from '../../../src/site/charts/chartSettings.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { fakeRows, markElements, svgOf, testDocument } from './fakeRows.ts';

const settings = chartSettings({ cosmology: 'planck18', zSeed: 20, efficiency: 0.1, lightSeedMsun: 100, heavySeedMsun: 1e5 });
const cosmo = getCosmology('planck18');

describe('massVsRedshift', () => {
  it('draws points, limits and mass error bars', () => {
    const rows = fakeRows({ n: 30, limitEvery: 3 });
    const el = massVsRedshift(rows, { document: testDocument(), settings });
    expect(svgOf(el).tagName.toLowerCase()).toBe('svg');
    expect(markElements(el, 'catalog point')).toHaveLength(20);
    expect(markElements(el, 'upper limit')).toHaveLength(10);
    expect(markElements(el, 'catalog error bar y')).toHaveLength(20);
  });

  it('starts the growth tracks at the seed masses at z_seed and ends them where src/core/growth says', () => {
    const tracks = growthTracks(cosmo, settings, 4);
    const [light, heavy] = tracks;
    expect(light!.points[0]).toEqual({ z: 20, logM: 2 });
    expect(heavy!.points[0]).toEqual({ z: 20, logM: 5 });
    const dt = cosmo.ageGyr(4) - cosmo.ageGyr(20);
    expectClose(light!.points.at(-1)!.logM, logMassAfter(2, dt, 0.1, 1, 1), { atol: 1e-12, source: 'src/core/growth logMassAfter (same model)' });
    expect(light!.points.at(-1)!.z).toBe(4);
    // independent check of the e-folding: at ε = 0.1, λ = 1 the Salpeter time is 50.05 Myr
    // (0.1/0.9 × t_Edd with t_Edd = 0.45049 Gyr, computed from CODATA 2018 constants), so
    // log M grows by log10(e) · Δt / 0.050054 Gyr; 4 significant digits in the time.
    expectClose(heavy!.points.at(-1)!.logM, 5 + (Math.LOG10E * dt) / 0.050054, { rtol: 1e-4, source: 'computed: Salpeter time ε/(1−ε)·σ_T c/(4πG m_p)' });
  });

  it('draws both tracks and labels the top axis with ages at their redshifts', () => {
    const el = massVsRedshift(fakeRows({ n: 20 }), { document: testDocument(), settings });
    expect(markElements(el, 'growth track light')).toHaveLength(1);
    expect(markElements(el, 'growth track heavy')).toHaveLength(1);
    const ticks = cosmicTimeTicks(cosmo, [3.8, 20.5], 8, 56 / 560);
    expect(ticks.length).toBeGreaterThan(3);
    for (const t of ticks) expectClose(cosmo.ageGyr(t.z), t.ageGyr, { rtol: 1e-9, source: 'internal: redshiftAtAgeGyr inverts ageGyr' });
    const text = svgOf(el).textContent ?? '';
    for (const t of ticks) expect(text).toContain(t.label);
    expect(text).toContain('Age of the universe');
  });

  it('keeps the age ticks at least 56 px apart with z_seed = 25 (they ran together as "600 Myr800 Myr1.2 Gyr")', () => {
    const wide = { ...settings, zSeed: 25 };
    const rows = fakeRows({ n: 20 });
    const el = massVsRedshift(rows, { document: testDocument(), settings: wide });
    const labels = [...svgOf(el).querySelectorAll('g.census-cosmic-time-axis text')].map((t) => t.textContent ?? '').filter((t) => /yr$/.test(t));
    expect(labels.length).toBeGreaterThan(2);
    const ticks = cosmicTimeTicks(cosmo, [3.5, 25.5], 8, 56 / 560).map((t) => t.z);
    for (let i = 1; i < ticks.length; i++) expect(((ticks[i - 1]! - ticks[i]!) / 22) * 560).toBeGreaterThanOrEqual(56);
    // without the spacing rule the crowded ticks come back
    const crowded = cosmicTimeTicks(cosmo, [3.5, 25.5], 8, 0).map((t) => t.z);
    expect(crowded.some((z, i) => i > 0 && ((crowded[i - 1]! - z) / 22) * 560 < 56)).toBe(true);
  });

  it('puts each seed label below the start of its track, where the rising track does not cross it', () => {
    const el = massVsRedshift(fakeRows({ n: 20 }), { document: testDocument(), settings });
    const groups = [...svgOf(el).querySelectorAll('g.census-growth-track-label')];
    expect(groups).toHaveLength(2);
    // shifted down (SVG y grows downward) from the seed point; the track only rises after its seed
    for (const g of groups) {
      const m = /translate\(([-\d.]+),\s*([-\d.]+)\)/.exec(g.getAttribute('transform') ?? '');
      expect(Number(m?.[2])).toBeGreaterThan(0);
    }
    const [light] = growthTracks(cosmo, settings, 4);
    expect(light!.points.every((p, i) => i === 0 || p.logM >= light!.points[i - 1]!.logM)).toBe(true);
  });

  it('formats ages in Myr below 1 Gyr', () => {
    expect([0.3, 0.25, 1, 1.5].map(formatAge)).toEqual(['300 Myr', '250 Myr', '1 Gyr', '1.5 Gyr']);
  });

  it('draws a large selection as a density', () => {
    const el = massVsRedshift(fakeRows({ n: 6000 }), { document: testDocument(), settings });
    expect(markElements(el, 'catalog point')).toHaveLength(0);
    expect(markElements(el, 'density').length).toBeGreaterThan(0);
  });
});
