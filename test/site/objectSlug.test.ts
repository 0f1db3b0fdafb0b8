import { describe, expect, it } from 'vitest';
import { objectSlug } from '../../src/site/objectSlug.ts';

describe('objectSlug', () => {
  it('keeps a plain id as it is', () => {
    expect(objectSlug('AUR-00123')).toBe('AUR-00123');
  });
  it('replaces markup and spaces and appends a hash so the slug is safe in a path', () => {
    const s = objectSlug('<script>alert(1)</script>');
    expect(s).toMatch(/^[A-Za-z0-9._-]+$/);
    expect(s).not.toContain('<');
  });
  it('gives distinct slugs to ids that sanitise to the same text', () => {
    expect(objectSlug('a b')).not.toBe(objectSlug('a_b'));
    expect(objectSlug('a b')).not.toBe(objectSlug('a/b'));
  });
  it('gives a non-empty slug to an id made only of non-Latin letters', () => {
    expect(objectSlug('天体')).toMatch(/^object-[0-9a-f]{8}$/);
  });
});
