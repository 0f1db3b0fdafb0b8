import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseConfig } from '../../../src/catalog/config/index.ts';
import { normalizeDoi, normalizeOrcid } from '../../../src/catalog/config/publicationConfig.ts';

const here = join(process.cwd(), 'census.config.yaml');
const parse = (text: string) => parseConfig(text, here);
const message = (text: string): string => {
  try {
    parse(text);
  } catch (e) {
    return (e as Error).message;
  }
  return 'no error';
};

describe('publication settings in the config', () => {
  it('reads authors with ORCID iDs, the version and the DOI', () => {
    const cfg = parse('authors:\n  - { name: Ada Invented, orcid: "https://orcid.org/0000-0002-1825-0097" }\n  - Bo Invented\nversion: 1.2\ndoi: https://doi.org/10.5281/zenodo.1234567\n');
    expect(cfg.publication).toEqual({ authors: [{ name: 'Ada Invented', orcid: '0000-0002-1825-0097' }, { name: 'Bo Invented' }], version: '1.2', doi: '10.5281/zenodo.1234567' });
  });
  it('checks the ORCID check character', () => {
    // 0000-0002-1825-0097 is ORCID's own example iD (valid); changing the last digit breaks the ISO 7064 11,2 check.
    expect(normalizeOrcid('0000-0002-1825-0097')).toBe('0000-0002-1825-0097');
    expect(normalizeOrcid('0000-0002-1825-0098')).toBeNull();
    expect(normalizeOrcid('0000-0002-1825-009')).toBeNull();
  });
  it('stops with one line naming the author when an ORCID has the wrong shape', () => {
    expect(message('authors:\n  - { name: A, orcid: "1234" }\n')).toBe(
      'census.config.yaml: authors[0].orcid "1234" is not an ORCID iD (0000-0002-1825-0097 form, with a valid check character)',
    );
  });
  it('stops with one line when the DOI has the wrong shape', () => {
    expect(normalizeDoi('doi:10.1093/mnras/stad123')).toBe('10.1093/mnras/stad123');
    expect(message('doi: zenodo-1234\n')).toBe('census.config.yaml: doi "zenodo-1234" is not a DOI (10.<registrant>/<suffix>, e.g. 10.5281/zenodo.1234567)');
  });
  it('stops with one line naming the column when a declared UCD or unit is invalid', () => {
    expect(message('passthrough:\n  ra_deg: { ucd: pos.eq.rightascension }\n')).toBe(
      'census.config.yaml: passthrough.ra_deg.ucd: "pos.eq.rightascension" is not a valid UCD1+ ("pos.eq.rightascension" is not a UCD1+ word)',
    );
    expect(message('passthrough:\n  sfr: { unit: "solMass/yr/furlong" }\n')).toMatch(/^census\.config\.yaml: passthrough\.sfr\.unit: unknown unit "solMass\/yr\/furlong": .*furlong/);
    expect(message('passthrough:\n  sfr: { unit: "solMass/yr", ucd: phys.SFR, description: Star formation rate }\n')).toBe('no error');
  });
  it('takes output.formats and refuses an unknown one', () => {
    expect(parse('output: { path: out/c.parquet, formats: [ecsv, fits, ecsv] }\n').outputFormats).toEqual(['ecsv', 'fits']);
    expect(message('output: { formats: [csv] }\n')).toBe('census.config.yaml: output.formats[0]: unknown format "csv"; known: ecsv, votable, fits');
  });
});
