import { mkdtempSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { readPopulation } from '../../../src/site/build/loadPopulation.ts';

let dir: string | undefined;
afterEach(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
  dir = undefined;
});

/** A catalog file and a population summary beside it, with the given modification times (s since 1970). */
function setUp(catalogTime: number, summaryTime: number): string {
  dir = mkdtempSync(join(tmpdir(), 'census-population-'));
  const catalog = join(dir, 'catalog.parquet');
  const summary = join(dir, 'catalog.population.json');
  writeFileSync(catalog, 'not read by readPopulation');
  writeFileSync(summary, JSON.stringify({ objects: 3, withVmax: 2, belowSurveyLimit: 1, densities: [], relation: null, relationNote: 'fewer than 8 objects' }));
  utimesSync(catalog, catalogTime, catalogTime);
  utimesSync(summary, summaryTime, summaryTime);
  return catalog;
}

describe('readPopulation', () => {
  it('is null beside a catalog that has no population summary', async () => {
    dir = mkdtempSync(join(tmpdir(), 'census-population-'));
    writeFileSync(join(dir, 'catalog.parquet'), 'x');
    await expect(readPopulation(join(dir, 'catalog.parquet'), [])).resolves.toBeNull();
  });

  it('offers only the files that exist, under the site’s own names', async () => {
    const pop = await readPopulation(setUp(1_700_000_000, 1_700_000_100), []);
    expect(pop?.downloads.map((d) => d.name)).toEqual(['catalog.population.json']);
    expect(pop?.summary.relationNote).toBe('fewer than 8 objects');
    expect(pop?.stale).toBe(false);
  });

  it('marks results older than the catalog as stale (the catalog was derived again after the population step)', async () => {
    const pop = await readPopulation(setUp(1_700_000_100, 1_700_000_000), []);
    expect(pop?.stale).toBe(true);
  });
});
