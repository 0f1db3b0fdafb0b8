import { describe, expect, it } from 'vitest';
import { deriveObject } from '../../../src/core/derive/index.ts';
import { createRng, seedFor } from '../../../src/core/random/index.ts';
import { derivedRow } from '../../../src/site/place/derivedRow.ts';
import { placeSettings } from '../../../src/site/place/placeSettings.ts';
import { formToInputs, emptyForm } from '../../../src/site/place/placeForm.ts';

describe('derivedRow', () => {
  it('carries the derived values and percentiles into the catalog columns the charts read', () => {
    const { settings } = placeSettings({ settings: { draws: 400, seed: 3 } });
    const { inputs } = formToInputs({ ...emptyForm(), id: 'INVENTED-7', z: '5.5', fwhm: '2200', fwhm_err: '200', strength: '6', strength_err: '0.5', strength_unit: '1e-18 erg s-1 cm-2', log_mstar: '9.6', log_mstar_err: '0.3' });
    const d = deriveObject(inputs!, settings, createRng(seedFor(settings.seed, inputs!.id)));
    const row = derivedRow(inputs!, d);
    expect(d.logMbh).not.toBeNull();
    expect(row.log_mbh).toBe(d.logMbh);
    expect(row.log_mbh_p16).toBe(d.pct.logMbh!.p16);
    expect(row.log_mbh_p84).toBe(d.pct.logMbh!.p84);
    expect(row.log_edd_ratio).toBe(d.logEddRatio);
    expect(row.log_lum_halpha).toBe(d.logLum.halpha);
    expect(row.fwhm_halpha).toBe(2200);
    expect(row.fwhm_halpha_err).toBe(200);
    expect(row.log_mstar).toBe(9.6);
    expect(row.log_mstar_err).toBe(0.3);
    expect(row.flags).toBe(d.flags.join(','));
  });
});

describe('placeSettings', () => {
  it('reads the DeriveSettings inside the metadata provenance record and names the missing keys', () => {
    const { settings, missing } = placeSettings({ settings: { zSeed: 25, localRelation: 'kh13_mbulge' }, cosmology: { id: 'planck18' } });
    expect(settings.zSeed).toBe(25);
    expect(settings.localRelation).toBe('kh13_mbulge');
    expect(missing).toContain('draws');
    expect(missing).not.toContain('zSeed');
  });
});
