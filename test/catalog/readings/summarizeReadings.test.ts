import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { DuckDBInstance } from '@duckdb/node-api';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openParquetWriter, type CellValue, type ParquetColumn } from '../../../src/catalog/parquet/parquetWriter.ts';
import { summarizeReadingRows, summarizeReadings } from '../../../src/catalog/readings/summarizeReadings.ts';
import { expectClose } from '../../helpers/expectClose.ts';

let dir: string;
let file: string;

/**
 * 400 objects under 'a' (3 super-Eddington at P > 0.84), 10 under 'b' (5), 1 under 'c' (1 of 1);
 * under 'd', 6 objects of which 4 rest on an upper-limit mass or Eddington ratio (flagged), whose
 * offsets, required λ and values a bound cannot count as measured.
 */
beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-summary-'));
  file = path.join(dir, 'r.parquet');
  const db = await DuckDBInstance.create(':memory:');
  const con = await db.connect();
  await con.run(`CREATE TABLE t AS
    SELECT 'a' AS reading, i AS n, CASE WHEN i < 3 THEN 0.9 ELSE 0.5 END AS p_super_eddington,
      CASE WHEN i < 334 THEN (CASE WHEN i < 176 THEN 1.5 ELSE 0.2 END) ELSE NULL END AS delta_log_mbh_local,
      0.5 AS lambda_req_light, i::DOUBLE / 100 AS log_mbh, -1.0 AS log_edd_ratio, 'no_dust_correction' AS flags FROM range(400) r(i)
    UNION ALL SELECT 'b', i, CASE WHEN i < 5 THEN 0.85 ELSE 0.84 END, NULL, 2.0, i::DOUBLE, NULL, NULL FROM range(10) r(i)
    UNION ALL SELECT 'c', 0, 1.0, NULL, NULL, 7.0, 0.5, ''
    UNION ALL SELECT 'd', i, CASE WHEN i < 2 THEN 0.9 ELSE NULL END, 1.5, 2.0, 6.0 + i, i::DOUBLE - 3,
      CASE i WHEN 2 THEN 'edd_ratio_upper_limit,lbol_upper_limit,mbh_upper_limit' WHEN 3 THEN 'edd_ratio_upper_limit,mbh_upper_limit,no_host_mass'
        WHEN 4 THEN 'edd_ratio_lower_limit' WHEN 5 THEN 'mbh_upper_limit' ELSE 'no_dust_correction' END FROM range(6) r(i)`);
  await con.run(`COPY t TO '${file}' (FORMAT parquet)`);
  con.closeSync();
  db.closeSync();
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('summarizeReadings', () => {
  it('counts super-Eddington (P > 0.84), over-massive (> 1 dex) and light-seed λ > 1 objects with Wilson 68 % intervals', async () => {
    const [a, b, c] = await summarizeReadings(file, ['a', 'b', 'c']);
    expect(a!.reading).toBe('a');
    expect(a!.objects).toBe(400);
    expect(a!.superEddington).toMatchObject({ k: 3, n: 400, fraction: 0.0075 });
    // Computed with astropy 5.2.1: binom_conf_interval(3, 400, 0.682689492137086, 'wilson') = [0.00424807, 0.01320829].
    expectClose(a!.superEddington.lo!, 0.00424807, { atol: 5e-9, source: 'astropy 5.2.1 binom_conf_interval wilson, 8 digits' });
    expectClose(a!.superEddington.hi!, 0.01320829, { atol: 5e-9, source: 'astropy 5.2.1 binom_conf_interval wilson, 8 digits' });
    // astropy 5.2.1: binom_conf_interval(176, 334, …, 'wilson') = [0.49958733, 0.55414401].
    expect(a!.overMassive).toMatchObject({ k: 176, n: 334 });
    expectClose(a!.overMassive.lo!, 0.49958733, { atol: 5e-9, source: 'astropy 5.2.1 binom_conf_interval wilson, 8 digits' });
    expectClose(a!.overMassive.hi!, 0.55414401, { atol: 5e-9, source: 'astropy 5.2.1 binom_conf_interval wilson, 8 digits' });
    expect(a!.needsSuperEddingtonLight).toMatchObject({ k: 0, n: 400, fraction: 0 });
    // astropy 5.2.1: binom_conf_interval(0, 400, …, 'wilson') upper = 2.49376559e-03.
    expectClose(a!.needsSuperEddingtonLight.hi!, 2.49376559e-3, { atol: 5e-11, source: 'astropy 5.2.1 binom_conf_interval wilson' });
    expectClose(a!.medianLogMbh!, 1.995, { atol: 1e-12, source: 'median of 0.00 … 3.99 (internal, by construction)' });

    // 0.84 itself is not above 0.84; astropy 5.2.1 wilson for 5 of 10: [0.34924433, 0.65075567].
    expect(b!.superEddington).toMatchObject({ k: 5, n: 10 });
    expectClose(b!.superEddington.lo!, 0.34924433, { atol: 5e-9, source: 'astropy 5.2.1 binom_conf_interval wilson, 8 digits' });
    expect(b!.overMassive).toMatchObject({ k: 0, n: 0, fraction: null, lo: null, hi: null });
    expect(b!.medianLogEddRatio).toBeNull();
    // astropy 5.2.1: 1 of 1 → [0.5, 1].
    expect(c!.superEddington).toMatchObject({ k: 1, n: 1, fraction: 1, lo: 0.5, hi: 1 });
  });

  it('leaves bounds out: an offset or a required λ from an upper-limit mass is not counted, nor a bound in the medians', async () => {
    const [d] = await summarizeReadings(file, ['d']);
    expect(d!.objects).toBe(6);
    // Masses measured: rows 0, 1 and 4 (row 4 is a lower limit on λ_Edd only); all three are > 1 dex above and need λ > 1.
    expect(d!.overMassive).toMatchObject({ k: 3, n: 3, fraction: 1 });
    expect(d!.needsSuperEddingtonLight).toMatchObject({ k: 3, n: 3, fraction: 1 });
    expect(d!.superEddington).toMatchObject({ k: 2, n: 2 });
    // Median of the measured masses 6, 7 and 10 (rows 0, 1, 4); of the ratios not flagged as bounds −3, −2 and 2 (rows 0, 1, 5).
    expect(d!.medianLogMbh).toBe(7);
    expect(d!.medianLogEddRatio).toBe(-2);
  });

  it('returns the readings in the order asked, leaving out ids the table does not hold', async () => {
    expect((await summarizeReadings(file, ['c', 'x', 'a'])).map((s) => s.reading)).toEqual(['c', 'a']);
  });
});

