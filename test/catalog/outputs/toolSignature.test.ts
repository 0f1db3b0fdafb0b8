import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { DuckDBInstance } from '@duckdb/node-api';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { defaultConfig } from '../../../src/catalog/config/defaultConfig.ts';
import { outputPaths } from '../../../src/catalog/derive/outputPaths.ts';
import { runDerive } from '../../../src/catalog/derive/runDerive.ts';
import { isToolOutput } from '../../../src/catalog/outputs/toolSignature.ts';
import { STAND_IN } from '../derive/fixtures.ts';

let dir: string;
beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-sig-'));
  await writeFile(path.join(dir, 'cat.csv'), 'id,z,fwhm_halpha\nA,5,2000\n');
  const config = defaultConfig();
  config.settings = { ...config.settings, draws: 10 };
  await runDerive({ catalogPath: path.join(dir, 'cat.csv'), config, outputPath: path.join(dir, 'ours.parquet'), threads: 1, deriveModule: STAND_IN });
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('isToolOutput', () => {
  it('recognises each file of a real derive run in its own role only', async () => {
    const ours = outputPaths(path.join(dir, 'ours.parquet'));
    expect(await isToolOutput(ours.catalog, 'catalog')).toBe(true);
    expect(await isToolOutput(ours.meta, 'meta')).toBe(true);
    expect(await isToolOutput(ours.rejections, 'rejections')).toBe(true);
    expect(await isToolOutput(ours.meta, 'catalog')).toBe(false);
    expect(await isToolOutput(ours.catalog, 'meta')).toBe(false);
    expect(await isToolOutput(ours.catalog, 'rejections')).toBe(false);
  });

  it('does not take a Parquet file, a JSON file or a CSV file of someone else for one of ours', async () => {
    const plain = path.join(dir, 'plain.parquet');
    const db = await DuckDBInstance.create(':memory:');
    const con = await db.connect();
    await con.run(`COPY (SELECT 1 AS dawn_census) TO '${plain}' (FORMAT parquet, KV_METADATA {note: 'dawn_census'})`);
    con.closeSync();
    db.closeSync();
    expect(await isToolOutput(plain, 'catalog')).toBe(false);
    const json = path.join(dir, 'other.json');
    await writeFile(json, JSON.stringify({ format: 'something-else/1', tool: { name: 'dawn-census' } }));
    expect(await isToolOutput(json, 'meta')).toBe(false);
    await writeFile(json, '{ not json');
    expect(await isToolOutput(json, 'meta')).toBe(false);
    const csv = path.join(dir, 'other.csv');
    await writeFile(csv, 'row,id,column,value\n1,A,z,3\n');
    expect(await isToolOutput(csv, 'rejections')).toBe(false);
    await writeFile(path.join(dir, 'empty'), '');
    expect(await isToolOutput(path.join(dir, 'empty'), 'catalog')).toBe(false);
    expect(await isToolOutput(path.join(dir, 'missing'), 'catalog')).toBe(false);
  });
});
