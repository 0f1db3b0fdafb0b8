import { describe, expect, it } from 'vitest';
import { publicationGaps } from '../../../src/catalog/config/publicationGaps.ts';

describe('publicationGaps', () => {
  it('says nothing when the title, description, licence and citation are given', () => {
    expect(publicationGaps({ title: 'T', description: 'D', licence: 'CC-BY-4.0', citation: 'C' }, 'census.config.yaml')).toBeNull();
  });

  it('names each missing field and what the site lacks for it', () => {
    expect(publicationGaps({}, 'census.config.yaml')).toBe(
      'note: census.config.yaml gives no title, description, licence, citation: the site is headed "Dawn Census"; its landing page does not describe the catalog; readers are not told how to reuse or cite it (set them in census.config.yaml)',
    );
    expect(publicationGaps({ title: 'T', description: 'D', licence: 'CC0-1.0', citation: '  ' }, 'c.yaml')).toBe(
      'note: c.yaml gives no citation: readers are not told how to reuse or cite it (set it in c.yaml)',
    );
    expect(publicationGaps({ description: 'D', licence: 'L', citation: 'C' }, 'c.yaml')).toBe('note: c.yaml gives no title: the site is headed "Dawn Census" (set it in c.yaml)');
  });
});
