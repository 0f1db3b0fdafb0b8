import { describe, expect, it } from 'vitest';
import { calibrationFormula, lbolRouteDescription, localFormula, methodsView } from '../../../src/site/build/methodsView.ts';
import { normalizeMeta } from '../../../src/site/build/siteMeta.ts';
import type { SiteMeta } from '../../../src/site/build/siteMeta.ts';

// A sidecar in the shape the CLI writes (src/catalog/metadata/settingsProvenance.ts): the settings, and the records behind each id.
const sidecar = {
  title: 'T',
  settings: {
    settings: { cosmology: 'planck18', calibrations: { halpha: 'rv15_halpha' }, linePriority: ['halpha'], bolometric: 'halpha_gh05_bc5100', bc5100: 10.33, eddingtonPerMsun: 1.26e38, efficiency: 0.1, zSeed: 20, localRelation: 'rv15_agn', dustCurve: 'calzetti00', intrinsicBalmer: 2.86, draws: 2000, seed: 1 },
    cosmology: { id: 'planck18', name: 'Planck18', H0: 67.66, reference: 'Planck Collaboration 2020' },
    calibrations: { halpha: { id: 'rv15_halpha', line: 'halpha', logEps: 0.0314, a: 6.57, b: 0.47, c: 2.06, luminosity: 'line', logLpivot: 42, scatterDex: 0.4, reference: 'RV15 eq. 5' } },
    eddington: { lEddPerMsun: 1.26e38, reference: 'Shen 2011' },
    growth: { formula: 'M(t) = …', reference: 'Salpeter 1964', tEddGyr: 0.45 },
    constants: { speedOfLight: { value: 29979245800, unit: 'cm s^-1', reference: 'SI' } },
  },
};

describe('methodsView', () => {
  const m = methodsView(normalizeMeta(sidecar));

  it('writes each calibration as a formula from its coefficients, with scatter and reference', () => {
    expect(m.calibrations).toHaveLength(1);
    expect(m.calibrations[0]).toMatchObject({ line: 'halpha', id: 'rv15_halpha', scatter: '0.4', reference: 'RV15 eq. 5' });
    expect(m.calibrations[0]!.formula).toBe('log(M_BH/M☉) = 0.031 + 6.570 + 0.47 · log(L_line / 10^42 erg s⁻¹) + 2.06 · log(FWHM / 1000 km s⁻¹)');
  });

  it('reads the cosmology, the Eddington luminosity, the growth model, the Monte Carlo settings and the constants', () => {
    expect(m.cosmology).toMatchObject({ id: 'planck18', name: 'Planck18', reference: 'Planck Collaboration 2020' });
    expect(m.eddington[0]).toMatchObject({ value: '1.26×10³⁸', reference: 'Shen 2011' });
    expect(m.growth.reference).toBe('Salpeter 1964');
    expect(m.monteCarlo).toEqual([{ name: 'Monte Carlo draws per object', value: '2000' }, { name: 'Global random seed', value: '1' }]);
    expect(m.constants[0]).toMatchObject({ name: 'Speed of light c', value: '2.998×10¹⁰', unit: 'cm s⁻¹' });
  });

  it('fills the local relation and the bolometric reference from the tool records when the sidecar names only the id', () => {
    expect(m.local.reference).toMatch(/Reines & Volonteri 2015/);
    expect(m.local.formula).toBe('log(M_BH/M☉) = 7.450 + 1.05 · (log(M*/M☉) − 11)');
    expect(m.bolometric.reference).toMatch(/Greene & Ho 2005.*eq\. 1/);
  });

  it('shows reader-facing names and rounded values, never the program identifiers (tEddGyr 0.4504904122304202, scatterDex, fwhmKms)', () => {
    const raw = structuredClone(sidecar) as typeof sidecar & { settings: { calibrations: { halpha: Record<string, unknown> } } };
    raw.settings.growth.tEddGyr = 0.4504904122304202;
    raw.settings.calibrations.halpha.validity = { logL: [40, 44], fwhmKms: [500, 10000] };
    raw.settings.calibrations.halpha.notes = 'Estimates the continuum with logL5100FromLogLHbeta when needed.';
    const v = methodsView(normalizeMeta(raw));
    const shown = JSON.stringify(v);
    for (const id of ['tEddGyr', 'scatterDex', 'fwhmKms', 'logL5100FromLogLHbeta', '0.4504904122304202']) expect(shown).not.toContain(id);
    expect(v.growth.params).toContainEqual({ name: 'Eddington time t_Edd (Gyr)', value: '0.4505' });
    expect(v.calibrations[0]!.validity).toBe('log L (erg s⁻¹) 40–44; FWHM (km s⁻¹) 500–10000');
  });

  it('lists BC5100 once though both the settings and the bolometric record carry it', () => {
    const raw = structuredClone(sidecar) as Record<string, unknown> & { settings: Record<string, unknown> };
    raw.settings.bolometric = { method: 'halpha_gh05_bc5100', bc5100: 10.33, reference: 'GH05; Richards 2006' };
    const v = methodsView(normalizeMeta(raw));
    expect(v.bolometric.params.filter((p) => /BC5100/.test(p.name))).toHaveLength(1);
  });

  it('gives no formula for records without coefficients', () => {
    expect(calibrationFormula({ id: 'x' })).toBeUndefined();
    expect(localFormula({})).toBeUndefined();
  });
});

