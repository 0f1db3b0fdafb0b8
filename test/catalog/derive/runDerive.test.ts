import { mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { DuckDBInstance } from '@duckdb/node-api';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { defaultConfig } from '../../../src/catalog/config/defaultConfig.ts';
import type { CensusConfig } from '../../../src/catalog/config/CensusConfig.ts';
import { runDerive } from '../../../src/catalog/derive/runDerive.ts';
import type { RejectionEntry } from '../../../src/catalog/derive/rejectionReport.ts';
import { CatalogError } from '../../../src/catalog/readers/CatalogError.ts';
import { STAND_IN } from './fixtures.ts';

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-derive-'));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

const CSV = [
  'id,z,fwhm_halpha,fwhm_halpha_err,m_f444w,notes',
  'A-1,5.1,2100,150,150.1,"plain"',
  'A-2,6.0,-1200,150,150.2,"negative width"',
  'A-3,4.4,1500,,150.3,"with, comma"',
  'A-4,7.2,,,150.4,',
  'A-5,40,1800,100,150.5,"z too high"',
].join('\n');

function config(draws = 64): CensusConfig {
  const c = defaultConfig();
  return { ...c, title: 'Test catalog', settings: { ...c.settings, draws, seed: 11 } };
}

async function query<T = Record<string, unknown>>(sql: string): Promise<T[]> {
  const db = await DuckDBInstance.create(':memory:');
  const con = await db.connect();
  try {
    return (await con.runAndReadAll(sql)).getRowObjectsJS() as T[];
  } finally {
    con.closeSync();
    db.closeSync();
  }
}

describe('runDerive', () => {
  it('writes every row in input order, with derived columns, flags and nulls for invalid rows, and the metadata', async () => {
    const input = path.join(dir, 'cat.csv');
    await writeFile(input, CSV);
    const out = path.join(dir, 'out', 'cat.parquet');
    const problems: RejectionEntry[] = [];
    const summary = await runDerive({ catalogPath: input, config: config(), outputPath: out, threads: 1, deriveModule: STAND_IN, onRowProblem: (p) => problems.push(p) });

    expect(summary).toMatchObject({ rows: 5, derived: 3, flagged: 2, problems: 2 });
    expect(problems.map((p) => [p.row, p.column])).toEqual([
      [2, 'fwhm_halpha'],
      [5, 'z'],
    ]);
    expect((await readdir(path.join(dir, 'out'))).sort()).toEqual(['cat.meta.json', 'cat.parquet', 'cat.readings.parquet', 'cat.rejections.csv']);

    const rows = await query(`SELECT * FROM '${out}'`);
    expect(rows.map((r) => r.id)).toEqual(['A-1', 'A-2', 'A-3', 'A-4', 'A-5']);
    expect(rows.map((r) => r.row)).toEqual([1n, 2n, 3n, 4n, 5n]);
    const columns = Object.keys(rows[0]!);
    expect(columns.slice(0, 6)).toEqual(['id', 'row', 'z', 'fwhm_halpha', 'fwhm_halpha_err', 'm_f444w']);
    expect(columns).toContain('notes');
    for (const c of ['age_gyr', 'dl_mpc', 'log_lum_halpha', 'log_mbh', 'mbh_method', 'log_lbol', 'lbol_method', 'log_edd_ratio', 'p_super_eddington', 'log_mseed', 'lambda_req_light', 'lambda_req_heavy', 'delta_log_mbh_local', 'local_offset_sigma', 'p_above_local', 'flags', 'log_mbh_p16', 'log_mbh_p50', 'log_mbh_p84', 'delta_log_mbh_local_p84']) {
      expect(columns).toContain(c);
    }
    expect(columns).not.toContain('log_lum_civ');

    const [a1, a2, a3, a4, a5] = rows;
    // stand-in log M = 6 + 2 log10(2100/1000) (internal: the stand-in's own formula).
    expect(a1!.log_mbh).toBeCloseTo(6 + 2 * Math.log10(2.1), 12);
    expect(a1!.flags).toBe('');
    expect(a1!.mbh_method).toBe('halpha:rv15_halpha');
    expect(a1!.notes).toBe('plain');
    expect(a2).toMatchObject({ flags: 'invalid_input', log_mbh: null, age_gyr: null, mbh_method: null, fwhm_halpha: null, z: 6 });
    expect(a3!.notes).toBe('with, comma');
    expect(a4!.flags).toBe('no_mass_line');
    expect(a5).toMatchObject({ flags: 'invalid_input', log_mbh: null });

    const [kv] = await query<{ v: string }>(`SELECT decode(value) AS v FROM parquet_kv_metadata('${out}') WHERE decode(key) = 'dawn_census'`);
    const meta = JSON.parse(kv!.v);
    expect(meta).toEqual(JSON.parse(await readFile(path.join(dir, 'out', 'cat.meta.json'), 'utf8')));
    expect(meta.title).toBe('Test catalog');
    expect(kv!.v).not.toContain(dir); // no absolute path: the bytes must not depend on where the run happens
    expect(meta.flags.invalid_input).toMatch(/failed validation/);
    expect(meta.files).toEqual({ catalog: 'cat.parquet', meta: 'cat.meta.json', rejections: 'cat.rejections.csv' });
    expect(meta.input.file).toBe('cat.csv');
    expect(meta.input.sha256).toMatch(/^[0-9a-f]{64}$/);
    expect(meta.input.columns).toEqual([
      { name: 'id', source: 'id', unit: '' },
      { name: 'z', source: 'z', unit: '' },
      { name: 'fwhm_halpha', source: 'fwhm_halpha', unit: '' },
      { name: 'fwhm_halpha_err', source: 'fwhm_halpha_err', unit: '' },
    ]);
    expect(meta.counts).toEqual({ rows: 5, derived: 3, flagged: 2, problems: 2 });
    expect(meta.settings.settings.draws).toBe(64);
    expect(meta.settings.cosmology.H0).toBe(67.66);
    expect(meta.columns.map((c: { name: string }) => c.name)).toEqual(columns);
    const logMbh = meta.columns.find((c: { name: string }) => c.name === 'log_mbh');
    expect(logMbh.reference).toMatch(/Reines & Volonteri 2015/);

    const report = await readFile(path.join(dir, 'out', 'cat.rejections.csv'), 'utf8');
    expect(report.split('\n')[0]).toBe('row,id,column,value,reason,message');
    expect(report).toMatch(/^2,A-2,fwhm_halpha,-1200,must be positive,/m);
    expect(report.trim().split('\n')).toHaveLength(3);
  });

  it('gives byte-identical outputs with 1 and 2 threads and on a second run', async () => {
    const input = path.join(dir, 'big.csv');
    const lines = ['id,z,fwhm_halpha'];
    for (let i = 0; i < 3000; i++) lines.push(`o${i},${(4 + (i % 50) / 10).toFixed(2)},${1000 + (i % 97) * 20}`);
    await writeFile(input, lines.join('\n'));
    const outs = ['t1a', 't1b', 't2'].map((n) => path.join(dir, n, 'big.parquet'));
    await runDerive({ catalogPath: input, config: config(32), outputPath: outs[0]!, threads: 1, chunkRows: 500, deriveModule: STAND_IN });
    await runDerive({ catalogPath: input, config: config(32), outputPath: outs[1]!, threads: 1, chunkRows: 700, deriveModule: STAND_IN });
    await runDerive({ catalogPath: input, config: config(32), outputPath: outs[2]!, threads: 2, chunkRows: 300, deriveModule: STAND_IN });
    const bytes = await Promise.all(outs.map((o) => readFile(o)));
    expect(bytes[0]!.equals(bytes[1]!)).toBe(true);
    expect(bytes[0]!.equals(bytes[2]!)).toBe(true);
    const metas = await Promise.all(outs.map((o) => readFile(o.replace(/parquet$/, 'meta.json'), 'utf8')));
    expect(metas[2]).toBe(metas[0]);
    const readings = await Promise.all(outs.map((o) => readFile(o.replace(/parquet$/, 'readings.parquet'))));
    expect(readings[0]!.equals(readings[1]!)).toBe(true);
    expect(readings[0]!.equals(readings[2]!)).toBe(true);
  });

  it('refuses duplicate ids as a catalog error, leaving an earlier output untouched and no temporary file', async () => {
    const input = path.join(dir, 'cat.csv');
    await writeFile(input, CSV);
    const out = path.join(dir, 'cat.parquet');
    await runDerive({ catalogPath: input, config: config(), outputPath: out, threads: 1, deriveModule: STAND_IN });
    const before = await Promise.all(['cat.parquet', 'cat.meta.json', 'cat.rejections.csv'].map((f) => readFile(path.join(dir, f))));

    await writeFile(input, `${CSV}\nA-3,5,1000,10,1,\n`);
    const run = runDerive({ catalogPath: input, config: config(), outputPath: out, threads: 2, chunkRows: 2, deriveModule: STAND_IN });
    await expect(run).rejects.toThrow(CatalogError);
    await expect(run).rejects.toThrow(/cat\.csv: duplicate id "A-3" at rows 3 and 6$/);
    expect((await readdir(dir)).sort()).toEqual(['cat.csv', 'cat.meta.json', 'cat.parquet', 'cat.readings.parquet', 'cat.rejections.csv']);
    const after = await Promise.all(['cat.parquet', 'cat.meta.json', 'cat.rejections.csv'].map((f) => readFile(path.join(dir, f))));
    for (let i = 0; i < 3; i++) expect(after[i]!.equals(before[i]!)).toBe(true);
  });

  it('refuses a passthrough column named like a derived column, case ignored', async () => {
    const input = path.join(dir, 'clash.csv');
    await writeFile(input, 'id,z,Log_Mbh\nA,5,7\n');
    await expect(runDerive({ catalogPath: input, config: config(), outputPath: path.join(dir, 'clash.parquet'), threads: 1, deriveModule: STAND_IN })).rejects.toThrow(
      /clash\.csv: column "Log_Mbh" has the name of a derived output column \("log_mbh"\)/,
    );
    expect(await readdir(dir)).toEqual(['clash.csv']);
  });
});

describe('runDerive, the early look at the input medians', () => {
  /** `rows` rows whose widths are `fwhm` (in m/s when 2e6: 1000 times the plausible km/s). */
  function catalog(rows: number, fwhm: number): string {
    const lines = ['id,z,fwhm_halpha,fwhm_halpha_err'];
    for (let i = 0; i < rows; i++) lines.push(`E-${i},${(5 + (i % 30) / 10).toFixed(1)},${fwhm + 10 * (i % 7)},${fwhm / 10}`);
    return lines.join('\n');
  }
  async function run(rows: number, fwhm: number, intended = false): Promise<{ notices: string[]; error: unknown }> {
    const input = path.join(dir, `cat-${rows}-${fwhm}.csv`);
    await writeFile(input, catalog(rows, fwhm));
    const notices: string[] = [];
    let error: unknown = null;
    try {
      await runDerive({
        catalogPath: input,
        config: { ...config(16), implausibleMediansIntended: intended },
        outputPath: path.join(dir, `out-${rows}-${fwhm}-${intended}`, 'cat.parquet'),
        threads: 1,
        deriveModule: STAND_IN,
        chunkRows: 50,
        earlyMedianRows: 100,
        onNotice: (t) => notices.push(t),
      });
    } catch (e) {
      error = e;
    }
    return { notices, error };
  }

  it('says after the first rows what will stop the run at the end, with the same message', async () => {
    const { notices, error } = await run(300, 2e6);
    expect(error).toBeInstanceOf(CatalogError);
    const final = (error as Error).message;
    expect(final).toMatch(/column fwhm_halpha, read in km\/s: the median FWHM is .* km\/s, outside 300–20000 km\/s: the widths look like m\/s/);
    expect(notices).toHaveLength(1);
    expect(notices[0]).toBe(`${final} (from the first 100 of 300 rows). The run goes on, and stops at the end with this message if the whole catalog gives it too; Ctrl-C stops it now.`);
  });

  it('says nothing early when too few rows are left to be worth it, when the medians are plausible, or when they are intended', async () => {
    const short = await run(150, 2e6);
    expect(short.error).toBeInstanceOf(CatalogError);
    expect(short.notices).toEqual([]);
    const fine = await run(300, 2000);
    expect(fine.error).toBeNull();
    expect(fine.notices).toEqual([]);
    const intended = await run(300, 2e6, true);
    expect(intended.error).toBeNull();
    expect(intended.notices).toEqual([]);
  });
});
