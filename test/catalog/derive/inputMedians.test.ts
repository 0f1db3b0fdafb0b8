import { mkdtemp, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { defaultConfig } from '../../../src/catalog/config/defaultConfig.ts';
import type { CensusConfig } from '../../../src/catalog/config/CensusConfig.ts';
import { runDerive } from '../../../src/catalog/derive/runDerive.ts';
import { CatalogError } from '../../../src/catalog/readers/CatalogError.ts';

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-medians-'));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

const config = (over: Partial<CensusConfig> = {}): CensusConfig => {
  const c = defaultConfig();
  return { ...c, settings: { ...c.settings, draws: 16 }, ...over };
};

/** Five broad-Hα objects; `flux` and `fwhm` as written in the file. */
const csv = (flux: number, fwhm: number): string =>
  ['id,z,fwhm_halpha,flux_halpha', ...[5, 5.5, 6, 6.5, 7].map((z, i) => `O-${i},${z},${fwhm * (1 + i / 20)},${flux * (1 + i / 10)}`)].join('\n');

async function derive(text: string, cfg = config()): Promise<unknown> {
  const input = path.join(dir, 'cat.csv');
  await writeFile(input, text);
  return runDerive({ catalogPath: input, config: cfg, outputPath: path.join(dir, 'out', 'cat.parquet'), threads: 1 }).then(
    () => null,
    (e: unknown) => e,
  );
}

describe('the catalog-level plausibility check', () => {
  it('derives a catalog with cgs fluxes and km/s widths', async () => {
    expect(await derive(csv(3e-18, 2500))).toBeNull();
  });

  it('stops on fluxes in 1e-18 erg/s/cm² read as cgs, naming the column, the median and the likely unit, and writes nothing', async () => {
    const e = await derive(csv(3, 2500));
    expect(e).toBeInstanceOf(CatalogError);
    const msg = (e as Error).message;
    expect(msg).not.toContain('\n');
    expect(msg).toMatch(/column flux_halpha/);
    expect(msg).toMatch(/median broad-line luminosity is \d\.\de\+60 erg\/s/);
    // The scale a typical median luminosity would imply is a hint, not an answer (a group's 1e-18 fluxes of faint objects read as about 1e-19).
    expect(msg).toMatch(/about 1e-18 erg s-1 cm-2 if their median luminosity is a typical 1e42\.5 erg\/s: give the unit your file uses/);
    expect(msg).toMatch(/set columns\.flux_halpha\.unit in the config/);
    expect(await readdir(path.join(dir, 'out')).catch(() => [])).toEqual([]);
  });

  it('stops on widths in m/s, which the row checks alone would reject row by row', async () => {
    const e = await derive(csv(3e-18, 2.5e6));
    expect(e).toBeInstanceOf(CatalogError);
    expect((e as Error).message).toMatch(/column fwhm_halpha.*median FWHM is 2\.\de\+6 km\/s.*look like m\/s/);
  });

  it('names every implausible column in its one line, so that one run shows them all', async () => {
    // Fluxes in 1e-18 units and widths in 1000 km/s at once: it named the flux only, and the next run the width.
    const e = await derive(csv(3, 2.5));
    expect(e).toBeInstanceOf(CatalogError);
    const msg = (e as Error).message;
    expect(msg).not.toContain('\n');
    expect(msg).toMatch(/column flux_halpha, .*; column fwhm_halpha, .*look like they are in 1000 km\/s or in Å; set the unit of each in the config \(columns\.flux_halpha\.unit, columns\.fwhm_halpha\.unit\), or implausible_medians_intended: true/);
  });

  it('derives the same catalog when the config says the values are intended', async () => {
    expect(await derive(csv(3, 2500), config({ implausibleMediansIntended: true }))).toBeNull();
  });
});
