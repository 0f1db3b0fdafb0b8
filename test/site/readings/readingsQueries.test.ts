import { DuckDBInstance } from '@duckdb/node-api';
import { describe, expect, it } from 'vitest';
import { READINGS_EXAMPLE_QUERIES } from '../../../src/site/readings/readingsQueries.ts';

/**
 * Invented objects under three readings: A is above 0.84 under all; B falls to 0.5 under one;
 * C has no P under one (a bound there) and is above 0.84 under the others; D has no P at all.
 */
const ROWS = [
  ['A', 'standard', 0.99], ['A', 'dense_gas', 0.9], ['A', 'small_bolometric', 0.85],
  ['B', 'standard', 0.99], ['B', 'dense_gas', 0.5], ['B', 'small_bolometric', 0.95],
  ['C', 'standard', 0.97], ['C', 'dense_gas', null], ['C', 'small_bolometric', 0.96],
  ['D', 'standard', null], ['D', 'dense_gas', null], ['D', 'small_bolometric', null],
  ['E', 'standard', 0.84], ['E', 'dense_gas', 0.9], ['E', 'small_bolometric', 0.9],
] as const;

async function run(sql: string): Promise<Record<string, unknown>[]> {
  const db = await DuckDBInstance.create(':memory:');
  const con = await db.connect();
  try {
    await con.run(`CREATE TABLE readings AS SELECT * FROM (VALUES ${ROWS.map(([id, r, p]) => `('${id}', '${r}', ${p === null ? 'NULL::DOUBLE' : p})`).join(', ')}) t(id, reading, p_super_eddington)`);
    return (await con.runAndReadAll(sql)).getRowObjectsJS();
  } finally {
    con.closeSync();
    db.closeSync();
  }
}

describe('the example queries over the readings table', () => {
  it('"Super-Eddington under every reading" lists only objects above P = 0.84 under each reading, not those without P under one', async () => {
    const q = READINGS_EXAMPLE_QUERIES.find((x) => x.title === 'Super-Eddington under every reading')!;
    const rows = await run(q.sql);
    expect(rows.map((r) => r.id)).toEqual(['A']);
    expect(rows[0]!.lowest_p_super_eddington).toBe(0.85);
    expect(Number(rows[0]!.readings)).toBe(3);
  });
});
