import { describe, expect, it } from 'vitest';
import { canonicalOfName, guessColumns, nameWords } from '../../../src/catalog/config/guessColumns.ts';

// The spellings below are ones the field's catalogs use (common practice, no single source); the
// `e_`/`E_` error prefixes are the CDS standard for astronomical catalogues (byte-by-byte descriptions).

describe('nameWords', () => {
  it('splits at separators and where lower case turns to upper, and joins two-word line names', () => {
    expect(nameWords('FWHM_Ha_broad_err')).toEqual(['fwhm', 'ha', 'broad', 'err']);
    expect(nameWords('fwhmHalpha')).toEqual(['fwhm', 'halpha']);
    expect(nameWords('FWHMHa')).toEqual(['fwhm', 'ha']);
    expect(nameWords('flux H alpha')).toEqual(['flux', 'halpha']);
    expect(nameWords('FWHM(Mg II)')).toEqual(['fwhm', 'mgii']);
    expect(nameWords('L_C_IV')).toEqual(['l', 'civ']);
    expect(nameWords('__')).toEqual([]);
  });
});

describe('canonicalOfName', () => {
  it.each([
    ['FWHM_Ha', 'fwhm_halpha'],
    ['fwhm_halpha_broad', 'fwhm_halpha'],
    ['FWHM_Hb_err', 'fwhm_hbeta_err'],
    ['e_FWHM_MgII', 'fwhm_mgii_err'],
    ['fwhm_civ_err_lo', 'fwhm_civ_err_lo'],
    ['fwhm_ha_upper_err', 'fwhm_halpha_err_hi'],
    ['FWHM_Ha_core', 'fwhm_halpha_core'],
    ['F_Ha', 'flux_halpha'],
    ['flux_Hbeta_error', 'flux_hbeta_err'],
    ['f_ha_ul', 'flux_halpha_is_limit'],
    ['flux_ha_is_limit', 'flux_halpha_is_limit'],
    ['L_Ha', 'lum_halpha'],
    ['lum_mg2_e', 'lum_mgii_err'],
    ['L5100', 'lam_l_5100'],
    ['lambda_L_3000', 'lam_l_3000'],
    ['Lcont1350_err', 'lam_l_1350_err'],
    ['redshift', 'z'],
    ['z_spec', 'z'],
    ['Name', 'id'],
    ['source_id', 'id'],
    ['ID_obj', 'id'],
    ['MSA_ID', 'id'],
    ['RAJ2000', 'ra'],
    ['DEJ2000', 'dec'],
    ['logMstar', 'log_mstar'],
    ['e_logMstar', 'log_mstar_err'],
    ['vdisp', 'sigma_star'],
    ['A_V', 'av'],
    ['magnification', 'mu'],
    ['Ha_Hb', 'balmer_decrement'],
  ])('reads %s as %s', (name, canonical) => {
    expect(canonicalOfName(name)).toBe(canonical);
  });

  it.each([
    ['logL_Ha', 'a logarithm of a luminosity is not the linear luminosity the canonical column holds'],
    ['F_Ha_narrow', 'a narrow component is not the broad line'],
    ['FWHM', 'no line named'],
    ['fwhm_ha_hb', 'two lines named'],
    ['F_Ha_core', 'only a width has a core'],
    ['Ha', 'no quantity named'],
    ['E_BV', 'a colour excess, not an error of "BV"'],
    ['phase', '"ha" inside a word is not Hα'],
    ['nspec', 'nothing canonical'],
    ['mag_err', 'an error of nothing canonical'],
  ])('does not guess %s (%s)', (name) => {
    expect(canonicalOfName(name)).toBeNull();
  });

  it('reads the CDS E_/e_ pair as the upper and lower errors', () => {
    expect(canonicalOfName('E_FWHM_Ha', true)).toBe('fwhm_halpha_err_hi');
    expect(canonicalOfName('e_FWHM_Ha', true)).toBe('fwhm_halpha_err_lo');
    expect(canonicalOfName('e_FWHM_Ha', false)).toBe('fwhm_halpha_err');
  });
});

