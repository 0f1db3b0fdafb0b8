import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { DuckDBInstance } from '@duckdb/node-api';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { deriveTiny, readWithAstropy } from './deriveTiny.ts';

let dir: string;
let astro: any;
beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-kv-'));
  const { parquet } = await deriveTiny(dir);
  const db = await DuckDBInstance.create(':memory:');
  const con = await db.connect();
  const rows = (await con.runAndReadAll(`SELECT decode(key) AS k, decode(value) AS v FROM parquet_kv_metadata('${parquet}')`)).getRowObjectsJS();
  con.closeSync();
  db.closeSync();
  const kv = Object.fromEntries(rows.map((r) => [r.k as string, r.v as string]));
  await writeFile(path.join(dir, 'kv.json'), JSON.stringify(kv));
  astro = await readWithAstropy('parquet-keys', path.join(dir, 'kv.json'));
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
});
