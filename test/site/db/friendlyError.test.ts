import { describe, expect, it } from 'vitest';
import { catalogLoadError, friendlyQueryError } from '../../../src/site/db/friendlyError.ts';

describe('error messages for readers', () => {
  it('turns DuckDB error classes into plain words and keeps the detail', () => {
    expect(friendlyQueryError(new Error('Parser Error: syntax error at or near "SELEC"\nLINE 1: SELEC id\n        ^'))).toBe(
      'The SQL could not be read: syntax error at or near "SELEC"',
    );
    expect(friendlyQueryError(new Error('Binder Error: Referenced column "foo" not found in FROM clause!'))).toMatch(/^The query refers to something .*"foo"/);
  });
  it('points to the census table when another table is named', () => {
    expect(friendlyQueryError(new Error('Catalog Error: Table with name catalog does not exist!'))).toMatch(/table named census/);
  });
  it('says the catalog file is missing, unreachable or not Parquet', () => {
    expect(catalogLoadError('data/catalog.parquet', 404)).toMatch(/was not found/);
    expect(catalogLoadError('data/catalog.parquet', 500)).toMatch(/HTTP 500/);
    expect(catalogLoadError('data/catalog.parquet', 200, 'Invalid Input Error: No magic bytes found at end of file')).toMatch(/not a readable Parquet file/);
  });
});