describe('guessColumns', () => {
  it('sorts a catalog written with the usual names into found, guessed and passed-through columns', () => {
    const g = guessColumns([
      { name: 'Name' },
      { name: 'z_spec' },
      { name: 'FWHM_Ha' },
      { name: 'e_FWHM_Ha' },
      { name: 'F_Ha' },
      { name: 'F_Ha_err' },
      { name: 'RA' },
      { name: 'field' },
      { name: 'notes' },
    ]);
    expect(g.byName).toEqual([{ canonical: 'ra', source: 'RA' }]);
    expect(g.guesses.map((x) => [x.canonical, x.source, x.by])).toEqual([
      ['id', 'Name', 'name'],
      ['z', 'z_spec', 'name'],
      ['fwhm_halpha', 'FWHM_Ha', 'name'],
      ['fwhm_halpha_err', 'e_FWHM_Ha', 'name'],
      ['flux_halpha', 'F_Ha', 'name'],
      ['flux_halpha_err', 'F_Ha_err', 'name'],
    ]);
    expect(g.ambiguous).toEqual([]);
    expect(g.passthrough).toEqual(['field', 'notes']);
  });

  it('takes a column under its canonical name (any case) as found, and guesses nothing else for it', () => {
    const g = guessColumns([{ name: 'ID' }, { name: 'Z' }, { name: 'redshift' }, { name: 'fwhm_halpha' }, { name: 'FWHM_Ha' }]);
    expect(g.byName.map((b) => b.canonical)).toEqual(['id', 'z', 'fwhm_halpha']);
    expect(g.guesses).toEqual([]);
    expect(g.passthrough).toEqual(['redshift', 'FWHM_Ha']);
  });

  it('leaves the choice to the user when several columns fit, or two differ only in case', () => {
    const g = guessColumns([{ name: 'name' }, { name: 'source' }, { name: 'z' }, { name: 'Flux_Ha' }, { name: 'F_Ha' }, { name: 'MU' }, { name: 'mu' }]);
    expect(g.ambiguous).toEqual([
      { canonical: 'mu', candidates: ['MU', 'mu'] },
      { canonical: 'id', candidates: ['name', 'source'] },
      { canonical: 'flux_halpha', candidates: ['Flux_Ha', 'F_Ha'] },
    ]);
    expect(g.guesses).toEqual([]);
    expect(g.passthrough).toEqual([]);
  });

  it('leaves two identifier-like columns to the user', () => {
    const g = guessColumns([{ name: 'ID_obj' }, { name: 'MSA_ID' }, { name: 'z' }]);
    expect(g.ambiguous).toEqual([{ canonical: 'id', candidates: ['ID_obj', 'MSA_ID'] }]);
  });

  it('prefers a UCD that names the main identifier or the redshift to a name', () => {
    const g = guessColumns([{ name: 'name' }, { name: 'objno', ucd: 'meta.id;meta.main' }, { name: 'zz', ucd: 'src.redshift' }, { name: 'zerr', ucd: 'stat.error;src.redshift' }]);
    expect(g.guesses).toEqual([
      { canonical: 'id', source: 'objno', by: 'ucd' },
      { canonical: 'z', source: 'zz', by: 'ucd' },
    ]);
    expect(g.passthrough).toEqual(['name', 'zerr']);
  });

  it('reads a CDS pair of asymmetric errors', () => {
    const g = guessColumns([{ name: 'id' }, { name: 'z' }, { name: 'FWHM_Ha' }, { name: 'E_FWHM_Ha' }, { name: 'e_FWHM_Ha' }]);
    expect(g.guesses.map((x) => [x.canonical, x.source])).toEqual([
      ['fwhm_halpha', 'FWHM_Ha'],
      ['fwhm_halpha_err_lo', 'e_FWHM_Ha'],
      ['fwhm_halpha_err_hi', 'E_FWHM_Ha'],
    ]);
  });
});
