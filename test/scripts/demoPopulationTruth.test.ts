/**
 * The demo catalog is drawn from the population step's own forward model (scripts/lib/demoHosts.ts) with a known
 * intrinsic relation, written to data-demo/truth.json. Deriving the committed demo and running the selection-aware
 * fit must give that relation back. The derive and the converged fit take about 35 CPU s (under a minute of wall
 * time even on a busy 2-core machine), so the check runs with the unit tests, under its own timeout.
 */
import { execFileSync } from 'node:child_process';
import { copyFileSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { DuckDBInstance } from '@duckdb/node-api';
import { describe, expect, it } from 'vitest';

const root = resolve(import.meta.dirname, '../..');

interface Interval { p16: number; p50: number; p84: number }

describe('the population fit on the committed demo catalog', () => {
  it('recovers the demo generator’s intrinsic relation inside the 95 % intervals, and the naive fit does not', { timeout: 600_000 }, async () => {
    execFileSync(process.execPath, [join(root, 'scripts/build-cli.mjs'), '--if-stale'], { stdio: 'inherit' });
    const dir = mkdtempSync(join(tmpdir(), 'census-demo-truth-'));
    try {
      for (const f of ['catalog.csv', 'census.config.yaml']) copyFileSync(join(root, 'data-demo', f), join(dir, f));
      const cli = (args: string[]): void => {
        execFileSync(process.execPath, [join(root, 'bin/dawn-census.js'), ...args, '-c', join(dir, 'census.config.yaml'), '--quiet'], { stdio: ['ignore', 'ignore', 'inherit'] });
      };
      cli(['derive']);
      cli(['population', '--threads', '2']);
      const truth = JSON.parse(readFileSync(join(root, 'data-demo/truth.json'), 'utf8')) as { relation: { alpha: number; beta: number; sigma: number } };
      const summary = JSON.parse(readFileSync(join(dir, 'out/catalog.population.json'), 'utf8')) as {
        relation: { intrinsic: Record<'alpha' | 'beta' | 'sigma', Interval>; naive: Record<'alpha' | 'beta' | 'sigma', Interval>; sampler: { intrinsic: { converged: boolean } } };
        assumptions: { sampler: { move: string } };
        references: { sampler: string };
      };
      expect(summary.relation.sampler.intrinsic.converged).toBe(true);
      // The summary names the sampler's proposal and its sources.
      expect(summary.assumptions.sampler.move).toMatch(/differential evolution/);
      expect(summary.references.sampler).toMatch(/ter Braak 2006/);
      // 95 % intervals (2.5th–97.5th percentiles) from the posterior samples the run wrote.
      const db = await DuckDBInstance.create(':memory:');
      const con = await db.connect();
      const q = (await con.runAndReadAll(
        `SELECT ${['alpha', 'beta', 'sigma'].map((p) => `quantile_cont(${p}, 0.025), quantile_cont(${p}, 0.975)`).join(', ')}
         FROM read_parquet('${join(dir, 'out/catalog.posterior.parquet')}') WHERE fit = 'selection_aware'`,
      )).getRows()[0] as number[];
      con.closeSync();
      db.closeSync();
      (['alpha', 'beta', 'sigma'] as const).forEach((p, k) => {
        const [lo, hi] = [q[2 * k] as number, q[2 * k + 1] as number];
        expect(truth.relation[p], `${p}: truth inside the 95 % interval [${lo.toFixed(3)}, ${hi.toFixed(3)}]`).toBeGreaterThanOrEqual(lo);
        expect(truth.relation[p], `${p}: truth inside the 95 % interval [${lo.toFixed(3)}, ${hi.toFixed(3)}]`).toBeLessThanOrEqual(hi);
      });
      // The naive fit to the same points is biased: its relation at log M* = 9 sits above the truth by more than its
      // own 68 % interval's width (the selection bias the forward-modelling papers describe).
      const n = summary.relation.naive;
      const at9 = n.alpha.p50 - n.beta.p50 - (truth.relation.alpha - truth.relation.beta);
      expect(at9).toBeGreaterThan(0.3);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