describe('methodsView bolometric routes', () => {
  it('lists every fallback route the sidecar records, with its reference', () => {
    const m = methodsView({
      raw: {
        settings: {
          settings: { bolometric: 'halpha_gh05_bc5100', bc5100: 9.26 },
          bolometric: {
            method: 'halpha_gh05_bc5100',
            routes: {
              halpha_gh05_bc5100: { records: [], reference: 'Greene & Ho 2005, ApJ 630, 122, eq. 1; Shen et al. 2011' },
              bc3000: { records: [], reference: 'Shen et al. 2011, ApJS 194, 45' },
            },
          },
        },
      },
      columns: {},
    } as unknown as SiteMeta);
    expect(m.bolometric.routes.map((r) => [r.label, r.reference])).toEqual([
      ['halpha_gh05_bc5100', 'Greene & Ho 2005, ApJ 630, 122, eq. 1; Shen et al. 2011'],
      ['bc3000', 'Shen et al. 2011, ApJS 194, 45'],
    ]);
    expect(m.bolometric.routes[1]!.text).toMatch(/3000 Å continuum/);
  });

  it("describes an object's route with the correction and reference this catalog recorded, not the tool's default", () => {
    // As the demo's sidecar records them (BC5100 = 10.33 from Richards et al. 2006, the Hα papers' choice).
    const richards = { id: 'richards06_bc5100', band: 'l5100', bc: 10.33, reference: 'Richards et al. 2006, ApJS 166, 470 (mean quasar SED), as adopted by Matthee et al. 2024, ApJ 963, 129' };
    const m = methodsView({
      raw: {
        settings: {
          settings: { bolometric: 'halpha_gh05_bc5100', bc5100: 10.33 },
          bolometric: {
            method: 'halpha_gh05_bc5100',
            routes: {
              halpha_gh05_bc5100: { records: [{ id: 'gh05_eq1', norm: 5.25e42 }, richards], reference: `Greene & Ho 2005, ApJ 630, 122, eq. 1; ${richards.reference}` },
              bc5100: { records: [richards], reference: richards.reference },
            },
          },
        },
      },
      columns: {},
    } as unknown as SiteMeta);
    const ha = lbolRouteDescription(m, 'halpha_gh05_bc5100')!;
    expect(ha.text).toMatch(/multiplied by a fixed bolometric correction BC5100 = 10\.33$/);
    expect(ha.reference).toBe(`Greene & Ho 2005, ApJ 630, 122, eq. 1; ${richards.reference}`);
    expect(ha.reference).not.toMatch(/9\.26|Shen/);
    expect(lbolRouteDescription(m, 'bc5100')).toEqual({ text: 'The measured 5100 Å continuum multiplied by a fixed bolometric correction BC5100 = 10.33', reference: richards.reference });
    // A value the words already give is not repeated.
    const m3 = methodsView({
      raw: { settings: { settings: { bolometric: 'bc3000' }, bolometric: { method: 'bc3000', routes: { bc3000: { records: [{ id: 'shen11_bc3000', band: 'l3000', bc: 5.15 }], reference: 'Shen et al. 2011, ApJS 194, 45' } } } } },
      columns: {},
    } as unknown as SiteMeta);
    expect(lbolRouteDescription(m3, 'bc3000')!.text).toBe('The measured 3000 Å continuum multiplied by a fixed bolometric correction (5.15)');
    // A route the sidecar does not record keeps the tool's words; an unknown label has none.
    expect(lbolRouteDescription(m, 'bc3000')?.text).toMatch(/3000 Å continuum/);
    expect(lbolRouteDescription(m, 'nonsense')).toBeUndefined();
  });
});
