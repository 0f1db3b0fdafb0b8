import { describe, expect, it } from 'vitest';
import { defaultSettings } from '../../../src/catalog/config/defaultConfig.ts';
import { settingsProvenance } from '../../../src/catalog/metadata/settingsProvenance.ts';
import type { DeriveSettings, ObjectInputs } from '../../../src/core/derive/types.ts';
import { deriveObject } from '../../../src/core/derive/deriveObject.ts';
import { createRng } from '../../../src/core/random/createRng.ts';

const settings = (over: Partial<DeriveSettings> = {}): DeriveSettings => ({ ...defaultSettings(), ...over });

describe('settingsProvenance', () => {
  it('records the cosmological parameters and the reference of the chosen cosmology', () => {
    const p = settingsProvenance(settings({ cosmology: 'planck18' }));
    // Planck 2018 VI (A&A 641, A6) Table 2, as in ../shared/reference/published-checks.md.
    expect(p.cosmology).toMatchObject({ id: 'planck18', H0: 67.66, Om0: 0.30966, Tcmb0: 2.7255 });
    expect(p.cosmology.reference).toMatch(/A&A 641, A6/);
  });

  it('records each line calibration with its coefficients and reference', () => {
    const p = settingsProvenance(settings());
    // Reines & Volonteri 2015 (ApJ 813, 82) form: 6.57 + 0.47 log L + 2.06 log FWHM (published-checks.md).
    expect(p.calibrations.halpha).toMatchObject({ id: 'rv15_halpha', a: 6.57, b: 0.47, c: 2.06 });
    expect(p.calibrations.civ).toMatchObject({ id: 'vp06_civ', a: 6.66, b: 0.53 });
    expect(String(p.calibrations.hbeta?.reference)).toMatch(/Vestergaard & Peterson 2006/);
  });

  it('records the bolometric corrections the method uses', () => {
    const fromHalpha = settingsProvenance(settings({ bolometric: 'halpha_gh05_bc5100', bc5100: 10.33 })).bolometric;
    expect(fromHalpha.records.map((r) => r.reference)).toEqual([expect.stringMatching(/Greene & Ho 2005.*eq\. 1/), expect.stringMatching(/Richards et al\. 2006/)]);
    // BC3000 = 5.15 (Shen et al. 2011, from the Richards et al. 2006 mean SED; published-checks.md).
    expect(settingsProvenance(settings({ bolometric: 'bc3000' })).bolometric.records).toEqual([expect.objectContaining({ bc: 5.15 })]);
    expect(settingsProvenance(settings({ bolometric: 'netzer19' })).bolometric.records).toHaveLength(3);
    expect(settingsProvenance(settings({ bolometric: 'bc5100', bc5100: 8 })).bolometric.records).toEqual([expect.objectContaining({ bc: 8, reference: 'value set in the config' })]);
  });

  it('records the correction and reference of every route an object can fall back to', () => {
    const objects: ObjectInputs[] = [
      { id: 'ha', z: 5, lines: { halpha: { lumErgS: { value: 1e43 }, fwhmKms: { value: 2000 } } } },
      { id: 'hb', z: 8, lines: { hbeta: { lumErgS: { value: 1e42 }, fwhmKms: { value: 2000 } } } },
      { id: 'c5', z: 6, lines: {}, lamL5100: { value: 1e44 } },
      { id: 'c3', z: 6, lines: {}, lamL3000: { value: 1e44 } },
      { id: 'c1', z: 6, lines: {}, lamL1350: { value: 1e44 } },
    ];
    for (const bolometric of ['halpha_gh05_bc5100', 'bc5100', 'bc3000', 'bc1350', 'netzer19'] as const) {
      const s = settings({ bolometric, draws: 4 });
      const routes = settingsProvenance(s).bolometric.routes;
      for (const o of objects) {
        const method = deriveObject(o, s, createRng(1)).lbolMethod!;
        expect(routes[method], `${bolometric}: ${o.id} → ${method}`).toBeDefined();
        expect(routes[method]!.reference, `${bolometric}: ${method}`).not.toBe('');
      }
    }
    // Greene & Ho 2005 (ApJ 630, 122) eq. 2 behind the Hβ route, with the BC5100 of the settings.
    const hb = settingsProvenance(settings()).bolometric.routes.hbeta_gh05_bc5100!;
    expect(hb.reference).toMatch(/Greene & Ho 2005.*eq\. 2/);
    expect(hb.records).toContainEqual(expect.objectContaining({ bc: settings().bc5100 }));
  });

  it('names the source of the Eddington constant, the local relation, the dust curve and the growth model', () => {
    const p = settingsProvenance(settings({ eddingtonPerMsun: 1.26e38, localRelation: 'kh13_sigma', dustCurve: 'ccm89' }));
    expect(p.eddington.reference).toMatch(/Shen et al\. 2011/);
    expect(p.localRelation).toMatchObject({ id: 'kh13_sigma' });
    expect(String(p.localRelation.reference)).toMatch(/Kormendy & Ho 2013/);
    expect(String(p.dustCurve.reference)).toMatch(/Cardelli/);
    expect(p.growth.reference).toMatch(/Salpeter 1964/);
    // t_Edd = 0.45049 Gyr (computed from CODATA 2018; published-checks.md), 5 digits.
    expect(p.growth.tEddGyr).toBeCloseTo(0.45049, 5);
    expect(settingsProvenance(settings({ eddingtonPerMsun: 1.1e38 })).eddington.reference).toBe('value set in the config');
  });

  it('holds only data (it is written as JSON)', () => {
    const p = settingsProvenance(settings());
    expect(JSON.parse(JSON.stringify(p))).toEqual(p);
  });
});
