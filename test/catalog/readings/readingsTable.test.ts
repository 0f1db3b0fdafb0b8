import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { DuckDBInstance } from '@duckdb/node-api';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { defaultConfig } from '../../../src/catalog/config/defaultConfig.ts';
import { parseConfig } from '../../../src/catalog/config/index.ts';
import { runDerive } from '../../../src/catalog/derive/runDerive.ts';
import { READINGS_COLUMNS } from '../../../src/catalog/readings/readingsColumns.ts';
import { expectClose } from '../../helpers/expectClose.ts';

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-readings-'));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

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

const CSV = [
  'id,z,fwhm_halpha,fwhm_halpha_err,fwhm_halpha_core,flux_halpha,flux_halpha_err,balmer_decrement,log_mstar',
  'R-1,5.0,2500,200,1000,3e-17,3e-18,5,9.0',
  'R-2,6.0,3000,300,,2e-17,2e-18,6,9.5',
  'R-3,7.0,-5,1,,1e-17,1e-18,,',
].join('\n');

describe('the readings table', () => {
  it('holds one row per object and reading, with the real derivation under each reading and the primary reading in the main catalog', async () => {
    const input = path.join(dir, 'cat.csv');
    await writeFile(input, CSV);
    const out = path.join(dir, 'cat.parquet');
    const c = defaultConfig();
    await runDerive({ catalogPath: input, config: { ...c, settings: { ...c.settings, draws: 100, seed: 5 } }, outputPath: out, threads: 1 });
    const file = path.join(dir, 'cat.readings.parquet');
    const rows = await query(`SELECT * FROM '${file}'`);
    expect(rows.map((r) => `${r.id}/${r.reading}`)).toEqual(
      ['R-1', 'R-2', 'R-3'].flatMap((id) => ['standard', 'scattering_core', 'dense_gas', 'small_bolometric'].map((r) => `${id}/${r}`)),
    );
    expect(Object.keys(rows[0]!)).toEqual(READINGS_COLUMNS.map((col) => col.name));
    const get = (id: string, reading: string) => rows.find((r) => r.id === id && r.reading === reading)!;
    const main = await query(`SELECT id, log_mbh, log_lbol, flags FROM '${out}' ORDER BY row`);
    expect(get('R-1', 'standard')).toMatchObject(main[0]!);

    // R-1 has a core width: 2.06·log10(2500/1000) lower (Reines & Volonteri 2015 eq. 5, FWHM exponent 2.06).
    expectClose((get('R-1', 'standard').log_mbh as number) - (get('R-1', 'scattering_core').log_mbh as number), 2.06 * Math.log10(2.5), {
      atol: 1e-12,
      source: 'Reines & Volonteri 2015 eq. 5, FWHM exponent 2.06',
    });
    expect(get('R-1', 'scattering_core').flags).toContain('width_from_core');
    // R-2 has none: falls back to the deflation 10, flagged.
    expect(get('R-2', 'scattering_core').flags).toContain('core_width_fallback');
    expectClose((get('R-2', 'standard').log_mbh as number) - (get('R-2', 'scattering_core').log_mbh as number), 2.06, { atol: 1e-12, source: 'deflation 10, exponent 2.06' });
    // R-3 is invalid: every reading row says so, with no values.
    for (const r of ['standard', 'dense_gas']) expect(get('R-3', r)).toMatchObject({ flags: 'invalid_input', log_mbh: null });

    const meta = JSON.parse(await readFile(path.join(dir, 'cat.meta.json'), 'utf8'));
    expect(meta.readings.primary).toBe('standard');
    expect(meta.readings.readings.map((r: { id: string }) => r.id)).toEqual(['standard', 'scattering_core', 'dense_gas', 'small_bolometric']);
    expect(meta.readings.summary).toHaveLength(4);
    expect(meta.readings.summary[0]).toMatchObject({ reading: 'standard', objects: 3 });
    expect(meta.readings.intervalMethod).toMatch(/Wilson/);
    const [kv] = await query<{ v: string }>(`SELECT decode(value) AS v FROM parquet_kv_metadata('${file}') WHERE decode(key) = 'dawn_census_readings'`);
    const own = JSON.parse(kv!.v);
    expect(own.columns.map((col: { name: string }) => col.name)).toEqual(READINGS_COLUMNS.map((col) => col.name));
    expect(own.readings[3].bolometric).toMatchObject({ mode: 'l5100_ratio', ratio: 5 });
  });

  it('derives the main catalog under the configured primary reading and adds custom readings from the config', async () => {
    const input = path.join(dir, 'cat.csv');
    await writeFile(input, CSV);
    const cfg = parseConfig(
      [
        'draws: 50',
        'readings:',
        '  primary: halved',
        '  use: [standard, halved]',
        '  custom:',
        '    - { id: halved, premise: Widths are half the measured ones., references: [Invented 2026], deflation: 2 }',
      ].join('\n'),
      path.join(dir, 'census.config.yaml'),
    );
    const out = path.join(dir, 'cat.parquet');
    await runDerive({ catalogPath: input, config: cfg, outputPath: out, threads: 1 });
    const rows = await query<{ id: string; reading: string; log_mbh: number }>(`SELECT id, reading, log_mbh FROM '${dir}/cat.readings.parquet'`);
    expect([...new Set(rows.map((r) => r.reading))]).toEqual(['standard', 'halved']);
    const main = await query<{ log_mbh: number }>(`SELECT log_mbh FROM '${out}' ORDER BY row`);
    expect(main[0]!.log_mbh).toBe(rows.find((r) => r.id === 'R-1' && r.reading === 'halved')!.log_mbh);
  });
});
