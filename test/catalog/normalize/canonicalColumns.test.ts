import { describe, expect, it } from 'vitest';
import { LINES } from '../../../src/core/derive/types.ts';
import { CANONICAL_BY_NAME, CANONICAL_COLUMNS } from '../../../src/catalog/normalize/canonicalColumns.ts';

describe('CANONICAL_COLUMNS', () => {
  it('has unique names, each with a description', () => {
    const names = CANONICAL_COLUMNS.map((c) => c.name);
    expect(new Set(names).size).toBe(names.length);
    expect(CANONICAL_COLUMNS.every((c) => c.description.length > 5)).toBe(true);
    expect(CANONICAL_BY_NAME.size).toBe(names.length);
  });

  it('starts with id and z, then the lines in the core order', () => {
    expect(CANONICAL_COLUMNS.slice(0, 3).map((c) => c.name)).toEqual(['id', 'z', 'fwhm_halpha']);
    const firstWidths = LINES.map((l) => CANONICAL_COLUMNS.findIndex((c) => c.name === `fwhm_${l}`));
    expect([...firstWidths].sort((a, b) => a - b)).toEqual(firstWidths);
  });

  it('gives every measured column _err, _err_lo and _err_hi in its kind and an error UCD', () => {
    const measured = CANONICAL_COLUMNS.filter((c) => c.role === 'value' && !['z', 'ra', 'dec'].includes(c.name));
    expect(measured.map((c) => c.name)).toEqual([
      ...LINES.flatMap((l) => [`fwhm_${l}`, `fwhm_${l}_core`, `flux_${l}`, `lum_${l}`]),
      'lam_l_5100', 'lam_l_3000', 'lam_l_1350', 'mu', 'log_mstar', 'sigma_star', 'av', 'balmer_decrement',
    ]);
    for (const m of measured) {
      for (const [suffix, side] of [['_err', 'both'], ['_err_lo', 'lo'], ['_err_hi', 'hi']] as const) {
        const e = CANONICAL_BY_NAME.get(m.name + suffix);
        expect(e, m.name + suffix).toMatchObject({ role: 'error', of: m.name, side, kind: m.kind });
        expect(e?.ucd?.startsWith('stat.error')).toBe(true);
      }
    }
  });

  it('has an upper-limit flag for each line flux', () => {
    for (const l of LINES) expect(CANONICAL_BY_NAME.get(`flux_${l}_is_limit`)).toMatchObject({ kind: 'bool', role: 'flag', of: `flux_${l}` });
  });

  it('states canonical units and UCD1+ words for the main columns', () => {
    // UCDs from the IVOA UCD1+ controlled vocabulary (from memory).
    // Units: VOUnits canonical forms of the units module, and the readable form used in messages.
    const pick = (n: string) => {
      const c = CANONICAL_BY_NAME.get(n)!;
      return [c.kind, c.unit, c.unitText, c.ucd];
    };
    expect(pick('id')).toEqual(['text', '', '', 'meta.id;meta.main']);
    expect(pick('z')).toEqual(['dimensionless', '', '', 'src.redshift']);
    expect(pick('fwhm_hbeta')).toEqual(['velocity', 'km.s**-1', 'km/s', 'spect.line.width']);
    expect(pick('flux_halpha')).toEqual(['flux', 'erg.s**-1.cm**-2', 'erg s-1 cm-2', 'phot.flux;spect.line']);
    expect(pick('lum_civ')).toEqual(['luminosity', 'erg.s**-1', 'erg/s', 'phys.luminosity;spect.line']);
    expect(pick('log_mstar')).toEqual(['logMass', 'dex(solMass)', 'log10 Msun', 'phys.mass']);
    expect(pick('sigma_star')).toEqual(['velocity', 'km.s**-1', 'km/s', 'phys.veloc.dispersion']);
    expect(pick('av')).toEqual(['magnitude', 'mag', 'mag', 'phys.absorption;em.opt.V']);
    expect(pick('log_mstar_err').slice(1, 3)).toEqual(['dex', 'dex']);
    expect(pick('fwhm_halpha_err').slice(1, 3)).toEqual(['km.s**-1', 'km/s']);
  });
});
