/**
 * Published high-redshift black-hole masses and luminosities, recomputed from their published
 * inputs through the whole command (CSV reader, unit handling, validation, worker threads,
 * Parquet writer) with the defaults a catalog without a config gets, and with a config that
 * chooses another calibration and Eddington constant.
 */
import { execFile } from 'node:child_process';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import { DuckDBInstance } from '@duckdb/node-api';
import { afterAll, beforeAll, describe, it } from 'vitest';
import { expectClose } from '../../helpers/expectClose.ts';

const BIN = fileURLToPath(new URL('../../../bin/dawn-census.js', import.meta.url));
const run = promisify(execFile);
let dir: string;

async function derive(csv: string, config?: string): Promise<Map<string, Record<string, number>>> {
  const input = path.join(dir, `in-${Math.random().toString(36).slice(2)}.csv`);
  await writeFile(input, csv);
  const out = input.replace(/\.csv$/, '.parquet');
  const args = [BIN, 'derive', input, '-o', out, '--draws', '50', '--quiet'];
  if (config) {
    const cfg = input.replace(/\.csv$/, '.yaml');
    await writeFile(cfg, config);
    args.push('-c', cfg);
  }
  await run(process.execPath, args);
  const db = await DuckDBInstance.create(':memory:');
  const con = await db.connect();
  const rows = (await con.runAndReadAll(`SELECT id, log_mbh, log_lbol, log_edd_ratio FROM '${out}'`)).getRowObjectsJS() as Record<string, number>[];
  con.closeSync();
  db.closeSync();
  return new Map(rows.map((r) => [String(r.id), r]));
}

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-published-'));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('published values recomputed through dawn-census derive', () => {
  // The redshifts below are placeholders: a luminosity given directly makes mass and L_bol independent of z.
  it('reproduces Matthee et al. 2024 masses and L_bol with their BC5100 = 10.33 set in the config', async () => {
    const rows = await derive('id,z,fwhm_halpha,lum_halpha\nGOODS-N-4014,5.2,2103,4.6e42\nJ0148-12884,5.2,1166,2.3e42\n', 'bc5100: 10.33');
    const src = 'Matthee et al. 2024, ApJ 963, 129 (RV15 with ε = 1.075; two decimals published)';
    expectClose(rows.get('GOODS-N-4014')!.log_mbh!, 7.58, { atol: 0.005, source: src });
    expectClose(rows.get('J0148-12884')!.log_mbh!, 6.91, { atol: 0.005, source: src });
    // L_bol = 9.3e44 (two digits); the rounded input 4.6e42 gives 9.22e44, within the two roundings (1.5 %)
    expectClose(10 ** rows.get('GOODS-N-4014')!.log_lbol!, 9.3e44, { rtol: 0.015, source: 'Matthee et al. 2024, ApJ 963, 129, GOODS-N-4014 L_bol' });
  });

  it('reproduces Harikane et al. 2023 masses and an Eddington ratio with Greene & Ho 2005 eq. 6 and 1.3e38 chosen in the config', async () => {
    const rows = await derive(
      'id,z,fwhm_halpha,lum_halpha,lam_l_5100\nCEERS-01244,4.5,2228,7.7e42,\nGLASS-160133,4.0,1028,1.2e42,1.0648e44\n',
      ['calibrations: { halpha: gh05_halpha }', 'bolometric: bc5100', 'bc5100: 10.33', 'eddington_per_msun: 1.3e38'].join('\n'),
    );
    const src = 'Harikane et al. 2023, ApJ 959, 39 (Greene & Ho 2005 eq. 6; two digits published)';
    expectClose(10 ** rows.get('CEERS-01244')!.log_mbh!, 3.2e7, { rtol: 0.016, source: src });
    expectClose(10 ** rows.get('GLASS-160133')!.log_mbh!, 2.3e6, { rtol: 0.022, source: src });
    // GLASS-160133: published L_bol = 1.1e45 → λL5100 = 1.1e45/10.33 = 1.0648e44 given here so that L_bol is theirs;
    // λ_Edd = 3.68 with their rounded mass 2.3e6 (3.61 with the unrounded 2.34e6): allow the mass rounding (2 %).
    expectClose(10 ** rows.get('GLASS-160133')!.log_edd_ratio!, 3.68, { rtol: 0.025, source: 'Harikane et al. 2023, ApJ 959, 39, λ_Edd with 1.3e38' });
  });
});
