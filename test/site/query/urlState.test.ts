import { describe, expect, it } from 'vitest';
import { hrefWithSql, sqlFromSearch } from '../../../src/site/query/urlState.ts';

describe('the query in the URL', () => {
  it('round-trips SQL with quotes, newlines and non-Latin text', () => {
    const sql = "SELECT id FROM census\nWHERE notes = '天体 & x'";
    const href = hrefWithSql('http://localhost/census/query/?x=1#top', sql);
    expect(new URL(href).pathname).toBe('/census/query/');
    expect(new URL(href).hash).toBe('#top');
    expect(sqlFromSearch(new URL(href).search)).toBe(sql);
  });
  it('treats an empty or absent sql parameter as none', () => {
    expect(sqlFromSearch('?sql=')).toBeNull();
    expect(sqlFromSearch('')).toBeNull();
  });
});
