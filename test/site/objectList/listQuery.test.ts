import { DuckDBInstance } from '@duckdb/node-api';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_STATE, FLAG_ANY, FLAG_NONE, listSql, PAGE_SIZE, type ListState } from '../../../src/site/objectList/listQuery.ts';
import { listStateFromSearch, listStateSearch } from '../../../src/site/objectList/listState.ts';

// Invented rows (internal test data): 120 objects, some with flags, one with a quote in its note.
const schema = { columns: ['id', 'z', 'log_mbh', 'note', 'flags'], textColumns: ['id', 'note', 'flags'] };
let instance: DuckDBInstance;
type Con = Awaited<ReturnType<DuckDBInstance['connect']>>;
let con: Con;

async function run(sql: string): Promise<Record<string, unknown>[]> {
  return (await con.runAndReadAll(sql)).getRowObjectsJS() as Record<string, unknown>[];
}
async function page(change: Partial<ListState>): Promise<{ ids: string[]; total: number }> {
  const sql = listSql({ ...DEFAULT_STATE, ...change }, schema, ['id', 'z', 'log_mbh']);
  const rows = await run(sql.rows);
  const [c] = await run(sql.count);
  return { ids: rows.map((r) => String(r.id)), total: Number(c!.n) };
}

beforeAll(async () => {
  instance = await DuckDBInstance.create(':memory:');
  con = await instance.connect();
  await con.run(`CREATE TABLE census AS SELECT
      'CW-' || lpad(CAST(i AS VARCHAR), 4, '0') AS id,
      4 + i / 20.0 AS z,
      CASE WHEN i % 10 = 0 THEN NULL ELSE 6 + (i % 7) / 3.0 END AS log_mbh,
      CASE WHEN i = 7 THEN 'O''Brien''s field, deep' ELSE 'wide' END AS note,
      CASE WHEN i % 3 = 0 THEN 'mbh_upper_limit, lensed' WHEN i % 3 = 1 THEN 'lensed' ELSE '' END AS flags
    FROM range(120) t(i)`);
});
afterAll(() => {
  con.closeSync();
  instance.closeSync();
});

describe('the object list query', () => {
  it('returns the first page of objects in id order with the count of all of them', async () => {
    const r = await page({});
    expect(r.total).toBe(120);
    expect(r.ids).toHaveLength(PAGE_SIZE);
    expect(r.ids[0]).toBe('CW-0000');
    expect(r.ids[49]).toBe('CW-0049');
  });

  it('pages on with an offset of one page', async () => {
    const r = await page({ page: 2 });
    expect(r.ids).toEqual(Array.from({ length: 20 }, (_, i) => `CW-${String(100 + i).padStart(4, '0')}`));
  });

  it('searches the id case-insensitively', async () => {
    expect((await page({ q: 'cw-011' })).ids).toEqual(Array.from({ length: 10 }, (_, i) => `CW-${String(110 + i).padStart(4, '0')}`));
  });

  it('searches every text column and takes quotes in the search text as text', async () => {
    const r = await page({ q: "o'brien" });
    expect(r.ids).toEqual(['CW-0007']);
  });

  it('keeps only objects carrying the chosen flag, whatever the spaces after the commas', async () => {
    const r = await page({ flag: 'mbh_upper_limit' });
    expect(r.total).toBe(40);
    expect(r.ids.every((id) => Number(id.slice(3)) % 3 === 0)).toBe(true);
    expect((await page({ flag: 'lensed' })).total).toBe(80);
  });

  it('filters objects with any flag and objects without', async () => {
    expect((await page({ flag: FLAG_ANY })).total).toBe(80);
    expect((await page({ flag: FLAG_NONE })).total).toBe(40);
  });

  it('sorts by any column, descending, with missing values last and ties broken by id', async () => {
    const sql = listSql({ ...DEFAULT_STATE, sort: 'log_mbh', desc: true, page: 2 }, schema, ['id', 'log_mbh']);
    const rows = await run(sql.rows);
    expect(rows.at(-1)!.log_mbh).toBeNull();
    const all = await run(listSql({ ...DEFAULT_STATE, sort: 'log_mbh', desc: true }, schema, ['id', 'log_mbh']).rows);
    const values = all.map((r) => r.log_mbh as number);
    expect(values).toEqual([...values].sort((a, b) => b - a));
  });

  it('sorts by id when asked for a column the catalog does not have, so no reader text reaches the SQL as a name', () => {
    const sql = listSql({ ...DEFAULT_STATE, sort: 'z; DROP TABLE census' }, schema, ['id']);
    expect(sql.rows).toContain('ORDER BY "id" ASC');
    expect(sql.rows).not.toContain('DROP');
  });
});

describe('the object list state in the URL', () => {
  it('round-trips a search, a flag, a sort and a page', () => {
    const state: ListState = { q: 'CW 12 & x', flag: 'lensed', sort: 'z', desc: true, page: 3 };
    const search = listStateSearch(state);
    expect(search).toContain('page=4');
    expect(listStateFromSearch(search)).toEqual(state);
  });

  it('writes nothing for the default state and reads defaults from a malformed page', () => {
    expect(listStateSearch(DEFAULT_STATE)).toBe('');
    expect(listStateFromSearch('?page=-2&desc=yes')).toEqual(DEFAULT_STATE);
  });
});
