import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { DuckDBInstance } from '@duckdb/node-api';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fitsAscii } from '../../../src/catalog/publish/fitsCards.ts';
import { deriveTiny, readWithAstropy } from './deriveTiny.ts';

const CONFIG = `
title: Round-trip check (invented)
authors:
  - { name: Ada Invented, orcid: "0000-0002-1825-0097" }
doi: 10.5281/zenodo.0000001
passthrough:
  note: { description: Free-text remark of the invented survey, ucd: meta.note }
output:
  formats: [ecsv]
`;

let dir: string;
let parquetRows: Record<string, unknown>[];
let docs: Record<string, { unit?: string; ucd?: string; description: string; kind: string }>;
beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-export-'));
  const { parquet } = await deriveTiny(dir, ['--format', 'votable', '--format', 'fits'], CONFIG);
  const db = await DuckDBInstance.create(':memory:');
  const con = await db.connect();
  parquetRows = (await con.runAndReadAll(`SELECT * FROM '${parquet}'`)).getRowObjectsJS();
  const kv = (await con.runAndReadAll(`SELECT decode(value) AS v FROM parquet_kv_metadata('${parquet}') WHERE decode(key) = 'dawn_census'`)).getRowObjectsJS();
  con.closeSync();
  db.closeSync();
  const meta = JSON.parse(kv[0]!.v as string) as { columns: { name: string; unit?: string; ucd?: string; description: string; kind: string }[] };
  docs = Object.fromEntries(meta.columns.map((c) => [c.name, c]));
}, 120_000);
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

/** Compares what astropy read with the Parquet values and the column docs, column by column. */
function expectSameTable(read: any, unitOf: (unit: string | undefined) => string | null, format: string): void {
  const names = Object.keys(docs);
  expect(Object.keys(read.columns)).toEqual(names);
  for (const name of names) {
    const col = read.columns[name];
    const doc = docs[name]!;
    const where = `${format} column ${name}`;
    expect(col.unit, where).toBe(unitOf(doc.unit));
    expect(col.ucd ?? undefined, where).toBe(doc.ucd);
    // FITS headers are ASCII: Greek letters and Å are spelled out there.
    expect(col.description, where).toBe(format === 'fits' ? fitsAscii(doc.description) : doc.description);
    const want = parquetRows.map((r) => {
      const v = r[name];
      // VOTable TABLEDATA has no missing text without a null value: a missing text reads back as ''.
      if (v === null || v === undefined) return doc.kind === 'string' && format === 'votable' ? '' : null;
      if (typeof v === 'number' && Number.isNaN(v)) return null;
      return typeof v === 'bigint' ? Number(v) : v;
    });
    expect(col.values, where).toEqual(want);
  }
}

describe('extra output formats read back with astropy (5.2.1, Debian)', () => {
  it('writes the formats of output.formats and --format beside the Parquet file', async () => {
    expect((await readdir(dir)).filter((f) => f.startsWith('tiny.census.')).sort()).toEqual([
      'tiny.census.ecsv',
      'tiny.census.fits',
      'tiny.census.meta.json',
      'tiny.census.parquet',
      'tiny.census.readings.parquet',
      'tiny.census.rejections.csv',
      'tiny.census.vot',
    ]);
  });

  it('ECSV: every value, unit (dex units parsed as astropy dex units), UCD and description', async () => {
    const read = await readWithAstropy('ecsv', path.join(dir, 'tiny.census.ecsv'));
    // astropy prints dex(solMass) back as "dex(solMass)" and erg.s**-1 as "erg / s".
    const astropyText: Record<string, string> = { 'km.s**-1': 'km / s', 'erg.s**-1': 'erg / s', 'dex(erg.s**-1)': 'dex(erg / s)', 'erg.s**-1.cm**-2': 'erg / (cm2 s)' };
    expectSameTable(read, (u) => (u ? (astropyText[u] ?? u) : null), 'ecsv');
    expect(read.meta.doi).toBe('10.5281/zenodo.0000001');
    expect(read.meta.authors).toBe('Ada Invented (ORCID 0000-0002-1825-0097)');
    expect(read.columns.note).toMatchObject({ ucd: 'meta.note', description: 'Free-text remark of the invented survey' });
  });

  it('VOTable: every value, UCD and description; units as written', async () => {
    const read = await readWithAstropy('votable', path.join(dir, 'tiny.census.vot'));
    // astropy 5.2's VOTable reader parses VOUnits (printing them its own way) and keeps dex units as unrecognised text.
    const astropyText: Record<string, string> = { 'km.s**-1': 'km / s', 'erg.s**-1': 'erg / s', 'erg.s**-1.cm**-2': 'erg / (cm2 s)' };
    expectSameTable(read, (u) => (u ? (astropyText[u] ?? u) : null), 'votable');
  });

  it('FITS: every value, TUNITn, TUCDn and TCOMMn', async () => {
    const read = await readWithAstropy('fits', path.join(dir, 'tiny.census.fits'));
    const astropyText: Record<string, string> = { 'km.s**-1': 'km / s', 'erg.s**-1': 'erg / s', 'erg.s**-1.cm**-2': 'erg / (cm2 s)' };
    expectSameTable(read, (u) => (u ? (astropyText[u] ?? u) : null), 'fits');
  });
});
