/**
 * Rewrites the scale factor of a unit string as astropy writes it in a VOTable (CDS form:
 * `10-20erg.s-1.cm-2`, `10+42erg.s-1`) or a FITS header (`10**-20 cm-2 erg s-1`) into the
 * `1e-20 ...` form the units module reads exactly. The rest of the string is left as written.
 *
 * Sources: the CDS standard for units ("Standards for Astronomical Catalogues", Ochsenbein et
 * al. 2000, §3.2: a leading factor `10+n`/`10-n`) and FITS Standard 4.0 §4.3.2 (`10**k`); the
 * spellings were checked against what astropy 5.2.1 writes (test/fixtures/readers).
 *
 * @param unit - unit string from a file's metadata
 * @returns the same unit with its power-of-ten factor written as `1e±n`
 */
export function fileUnitSpelling(unit: string): string {
  const t = unit.trim();
  const cds = /^10([+-]\d+)(?=[A-Za-z[(]|$)/.exec(t);
  if (cds) return `1e${cds[1]} ${t.slice(cds[0].length)}`.trim();
  const fits = /^10\*\*\(?([+-]?\d+)\)?(?=\s|$)/.exec(t);
  if (fits) return `1e${fits[1]} ${t.slice(fits[0].length).trim()}`.trim();
  return unit;
}
