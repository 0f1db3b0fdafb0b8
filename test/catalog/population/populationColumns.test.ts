import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { DuckDBInstance } from '@duckdb/node-api';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ObjectVolume } from '../../../src/catalog/population/objectVolumes.ts';
import { populationPaths } from '../../../src/catalog/population/populationPaths.ts';
import type { DensityFunction } from '../../../src/catalog/population/spaceDensities.ts';
import { writePopulationOutputs } from '../../../src/catalog/population/writePopulationOutputs.ts';
import { pyarrowPython, readWithAstropy } from '../publish/deriveTiny.ts';

// Invented stand-in results: the test is about the files' metadata, not the numbers.
const VOLUMES: ObjectVolume[] = [
  { id: 'A-1', field: 0, line: 'halpha', vmaxCmpc3: 1e5, vOverVmax: 0.4, belowLimit: false, reason: null },
  { id: 'A-22', field: null, line: null, vmaxCmpc3: null, vOverVmax: null, belowLimit: false, reason: 'no redshift or field' },
];
const DENSITIES: DensityFunction[] = [{ quantity: 'log_mbh', zRange: [4, 6], bins: [{ lo: 7, hi: 7.5, count: 1, phi: 2e-5, phiLo: 1e-5, phiHi: 4e-5, phiP16: null, phiP84: null }] }];

let dir: string;
let paths: ReturnType<typeof populationPaths>;
const astro: Record<string, any> = {};
const kv: Record<string, Record<string, string>> = {};

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-pop-cols-'));
  const catalog = path.join(dir, 'cat.parquet');
  await writeFile(catalog, 'stand-in catalog');
  paths = populationPaths(catalog);
  await writePopulationOutputs(paths, VOLUMES, ['FIELD-NORTH'], DENSITIES, null, { format: 'dawn-census-population/1' }, { catalogPath: catalog, force: false });
  const db = await DuckDBInstance.create(':memory:');
  const con = await db.connect();
  for (const table of ['objects', 'densities', 'posterior'] as const) {
    const rows = (await con.runAndReadAll(`SELECT decode(key) AS k, decode(value) AS v FROM parquet_kv_metadata('${paths[table]}')`)).getRowObjectsJS();
    kv[table] = Object.fromEntries(rows.map((r) => [r.k as string, r.v as string]));
    await writeFile(path.join(dir, `${table}.json`), JSON.stringify(kv[table]));
    astro[table] = await readWithAstropy('parquet-keys', path.join(dir, `${table}.json`));
  }
  con.closeSync();
  db.closeSync();
}, 120_000);
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe("the population tables' metadata", () => {
  it("carries astropy's table_meta_yaml with units, UCDs and descriptions (read by astropy's own header reader)", () => {
    // astropy 5.2.1 (Debian): astropy.table.meta.get_header_from_yaml.
    expect(astro.objects.yaml.vmax_cmpc3).toMatchObject({ unit: 'Mpc**3', ucd: 'phys.volume;stat.max', datatype: 'float64' });
    expect(astro.objects.yaml.id).toMatchObject({ ucd: 'meta.id;meta.main', datatype: 'string' });
    expect(astro.densities.yaml.phi).toMatchObject({ unit: 'Mpc**-3', ucd: 'src.density' });
    expect(astro.densities.yaml.phi.description).toMatch(/per dex/);
    expect(astro.posterior.yaml.alpha).toMatchObject({ unit: 'dex(solMass)', ucd: 'stat.fit.param;phys.mass' });
    expect(astro.posterior.yaml.sigma).toMatchObject({ unit: 'dex', ucd: 'stat.stdev;stat.fit.param' });
    for (const t of ['objects', 'densities', 'posterior']) expect([t, astro[t].yaml_meta.tool]).toEqual([t, expect.stringMatching(/^dawn-census /)]);
  });

  it('keeps its own key (so the files are recognised as ours) beside the VOParquet keys and the text widths', () => {
    for (const t of ['objects', 'densities', 'posterior']) {
      expect(Object.keys(kv[t]!)).toEqual(expect.arrayContaining(['dawn_census_population', 'IVOA.VOTable-Parquet.version', 'IVOA.VOTable-Parquet.content']));
      expect(Object.keys(astro[t].votable)).toEqual(Object.keys(astro[t].yaml));
    }
    expect(kv.objects!['table::len::id']).toBe('4');
    expect(kv.objects!['table::len::survey_field']).toBe('11');
    expect(kv.objects!['table::len::no_vmax_reason']).toBe(String('no redshift or field'.length));
    // The posterior has no rows here (no fit): a text column without values still gets width 1.
    expect(kv.posterior!['table::len::fit']).toBe('1');
  });

  const python = pyarrowPython();
  it.skipIf(python === null)(
    `is read by astropy.table.Table.read itself${python === null ? ' (skipped: no Python with pyarrow; see .ci/run)' : ''}`,
    async () => {
      const t = await readWithAstropy('parquet', paths.objects, python!);
      expect(t.columns.id.values).toEqual(['A-1', 'A-22']);
      expect(t.columns.vmax_cmpc3).toMatchObject({ unit: 'Mpc3', ucd: 'phys.volume;stat.max', values: [1e5, null] });
      const d = await readWithAstropy('parquet', paths.densities, python!);
      expect(d.columns.phi).toMatchObject({ unit: '1 / Mpc3', values: [2e-5] });
    },
    60_000,
  );
});
