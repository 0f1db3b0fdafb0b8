import { parse } from '@retorquere/bibtex-parser';
import { describe, expect, it } from 'vitest';
import { bibtexOf } from '../../../src/site/build/citationFormats.ts';

// Checked with an independent BibTeX parser (@retorquere/bibtex-parser 9.0.29, the parser of
// Better BibTeX for Zotero): the entry parses without errors, and the authors come out as the
// people (or the group) the config names. The names are invented.
describe('bibtexOf', () => {
  it('writes the authors as one value BibTeX splits into people with first and last names', async () => {
    const text = bibtexOf({ title: 'Glimmerfen broad-line candidates (invented)', publication: { authors: [{ name: 'Ada Quillfeather' }, { name: 'Bo Marrowind' }], version: '1.0', doi: '10.5555/invented.1' } }, 2026, 'https://example.org/census/');
    // It was `author = {Ada Quillfeather} and {Bo Marrowind}`: two values, which BibTeX rejects.
    expect(text).toContain('author = {Ada Quillfeather and Bo Marrowind}');
    const r = await parse(text);
    expect(r.errors).toEqual([]);
    expect(r.entries).toHaveLength(1);
    const f = r.entries[0]!.fields as Record<string, unknown>;
    expect(f.author).toEqual([
      { firstName: 'Ada', lastName: 'Quillfeather' },
      { firstName: 'Bo', lastName: 'Marrowind' },
    ]);
    expect(f.title).toBe('Glimmerfen broad-line candidates (invented)');
    expect(f.doi).toBe('10.5555/invented.1');
    expect(f.url).toBe('https://example.org/census/');
  });

  it('keeps a group, and a name holding the word "and", as one name', async () => {
    const group = await parse(bibtexOf({ group: 'Glimmerfen Collaboration (invented)' }, 2026));
    expect(group.errors).toEqual([]);
    expect((group.entries[0]!.fields as Record<string, unknown>).author).toEqual([{ name: 'Glimmerfen Collaboration (invented)' }]);
    const anded = await parse(bibtexOf({ publication: { authors: [{ name: 'Smith and Sons Survey Team' }, { name: 'Bo Marrowind' }] } }, 2026));
    expect(anded.errors).toEqual([]);
    expect((anded.entries[0]!.fields as Record<string, unknown>).author).toEqual([{ name: 'Smith and Sons Survey Team' }, { firstName: 'Bo', lastName: 'Marrowind' }]);
  });

  it('escapes what BibTeX would read as markup', async () => {
    const r = await parse(bibtexOf({ title: 'Fluxes {raw} & 50% of #1_a', publication: { authors: [{ name: 'Ada Quillfeather' }] } }, 2026));
    expect(r.errors).toEqual([]);
    expect((r.entries[0]!.fields as Record<string, unknown>).title).toBe('Fluxes {raw} & 50% of #1_a');
  });
});
