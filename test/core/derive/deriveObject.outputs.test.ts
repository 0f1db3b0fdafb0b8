import { describe, expect, it } from 'vitest';
import { deriveObject } from '../../../src/core/derive/deriveObject.ts';
import { DEFAULT_SETTINGS } from '../../../src/core/derive/defaultSettings.ts';
import type { DeriveSettings, ObjectInputs } from '../../../src/core/derive/types.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { seedFor } from '../../../src/core/random/seedFor.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const settings: DeriveSettings = { ...DEFAULT_SETTINGS, draws: 200 };
const derive = (o: ObjectInputs) => deriveObject(o, settings, createRng(seedFor(settings.seed, o.id)));
const lg = Math.log10;

describe('deriveObject outputs beside the mass', () => {
  it('reports every broad-line luminosity it was given, Mg II and C IV included, as log10 of the value when there is no dust or lensing', () => {
    const d = derive({
      id: 'SYN-LINES',
      z: 6,
      lines: { mgii: { fwhmKms: { value: 3000 }, lumErgS: { value: 2e42 } }, civ: { fwhmKms: { value: 4000 }, lumErgS: { value: 5e42 } } },
      lamL3000: { value: 1e45 },
    });
    // Identity: log10 of the given luminosity (no correction applies).
    expectClose(d.logLum.mgii!, lg(2e42), { atol: 1e-12, source: 'log10 of the input, closed form' });
    expectClose(d.logLum.civ!, lg(5e42), { atol: 1e-12, source: 'log10 of the input, closed form' });
    expect(d.logL5100).toBeNull();
  });

  it('takes λL5100 from the measured continuum when that is the only luminosity given', () => {
    const d = derive({ id: 'SYN-5100', z: 6, lines: {}, lamL5100: { value: 1e44, errLo: 1e43, errHi: 1e43 } });
    expectClose(d.logL5100!, 44, { atol: 1e-12, source: 'log10 of the input, closed form' });
    // L_bol = 9.26 λL5100 (Shen et al. 2011, BC5100 from the Richards et al. 2006 mean SED).
    expectClose(d.logLbol!, 44 + lg(9.26), { atol: 1e-12, source: 'Shen et al. 2011 BC5100 = 9.26' });
    expect(d.logMbh).toBeNull();
  });

  it('prefers the measured continuum to one estimated from broad Hβ', () => {
    const d = derive({ id: 'SYN-HB5100', z: 6, lines: { hbeta: { fwhmKms: { value: 3000 }, lumErgS: { value: 1e42 } } }, lamL5100: { value: 3e44 } });
    expectClose(d.logL5100!, lg(3e44), { atol: 1e-12, source: 'log10 of the input, closed form' });
  });

  it('flags a host mass outside the local relation\'s sample (Reines & Volonteri 2015 AGN, log M* 9.5–12) as extrapolated, and one inside as not', () => {
    const base = { z: 6, lines: { halpha: { fwhmKms: { value: 2500 }, lumErgS: { value: 3e42 } } } };
    expect(derive({ id: 'SYN-LOW', ...base, logMstar: { value: 9 } }).flags).toContain('local_relation_extrapolated');
    expect(derive({ id: 'SYN-HIGH', ...base, logMstar: { value: 12.5 } }).flags).toContain('local_relation_extrapolated');
    expect(derive({ id: 'SYN-IN', ...base, logMstar: { value: 10.5 } }).flags).not.toContain('local_relation_extrapolated');
    expect(derive({ id: 'SYN-NONE', ...base }).flags).not.toContain('local_relation_extrapolated');
  });

  it('refuses a bank of deviates whose size is not the settings\' number of draws, naming both', () => {
    const bankLike = { n: 50, normals: () => new Float64Array(50), uniforms: () => new Float64Array(50) };
    expect(() => deriveObject({ id: 'X', z: 6, lines: {} }, settings, bankLike as never)).toThrow('the bank holds 50 draws per role, the settings ask for 200');
  });

  it('flags signal-to-noise below 2 in a luminosity or width it uses, a lensed object, and an object at or above the seed redshift', () => {
    const ha = (lumErr: number, fwhmErr: number) => ({ halpha: { fwhmKms: { value: 2500, errLo: fwhmErr, errHi: fwhmErr }, lumErgS: { value: 3e42, errLo: lumErr, errHi: lumErr } } });
    expect(derive({ id: 'SNR-OK', z: 6, lines: ha(1e42, 500) }).flags).not.toContain('low_snr');
    expect(derive({ id: 'SNR-LUM', z: 6, lines: ha(2e42, 500) }).flags).toContain('low_snr'); // S/N 1.5
    expect(derive({ id: 'SNR-FWHM', z: 6, lines: ha(1e42, 1500) }).flags).toContain('low_snr'); // S/N 1.67
    const lensed = derive({ id: 'LENS', z: 6, lines: ha(1e42, 500), mu: { value: 2 } });
    expect(lensed.flags).toContain('lensed');
    // Magnification divides the luminosity: log10(3e42 / 2).
    expectClose(lensed.logLum.halpha!, lg(1.5e42), { atol: 1e-12, source: 'L / μ, closed form' });
    expect(derive({ id: 'UNLENSED', z: 6, lines: ha(1e42, 500), mu: { value: 1 } }).flags).not.toContain('lensed');
    // Default seed redshift z = 20 (defaultSettings): at 20 and above no seed mass or growth rate.
    const high = derive({ id: 'Z20', z: 20, lines: ha(1e42, 500) });
    expect(high.flags).toContain('z_above_seed_redshift');
    expect(high.logMseed).toBeNull();
    expect(high.lambdaReqLight).toBeNull();
    expect(derive({ id: 'Z19', z: 19.9, lines: ha(1e42, 500) }).flags).not.toContain('z_above_seed_redshift');
  });

  it('refuses a redshift that is not positive and finite, naming it', () => {
    for (const z of [0, -1, Infinity, NaN]) expect(() => derive({ id: 'BADZ', z, lines: {} })).toThrow(`redshift must be positive and finite, got ${z}`);
  });
});