describe('summarizeReadingRows', () => {
  it("gives the file's summary from a Parquet writer's committed scratch table, in the order asked", async () => {
    const db = await DuckDBInstance.create(':memory:');
    const con = await db.connect();
    const rows = (await con.runAndReadAll(`SELECT reading, n, p_super_eddington, delta_log_mbh_local, lambda_req_light, log_mbh, log_edd_ratio, flags FROM '${file}'`)).getRows();
    con.closeSync();
    db.closeSync();
    const columns: ParquetColumn[] = [
      { name: 'reading', kind: 'string' }, { name: 'n', kind: 'int' }, { name: 'p_super_eddington', kind: 'float' }, { name: 'delta_log_mbh_local', kind: 'float' },
      { name: 'lambda_req_light', kind: 'float' }, { name: 'log_mbh', kind: 'float' }, { name: 'log_edd_ratio', kind: 'float' }, { name: 'flags', kind: 'string' },
    ];
    const w = await openParquetWriter(path.join(dir, 'w.parquet'), columns, { scratchDir: path.join(dir, 'scratch-w') });
    for (const r of rows) w.appendRow(r as CellValue[]);
    await expect(w.queryRows('SELECT 1')).rejects.toThrow(/before commit/);
    await w.commit();
    expect(() => w.appendRow(rows[0] as CellValue[])).toThrow(/after commit/);
    const fromTable = await summarizeReadingRows((sql) => w.queryRows(sql), ['c', 'a', 'b', 'd']);
    await w.finish({});
    expect(fromTable.map((s) => s.reading)).toEqual(['c', 'a', 'b', 'd']);
    expect(fromTable).toEqual(await summarizeReadings(file, ['c', 'a', 'b', 'd']));
    expect(fromTable[1]!.superEddington).toMatchObject({ k: 3, n: 400 });
  });
});
