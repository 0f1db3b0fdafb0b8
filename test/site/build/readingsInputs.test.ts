import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DuckDBInstance } from '@duckdb/node-api';
import { readingsInputs } from '../../../src/site/build/readingsInputs.ts';
import { writeFixtureCatalog, type FixtureCatalog } from '../fixtures/fixtureCatalog.ts';

describe('the live reading\'s inputs prepared at build time', () => {
  let dir: string;
  let fx: FixtureCatalog;
  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'census-inputs-'));
    fx = await writeFixtureCatalog(dir, { n: 12 });
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('gives every object its derivation inputs in catalog order, from the canonical columns in canonical units', async () => {
    const file = (await readingsInputs({ parquet: fx.parquet, meta: fx.meta }))!;
    expect(file.inputs.map((o) => o.id)).toEqual(fx.ids);
    const db = await DuckDBInstance.create(':memory:');
    const con = await db.connect();
    const rows = (await con.runAndReadAll(`SELECT z, fwhm_halpha, fwhm_halpha_err, flux_halpha, flux_halpha_is_limit, mu, log_mstar FROM read_parquet('${fx.parquet}') ORDER BY "row"`)).getRowObjectsJS();
    con.closeSync();
    db.closeSync();
    rows.forEach((r, i) => {
      const o = file.inputs[i]!;
      expect(o.z).toBe(r.z);
      expect(o.lines.halpha?.fwhmKms).toEqual({ value: r.fwhm_halpha, errLo: r.fwhm_halpha_err, errHi: r.fwhm_halpha_err });
      expect(o.lines.halpha?.fluxCgs?.value).toBe(r.flux_halpha);
      expect(Boolean(o.lines.halpha?.fluxIsLimit)).toBe(r.flux_halpha_is_limit);
      expect(o.mu?.value).toBe(r.mu);
      expect(file.logMstar[i]).toBe(r.log_mstar);
    });
    // The file is JSON: the doubles must come back unchanged.
    expect(JSON.parse(JSON.stringify(file))).toEqual(file);
  });

  it('leaves out the rows the build flagged invalid_input, as the build derived nothing for them', async () => {
    const parquet = join(dir, 'flagged.parquet');
    const db = await DuckDBInstance.create(':memory:');
    const con = await db.connect();
    await con.run(`COPY (SELECT * REPLACE (CASE WHEN "row" IN (2, 5) THEN 'invalid_input' ELSE flags END AS flags) FROM read_parquet('${fx.parquet}')) TO '${parquet}' (FORMAT parquet)`);
    con.closeSync();
    db.closeSync();
    const file = (await readingsInputs({ parquet, meta: fx.meta }))!;
    expect(file.inputs.map((o) => o.id)).toEqual(fx.ids.filter((_, i) => i !== 1 && i !== 4));
    expect(file.logMstar).toHaveLength(10);
  });
});
