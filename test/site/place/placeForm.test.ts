import { describe, expect, it } from 'vitest';
import { emptyForm, formToInputs, type PlaceFormState } from '../../../src/site/place/placeForm.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const form = (over: Partial<PlaceFormState>): PlaceFormState => ({
  ...emptyForm(),
  id: 'INVENTED-1',
  z: '6.1',
  fwhm: '2100',
  fwhm_err: '150',
  strength: '4.2',
  strength_err: '0.4',
  strength_unit: '1e-18 erg s-1 cm-2',
  ...over,
});

describe('formToInputs', () => {
  it('turns a valid form into inputs in canonical units', () => {
    const r = formToInputs(form({ log_mstar: '9.4', log_mstar_err: '0.3', mu: '2', mu_err: '0.2' }));
    expect(r.errors).toEqual({});
    const i = r.inputs!;
    expect(i.id).toBe('INVENTED-1');
    expect(i.z).toBe(6.1);
    expect(i.lines.halpha!.fwhmKms).toEqual({ value: 2100, errLo: 150, errHi: 150 });
    expectClose(i.lines.halpha!.fluxCgs!.value, 4.2e-18, { rtol: 1e-12, source: 'unit conversion 1e-18' });
    expect(i.mu).toEqual({ value: 2, errLo: 0.2, errHi: 0.2 });
    expect(i.logMstar).toEqual({ value: 9.4, errLo: 0.3, errHi: 0.3 });
  });

  it('puts a message beside each invalid field and gives no inputs', () => {
    const r = formToInputs(form({ z: 'abc', fwhm: '-5', log_mstar: '20' }));
    expect(r.inputs).toBeNull();
    expect(r.errors.z).toBe('abc: not a number');
    expect(r.errors.fwhm).toBe('-5 km s-1: must be positive');
    expect(r.errors.log_mstar).toMatch(/^20 .*must be between 5 and 13$/);
  });

  it('asks for the line width and strength', () => {
    const r = formToInputs(form({ fwhm: '', strength: '' }));
    expect(r.errors.fwhm).toBe('needed for the black-hole mass');
    expect(r.errors.strength).toMatch(/^needed for the black-hole mass/);
  });

  it('reads a log luminosity with its dex error as asymmetric linear errors', () => {
    const r = formToInputs(form({ line: 'hbeta', strength_kind: 'lum', strength_unit: 'log', strength: '42.5', strength_err: '0.1' }));
    expect(r.errors).toEqual({});
    const lum = r.inputs!.lines.hbeta!.lumErgS!;
    const L = 10 ** 42.5;
    expectClose(lum.value, L, { rtol: 1e-12, source: 'computed: 10^42.5' });
    expectClose(lum.errLo!, L * (1 - 10 ** -0.1), { rtol: 1e-12, source: 'computed: L(1 − 10^−0.1)' });
    expectClose(lum.errHi!, L * (10 ** 0.1 - 1), { rtol: 1e-12, source: 'computed: L(10^0.1 − 1)' });
  });

  it('marks an upper-limit flux and ignores its error', () => {
    const r = formToInputs(form({ is_limit: true }));
    expect(r.errors).toEqual({});
    expect(r.inputs!.lines.halpha!.fluxIsLimit).toBe(true);
    expect(r.inputs!.lines.halpha!.fluxCgs!.errLo).toBeUndefined();
    expect(r.notes).toContain('The line is an upper limit, so its error is not used.');
  });

  it('flags a flux typed without choosing its unit', () => {
    const r = formToInputs(form({ strength_unit: 'erg s-1 cm-2' }));
    expect(r.errors.strength).toMatch(/brighter than any broad line/);
  });

  it('flags a linear luminosity that is really a log', () => {
    const r = formToInputs(form({ strength_kind: 'lum', strength_unit: 'erg s-1', strength: '42.3', strength_err: '' }));
    expect(r.errors.strength).toMatch(/is it log10/);
  });

  it('reads the continuum λL5100 and its error from their own fields', () => {
    const r = formToInputs(form({ lam_l_5100: '1.369e44', lam_l_5100_err: '1.95e43' }));
    expect(r.errors).toEqual({});
    // data-demo/new-objects.csv, CDW-90003 (invented)
    expect(r.inputs!.lamL5100).toEqual({ value: 1.369e44, errLo: 1.95e43, errHi: 1.95e43 });
  });

  it('places an Hβ-only object from the Hβ width and λL5100 without a main-line strength', () => {
    const r = formToInputs(form({ line: 'hbeta', fwhm: '1534', fwhm_err: '134', strength: '', strength_err: '', lam_l_5100: '1.369e44' }));
    expect(r.errors).toEqual({});
    expect(r.inputs!.lines.hbeta!.fwhmKms!.value).toBe(1534);
    expect(r.inputs!.lamL5100!.value).toBe(1.369e44);
  });

  it('reads the other lines in their own flux unit beside the main line', () => {
    const r = formToInputs(form({ fwhm_hbeta: '1315', fwhm_hbeta_err: '92', flux_hbeta: '44.54', flux_hbeta_err: '2.24', fwhm_mgii: '3100', other_flux_unit: '1e-18 erg s-1 cm-2' }));
    expect(r.errors).toEqual({});
    const hb = r.inputs!.lines.hbeta!;
    expect(hb.fwhmKms).toEqual({ value: 1315, errLo: 92, errHi: 92 });
    // 44.54 × 1e-18 erg s-1 cm-2 (data-demo/new-objects.csv, CDW-90002, invented)
    expectClose(hb.fluxCgs!.value, 44.54e-18, { rtol: 1e-12, source: 'unit conversion 1e-18' });
    expectClose(hb.fluxCgs!.errLo!, 2.24e-18, { rtol: 1e-12, source: 'unit conversion 1e-18' });
    expect(r.inputs!.lines.mgii!.fwhmKms!.value).toBe(3100);
    expect(r.inputs!.lines.halpha!.fwhmKms!.value).toBe(2100);
  });

  it('marks an other-line field that repeats the main line', () => {
    const r = formToInputs(form({ line: 'hbeta', fwhm_hbeta: '1315' }));
    expect(r.inputs).toBeNull();
    expect(r.errors.fwhm_hbeta).toBe('this is the line chosen above: give it there');
  });

  it('puts a problem of a new field beside that field', () => {
    const r = formToInputs(form({ fwhm_civ: '-40' }));
    expect(r.inputs).toBeNull();
    expect(r.errors.fwhm_civ).toBe('-40 km s-1: must be positive');
    expect(formToInputs(form({ lam_l_5100: '44.1' })).errors.lam_l_5100).toMatch(/^44\.1 erg s-1 is far too faint .*is it log10/);
  });
});
