import { describe, expect, it } from 'vitest';
import { OBJECT_PAGE_LIMIT, objectHref, objectPagesMode } from '../../src/site/objectLink.ts';

describe('object links', () => {
  it('use static pages up to the limit and the viewer above it, unless the build says otherwise', () => {
    expect(objectPagesMode(OBJECT_PAGE_LIMIT)).toBe('static');
    expect(objectPagesMode(OBJECT_PAGE_LIMIT + 1)).toBe('viewer');
    expect(objectPagesMode(10, 'viewer')).toBe('viewer');
    expect(() => objectPagesMode(10, 'some')).toThrow(/CENSUS_OBJECT_PAGES/);
  });
  it('point to the slug page or to the viewer with the id encoded', () => {
    expect(objectHref('/census/', 'DC-1')).toBe('/census/object/DC-1/');
    expect(objectHref('/', 'a b&c', 'viewer')).toBe('/object/?id=a%20b%26c');
  });
});
