import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { DuckDBInstance } from '@duckdb/node-api';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { deriveTiny, pyarrowPython, readWithAstropy, TINY_CSV } from './deriveTiny.ts';

let dir: string;
let astro: any;
let astroReadings: any;
let kv: Record<string, string>;
let kvReadings: Record<string, string>;
let parquet: string;
let readingsParquet: string;

async function kvOf(file: string): Promise<Record<string, string>> {
  const db = await DuckDBInstance.create(':memory:');
  const con = await db.connect();
  const rows = (await con.runAndReadAll(`SELECT decode(key) AS k, decode(value) AS v FROM parquet_kv_metadata('${file}')`)).getRowObjectsJS();
  con.closeSync();
  db.closeSync();
  return Object.fromEntries(rows.map((r) => [r.k as string, r.v as string]));
}

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-kv-'));
  ({ parquet } = await deriveTiny(dir));
  readingsParquet = parquet.replace(/\.parquet$/, '.readings.parquet');
  kv = await kvOf(parquet);
  kvReadings = await kvOf(readingsParquet);
  await writeFile(path.join(dir, 'kv.json'), JSON.stringify(kv));
  await writeFile(path.join(dir, 'kv-readings.json'), JSON.stringify(kvReadings));
  astro = await readWithAstropy('parquet-keys', path.join(dir, 'kv.json'));
  astroReadings = await readWithAstropy('parquet-keys', path.join(dir, 'kv-readings.json'));
}, 120_000);
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('Parquet key/value metadata for other tools', () => {
  it("carries astropy's table_meta_yaml, read by astropy's own header reader, with units, UCDs and descriptions", () => {
    // astropy's reader of the key: astropy.table.meta.get_header_from_yaml (astropy 5.2.1, Debian).
    expect(astro.yaml.log_mbh).toMatchObject({ unit: 'dex(solMass)', ucd: 'phys.mass', datatype: 'float64' });
    expect(astro.yaml.log_mbh.description).toMatch(/virial black-hole mass/);
    expect(astro.yaml.fwhm_halpha).toMatchObject({ unit: 'km.s**-1', ucd: 'spect.line.width' });
    expect(astro.yaml.id).toMatchObject({ datatype: 'string', ucd: 'meta.id;meta.main' });
    expect(astro.yaml.note).toMatchObject({ datatype: 'string' });
    expect(astro.yaml_meta.tool).toMatch(/^dawn-census /);
  });
  it('carries the VOParquet 1.0 keys: a data-less VOTable whose FIELDs give units, UCDs and descriptions', () => {
    // Keys named in the IVOA VOParquet 1.0 Note (2025-01-16): IVOA.VOTable-Parquet.version = "1.0", .content = VOTable.
    expect(astro.votable_version).toBe('1.0');
    // astropy 5.2's VOTable reader has no function units: it keeps a dex unit as an unrecognised unit with our text.
    expect(astro.votable.log_lbol).toMatchObject({ unit: 'dex(erg.s**-1)', ucd: 'phys.luminosity' });
    expect(astro.votable.fwhm_halpha.unit).toBe('km / s');
    expect(Object.keys(astro.votable)).toEqual(Object.keys(astro.yaml));
  });

  it("gives astropy each text column's width in code points (table::len::<name>), in both files", () => {
    // TINY_CSV: ids T-1..T-3 (3 characters); the longest note is "first, with a comma" (19).
    expect(TINY_CSV).toContain('"first, with a comma"');
    expect(kv['table::len::id']).toBe('3');
    expect(kv['table::len::note']).toBe('19');
    const textColumns = Object.entries(astro.yaml).filter(([, c]: [string, any]) => c.datatype === 'string').map(([n]) => n);
    expect(textColumns.length).toBeGreaterThan(3);
    for (const name of textColumns) expect([name, Number(kv[`table::len::${name}`]) >= 1]).toEqual([name, true]);
    expect(Object.keys(kv).filter((k) => k.startsWith('table::len::')).length).toBe(textColumns.length);
    expect(kvReadings['table::len::id']).toBe('3');
    expect(Number(kvReadings['table::len::reading'])).toBeGreaterThanOrEqual('standard'.length);
  });

  it('gives the readings table the same standard keys, with units, UCDs and descriptions', () => {
    expect(astroReadings.yaml.log_mbh).toMatchObject({ unit: 'dex(solMass)', ucd: 'phys.mass', datatype: 'float64' });
    expect(astroReadings.yaml.reading).toMatchObject({ datatype: 'string', ucd: 'meta.code' });
    expect(astroReadings.yaml_meta.tool).toMatch(/^dawn-census /);
    expect(astroReadings.votable_version).toBe('1.0');
    expect(Object.keys(astroReadings.votable)).toEqual(Object.keys(astroReadings.yaml));
  });

  const python = pyarrowPython();
  it.skipIf(python === null)(
    `is read by astropy.table.Table.read itself, with units, UCDs and descriptions${python === null ? ' (skipped: no Python with pyarrow; see .ci/run)' : ''}`,
    async () => {
      // astropy 5.2.1 with pyarrow 25.0.1 (the wheel .ci/run installs beside Debian's astropy).
      const t = await readWithAstropy('parquet', parquet, python!);
      expect(t.columns.log_mbh).toMatchObject({ unit: 'dex(solMass)', ucd: 'phys.mass' });
      expect(t.columns.log_mbh.description).toMatch(/virial black-hole mass/);
      expect(t.columns.id.values).toEqual(['T-1', 'T-2', 'T-3']);
      expect(t.dtypes.note).toBe('<U19');
      // astropy's Parquet reader ignores Parquet nulls: T-2's missing note comes back as the text
      // 'None' (the README says so, and points to the ECSV, VOTable and FITS copies, which mask it).
      expect(t.columns.note.values).toEqual(['first, with a comma', 'None', '<b>&</b>']);
      expect(t.meta.tool).toMatch(/^dawn-census /);
      const r = await readWithAstropy('parquet', readingsParquet, python!);
      expect(r.columns.reading.values.length).toBe(3 * 4);
      expect(r.columns.log_mbh).toMatchObject({ unit: 'dex(solMass)', ucd: 'phys.mass' });
    },
    60_000,
  );
});
