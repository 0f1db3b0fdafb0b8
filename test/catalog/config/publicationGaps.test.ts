import { describe, expect, it } from 'vitest';
import { publicationNotes } from '../../../src/catalog/config/publicationGaps.ts';

const NAMES = { config: 'census.config.yaml', meta: 'catalog.meta.json' };
const FULL = { title: 'T', description: 'D', licence: 'CC-BY-4.0', citation: 'C' };

describe('publicationNotes', () => {
  it('says nothing when the catalog recorded the four fields the config gives', () => {
    expect(publicationNotes(FULL, FULL, NAMES)).toEqual([]);
    // The config may leave them out after the derive: the site shows what was recorded.
    expect(publicationNotes(FULL, {}, NAMES)).toEqual([]);
  });

  it('names each field neither gives, and what the site lacks for it', () => {
    expect(publicationNotes({}, {}, NAMES)).toEqual([
      'note: no title, description, licence, citation in census.config.yaml: the site is headed "Dawn Census"; its landing page does not describe the catalog; readers are not told how to reuse or cite it (set them there, then derive again)',
    ]);
    expect(publicationNotes({ ...FULL, citation: ' ' }, { ...FULL, citation: '' }, NAMES)).toEqual([
      'note: no citation in census.config.yaml: readers are not told how to reuse or cite it (set it there, then derive again)',
    ]);
  });

  it('says when the config gives a field the catalog did not record, or another one: the site shows the recorded ones', () => {
    expect(publicationNotes({ ...FULL, title: 'Old' }, FULL, NAMES)).toEqual([
      'note: the title in census.config.yaml is not the one catalog.meta.json recorded when the catalog was derived; the site shows the recorded one: derive again to publish it',
    ]);
    expect(publicationNotes({ title: 'T' }, FULL, NAMES)).toEqual([
      'note: the description, licence, citation in census.config.yaml are not the ones catalog.meta.json recorded when the catalog was derived; the site shows the recorded ones: derive again to publish them',
    ]);
    // Surrounding blanks are not a difference.
    expect(publicationNotes(FULL, { ...FULL, title: ' T ' }, NAMES)).toEqual([]);
  });
});
