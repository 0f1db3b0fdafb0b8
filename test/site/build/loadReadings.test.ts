import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { readReadings } from '../../../src/site/build/loadReadings.ts';
import { deriveTiny } from '../../catalog/publish/deriveTiny.ts';

describe('reading the readings at build time', () => {
  let dir: string;
  let parquet: string;
  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'census-readings-'));
    ({ parquet } = await deriveTiny(dir));
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('gives every object its values under every reading, for the object pages', async () => {
    const r = await readReadings(parquet);
    expect(r.readings.length).toBeGreaterThan(1);
    expect([...r.byId.keys()].sort()).toEqual(['T-1', 'T-2', 'T-3']);
    expect(r.byId.get('T-1')!.map((v) => v.reading)).toEqual(r.readings.map((x) => x.id));
  });

  it('skips the per-object values when the build makes no object pages, and keeps the records and summaries', async () => {
    const r = await readReadings(parquet, false);
    expect(r.byId.size).toBe(0);
    expect(r.readings.length).toBeGreaterThan(1);
    expect(r.summary.length).toBe(r.readings.length);
  });
});
