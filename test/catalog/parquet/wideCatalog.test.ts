// Regression: a catalog with 3,000 pass-through columns failed in the Parquet writer with
// "Out of Memory Error: failed to allocate data of size 16.0 KiB (122.0 MiB/122.0 MiB used)".
import { mkdtemp, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { DuckDBInstance } from '@duckdb/node-api';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { main } from '../../../src/catalog/cli/main.ts';

const STAND_IN = new URL('../derive/standIns/deriveObjectStandIn.ts', import.meta.url).href;

async function run(argv: string[]) {
  const err: string[] = [];
  const io = { stdout: { write: () => true }, stderr: { isTTY: false, write: (s: string) => err.push(s) } };
  const status = await main(['derive', ...argv], io, { deriveModule: STAND_IN });
  return { status, err: err.join('') };
}

function wideCsv(extra: number, rows: number): string {
  const header = ['id', 'z', 'fwhm_halpha', ...Array.from({ length: extra }, (_, i) => `extra_${i}`)];
  const lines = [header.join(',')];
  for (let r = 0; r < rows; r++) lines.push([`W-${r}`, '5.5', '2000', ...Array.from({ length: extra }, (_, i) => String((r * 31 + i) % 997))].join(','));
  return `${lines.join('\n')}\n`;
}

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-wide-'));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('a catalog with thousands of columns', () => {
  it('derives 3,000 pass-through columns and keeps every value', async () => {
    await writeFile(path.join(dir, 'wide.csv'), wideCsv(3000, 300));
    const r = await run([path.join(dir, 'wide.csv'), '--threads', '1', '--draws', '10', '--quiet']);
    expect(r).toEqual({ status: 0, err: '' });
    const db = await DuckDBInstance.create(':memory:');
    const con = await db.connect();
    const file = path.join(dir, 'wide.census.parquet');
    const cols = (await con.runAndReadAll(`SELECT count(*) AS n FROM parquet_schema('${file}') WHERE name LIKE 'extra_%'`)).getRowObjectsJS();
    const last = (await con.runAndReadAll(`SELECT id, extra_0, extra_2999 FROM '${file}' ORDER BY row DESC LIMIT 1`)).getRowObjectsJS();
    con.closeSync();
    db.closeSync();
    expect(Number(cols[0]!.n)).toBe(3000);
    expect(last[0]).toEqual({ id: 'W-299', extra_0: BigInt((299 * 31) % 997), extra_2999: BigInt((299 * 31 + 2999) % 997) });
  }, 180_000);

  it('stops with exit status 2 and one line, writing nothing, when there are more columns than the output can hold', async () => {
    await writeFile(path.join(dir, 'wider.csv'), wideCsv(5000, 2));
    const r = await run([path.join(dir, 'wider.csv'), '--threads', '1']);
    expect(r.status).toBe(2);
    expect(r.err).toMatch(/^\S*wider\.csv: 5,000 columns to pass through, 5,0\d\d to write in all, more than the 5,000 the output can hold; keep fewer columns in the catalog\n$/);
    expect(await readdir(dir)).toEqual(['wider.csv']);
  });
});
