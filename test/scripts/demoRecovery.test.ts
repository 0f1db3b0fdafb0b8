/**
 * The demo generator has its own forward model (its own Planck18 distance, its own copies of
 * the published relations), written apart from the science core on purpose. Deriving its
 * noise-free catalog through the real CLI must give back the model's masses, Eddington ratios
 * and local offsets: an end-to-end check of readers, units, normalisation, cosmology,
 * calibrations and bolometric corrections against an independent implementation.
 */
import { describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { DuckDBInstance } from '@duckdb/node-api';
import { iterateDemoObjects, type DemoObject } from '../../scripts/lib/demoPopulation.ts';
import { toCsv } from '../../scripts/lib/demoCsv.ts';

const root = resolve(import.meta.dirname, '../..');

describe('the demo catalog derived through the CLI', () => {
  it('gives back the population model’s virial masses, Eddington ratios and local offsets from noise-free inputs', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'census-recovery-'));
    try {
      const objects: DemoObject[] = [...iterateDemoObjects({ n: 300, seed: 99, noiseFree: true })];
      writeFileSync(join(dir, 'cat.csv'), toCsv(objects.map((o) => o.row)));
      const unit = '"1e-18 erg s-1 cm-2"';
      writeFileSync(
        join(dir, 'census.config.yaml'),
        ['input: { path: cat.csv }', 'columns:', ...['flux_halpha', 'flux_halpha_err', 'flux_hbeta', 'flux_hbeta_err'].map((c) => `  ${c}: { unit: ${unit} }`), 'bc5100: 10.33', 'draws: 16', 'output: out.parquet'].join('\n'),
      );
      execFileSync(process.execPath, [join(root, 'bin/dawn-census.js'), 'derive', '-c', join(dir, 'census.config.yaml'), '--threads', '1', '--quiet']);

      const db = await DuckDBInstance.create(':memory:');
      const con = await db.connect();
      const rows = (await con.runAndReadAll(`SELECT id, log_mbh, log_edd_ratio, delta_log_mbh_local FROM read_parquet('${join(dir, 'out.parquet')}')`)).getRowObjectsJS() as {
        id: string;
        log_mbh: number | null;
        log_edd_ratio: number | null;
        delta_log_mbh_local: number | null;
      }[];
      con.closeSync();
      db.closeSync();
      const byId = new Map(rows.map((r) => [r.id, r]));

      // Tolerance: the generator writes rounded values (z to 1e-4, fluxes and widths to 4-5
      // significant digits, log M* to 0.01); 3e-3 dex covers the rounding (internal check).
      const tol = 3e-3;
      let compared = 0;
      for (const { truth } of objects) {
        if (truth.isLimit) continue; // a limit is not the true flux: nothing to recover
        const r = byId.get(truth.id)!;
        // The widths encode the virial mass (true mass + the calibration's scatter): that is what a derivation gives back,
        // and its Eddington ratio and local offset follow from it.
        const shift = truth.logMbhVirial - truth.logMbh;
        expect(Math.abs(r.log_mbh! - truth.logMbhVirial), `${truth.id} log_mbh (${truth.branch})`).toBeLessThan(tol);
        expect(Math.abs(r.log_edd_ratio! - (truth.logEddRatio - shift)), `${truth.id} log_edd_ratio (${truth.branch})`).toBeLessThan(tol);
        if (truth.hasHost) expect(Math.abs(r.delta_log_mbh_local! - (truth.deltaLogMbhLocal + shift)), `${truth.id} delta`).toBeLessThan(tol + 0.011);
        compared++;
      }
      expect(compared).toBeGreaterThan(200);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
