import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DuckDBInstance } from '@duckdb/node-api';
import { catalogFiles } from '../../../src/site/build/catalogFiles.ts';
import { catalogCsv, readCatalog } from '../../../src/site/build/loadCatalog.ts';
import { methodsView } from '../../../src/site/build/methodsView.ts';
import { objectView } from '../../../src/site/build/objectView.ts';
import { writeFixtureCatalog, type FixtureCatalog } from '../fixtures/fixtureCatalog.ts';

describe('reading the catalog at build time', () => {
  let dir: string;
  let fx: FixtureCatalog;
  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'census-site-'));
    fx = await writeFixtureCatalog(dir, { n: 12 });
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('finds the Parquet file and its sidecar from CENSUS_CATALOG and says what is missing', () => {
    expect(catalogFiles({ CENSUS_CATALOG: fx.parquet })).toEqual({ parquet: fx.parquet, meta: fx.meta });
    expect(() => catalogFiles({ CENSUS_CATALOG: join(dir, 'nope.parquet') })).toThrow(/does not exist/);
  });

  it('reads every row and counts objects, derived masses and flagged objects', async () => {
    const cat = await readCatalog({ parquet: fx.parquet, meta: fx.meta });
    expect(cat.rows.map((r) => r.id)).toEqual(fx.ids);
    // The fixture flags rows 3, 7, 11 (no host mass) and 2, 7 (out of range): four distinct rows; every row has a mass.
    expect(cat.summary).toMatchObject({ objects: 12, derived: 12, flagged: 4 });
    expect(cat.summary.zMin).toBeLessThan(cat.summary.zMax!);
    // no_host_mass on rows 3, 7, 11; calibration_out_of_range on rows 2, 7.
    expect(cat.summary.flagCounts).toEqual([
      { flag: 'no_host_mass', count: 3 },
      { flag: 'calibration_out_of_range', count: 2 },
    ]);
  });

  it('writes the CSV download with a header and every row', async () => {
    const bytes = await catalogCsv(fx.parquet, join(dir, 'out.csv'));
    const lines = bytes.toString('utf8').trim().split('\n');
    expect(lines[0]!.split(',')[0]).toBe('id');
    expect(lines).toHaveLength(13);
  });

  it('makes the CSV download safe for spreadsheets: formula-like text neutralised, control characters escaped, numbers as they are', async () => {
    const parquet = join(dir, 'hostile.parquet');
    const db = await DuckDBInstance.create(':memory:');
    const con = await db.connect();
    await con.run(
      `COPY (SELECT * FROM (VALUES ('=HYPERLINK("http://x")', -1.5::DOUBLE, 3::BIGINT, 'a\x1b[31mb'), ('-0042', NULL, -2::BIGINT, '@SUM(A1)')) t(id, log_mbh, n, notes)) TO '${parquet}' (FORMAT parquet)`,
    );
    con.closeSync();
    db.closeSync();
    const text = (await catalogCsv(parquet, join(dir, 'hostile.csv'))).toString('utf8');
    expect(text).toBe('id,log_mbh,n,notes\n"\'=HYPERLINK(""http://x"")",-1.5,3,a\\x1B[31mb\n-0042,,-2,\'@SUM(A1)\n');
  });

  it('arranges one object for its page: inputs with errors, derived values with 16–84 intervals, flags in words', async () => {
    const cat = await readCatalog({ parquet: fx.parquet, meta: fx.meta });
    const row = cat.rows[3]!;
    const view = objectView(row, cat.columns.map((c) => c.name), cat.meta);
    const mbh = view.derived.find((l) => l.column === 'log_mbh')!;
    expect(mbh.spread).toBe(`${(Number(row.log_mbh) - 0.4).toFixed(2)} – ${(Number(row.log_mbh) + 0.4).toFixed(2)}`);
    expect(view.inputs.find((l) => l.column === 'fwhm_halpha')!.spread).toBe('± 150');
    expect(view.other.map((l) => l.column)).toEqual(expect.arrayContaining(['field', 'notes']));
    expect(view.position).not.toBeNull();
    expect([...view.inputs, ...view.other].map((l) => l.column)).not.toContain('ra');
    expect(view.flags.map((f) => f.code)).toEqual(['no_host_mass']);
  });

  it('reads the methods from the metadata: the calibration with its reference and scatter', async () => {
    const cat = await readCatalog({ parquet: fx.parquet, meta: fx.meta });
    const m = methodsView(cat.meta);
    expect(m.cosmology.reference).toMatch(/Planck/);
    expect(m.calibrations[0]).toMatchObject({ line: 'halpha', id: 'Ha_GH05', scatter: '0.3' });
    expect(JSON.parse(readFileSync(fx.meta, 'utf8')).settings.seed).toBe(42);
  });
});
