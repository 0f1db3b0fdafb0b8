import { describe, expect, it } from 'vitest';
import { checkUcd, UCD_LIST_SOURCE, UCD_WORDS } from '../../../src/core/metadata/index.ts';

describe('checkUcd', () => {
  it('accepts UCDs built from the list in a valid order', () => {
    // Examples built from words of the UCD1+ 1.5 list (ivoa-std/UCDList ucd-list.txt).
    expect(checkUcd('phys.mass;stat.median')).toBeNull();
    expect(checkUcd('stat.error;phys.luminosity;em.line.Halpha')).toBeNull();
    expect(checkUcd('META.ID;meta.main')).toBeNull();
  });
  it('names a word that is not in the list', () => {
    expect(checkUcd('phys.mass.bh')).toBe('"phys.mass.bh" is not a UCD1+ word');
    expect(checkUcd('phys.lensing')).toBe('"phys.lensing" is not a UCD1+ word');
  });
  it('refuses a secondary word first and a primary word later', () => {
    expect(checkUcd('arith.ratio')).toMatch(/"arith.ratio" may only follow another word/);
    expect(checkUcd('phys.mass;meta.code')).toMatch(/"meta.code" may only start a UCD/);
  });
  it('refuses empty UCDs and empty words', () => {
    expect(checkUcd('')).toBe('is empty');
    expect(checkUcd('phys.mass;;stat.median')).toMatch(/empty word/);
  });
  it('holds the whole 1.5 list with its source named', () => {
    // 554 words in ucd-list.txt at the commit named in UCD_LIST_SOURCE (counted when vendored).
    expect(UCD_WORDS.size).toBe(554);
    expect(UCD_WORDS.get('stat.percentile')?.syllable).toBe('Q');
    expect(UCD_WORDS.get('meta.ref.orcid')?.syllable).toBe('P');
    expect(UCD_LIST_SOURCE.version).toBe('1.5');
  });
});
