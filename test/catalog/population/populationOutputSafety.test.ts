// The population step's outputs follow the derive outputs' rules: never the catalog it reads or a
// special file, and an existing file only when `dawn-census population` wrote it (else --force).
import { execFileSync } from 'node:child_process';
import { link, mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { parsePopulationArgs } from '../../../src/catalog/cli/populationArgs.ts';
import { OutputRefused } from '../../../src/catalog/outputs/OutputRefused.ts';
import { checkPopulationTargets } from '../../../src/catalog/population/checkPopulationTargets.ts';
import type { ObjectVolume } from '../../../src/catalog/population/objectVolumes.ts';
import { populationPaths } from '../../../src/catalog/population/populationPaths.ts';
import { isPopulationOutput } from '../../../src/catalog/population/populationSignature.ts';
import type { DensityFunction } from '../../../src/catalog/population/spaceDensities.ts';
import { writePopulationOutputs } from '../../../src/catalog/population/writePopulationOutputs.ts';

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-pop-safety-'));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

const VOLUMES: ObjectVolume[] = [{ id: 'A', field: 0, line: 'halpha', vmaxCmpc3: 1e5, vOverVmax: 0.4, belowLimit: false, reason: null }];
const DENSITIES: DensityFunction[] = [{ quantity: 'log_mbh', zRange: [4, 6], bins: [{ lo: 7, hi: 7.5, count: 1, phi: 2e-5, phiLo: 1e-5, phiHi: 4e-5, phiP16: null, phiP84: null }] }];
const SUMMARY = { format: 'dawn-census-population/1', catalog: 'cat.parquet' };

async function writeSet(catalog: string, force = false): Promise<void> {
  await writePopulationOutputs(populationPaths(catalog), VOLUMES, ['FIELD-1'], DENSITIES, null, SUMMARY, { catalogPath: catalog, force });
}

async function snapshot(): Promise<Record<string, string>> {
  const files: Record<string, string> = {};
  for (const f of (await readdir(dir)).sort()) files[f] = (await readFile(path.join(dir, f)).catch(() => Buffer.from('<not a file>'))).toString('base64');
  return files;
}

const refusal = async (p: Promise<unknown>): Promise<string> => {
  const e = await p.then(() => null, (err: unknown) => err);
  expect(e).toBeInstanceOf(OutputRefused);
  return (e as Error).message;
};

describe('population outputs never overwrite the catalog or a file dawn-census population did not write', () => {
  it('recognises its own four files and no one else’s', async () => {
    const catalog = path.join(dir, 'cat.parquet');
    await writeFile(catalog, 'stand-in catalog');
    await writeSet(catalog);
    const p = populationPaths(catalog);
    expect(await isPopulationOutput(p.summary, 'summary')).toBe(true);
    for (const t of [p.objects, p.densities, p.posterior]) expect(await isPopulationOutput(t, 'table')).toBe(true);
    expect(await isPopulationOutput(p.summary, 'table')).toBe(false);
    expect(await isPopulationOutput(p.objects, 'summary')).toBe(false);
    await writeFile(path.join(dir, 'other.json'), JSON.stringify({ format: 'someone-else/1', catalog: 'x' }));
    expect(await isPopulationOutput(path.join(dir, 'other.json'), 'summary')).toBe(false);
    // a summary written before it carried `format` is still ours
    await writeFile(path.join(dir, 'old.json'), JSON.stringify({ catalog: 'c', cosmology: 'planck18', seed: 1, survey: {}, densities: [], assumptions: {}, references: {} }));
    expect(await isPopulationOutput(path.join(dir, 'old.json'), 'summary')).toBe(true);
  });

  it('replaces its own earlier outputs without --force', async () => {
    const catalog = path.join(dir, 'cat.parquet');
    await writeFile(catalog, 'stand-in catalog');
    await writeSet(catalog);
    await expect(checkPopulationTargets(catalog, populationPaths(catalog), false)).resolves.toBeUndefined();
    await writeSet(catalog);
    expect((await readdir(dir)).sort()).toEqual(['cat.densities.parquet', 'cat.parquet', 'cat.population.json', 'cat.population.parquet', 'cat.posterior.parquet']);
  });

  it('refuses each output path holding a file it did not write, naming it, and replaces it with --force', async () => {
    const catalog = path.join(dir, 'cat.parquet');
    await writeFile(catalog, 'stand-in catalog');
    const names = { 'cat.population.json': 'population summary', 'cat.population.parquet': 'population table', 'cat.densities.parquet': 'densities table', 'cat.posterior.parquet': 'posterior samples' };
    for (const [name, what] of Object.entries(names)) {
      await writeFile(path.join(dir, name), 'my own notes\n');
      const before = await snapshot();
      const msg = await refusal(checkPopulationTargets(catalog, populationPaths(catalog), false));
      expect(msg).toBe(`the ${what} ${path.join(dir, name)} (beside the catalog) exists and was not written by dawn-census; move it away, or add --force to replace it`);
      expect(await snapshot()).toEqual(before);
      await rm(path.join(dir, name));
    }
    await writeFile(path.join(dir, 'cat.densities.parquet'), 'my own notes\n');
    await writeSet(catalog, true);
    expect(await isPopulationOutput(path.join(dir, 'cat.densities.parquet'), 'table')).toBe(true);
  });

  it('leaves every file as it was when a file it did not write appears at an output path during the run', async () => {
    const catalog = path.join(dir, 'cat.parquet');
    await writeFile(catalog, 'stand-in catalog');
    await writeFile(path.join(dir, 'cat.posterior.parquet'), 'appeared while the fit ran\n');
    const before = await snapshot();
    await refusal(writeSet(catalog));
    expect(await snapshot()).toEqual(before);
  });

  it('refuses an output that is the catalog itself or a FIFO, even with --force', async () => {
    const catalog = path.join(dir, 'cat.parquet');
    await writeFile(catalog, 'stand-in catalog');
    await link(catalog, path.join(dir, 'cat.population.parquet'));
    expect(await refusal(checkPopulationTargets(catalog, populationPaths(catalog), true))).toBe(
      `the population table ${path.join(dir, 'cat.population.parquet')} (beside the catalog) is the catalog itself; derive the catalog under another name or in another folder`,
    );
    await rm(path.join(dir, 'cat.population.parquet'));
    execFileSync('mkfifo', [path.join(dir, 'cat.population.json')]);
    expect(await refusal(checkPopulationTargets(catalog, populationPaths(catalog), true))).toBe(
      `the population summary ${path.join(dir, 'cat.population.json')} (beside the catalog) is a FIFO (named pipe), not a regular file; derive the catalog under another name or in another folder`,
    );
  });

  it('takes --force on the command line', () => {
    expect(parsePopulationArgs(['-c', 'census.config.yaml', '--force']).force).toBe(true);
    expect(parsePopulationArgs(['-c', 'census.config.yaml']).force).toBe(false);
  });
});
