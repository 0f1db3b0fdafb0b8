/**
 * Shared helpers for the reader tests: temporary folders, reading a whole table, and one invented
 * reference table written in every format by small generators (so the formats can be compared).
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DuckDBInstance } from '@duckdb/node-api';
import type { Cell, TableChunk, TableSource } from '../../../src/catalog/readers/types.ts';
import { fitsBinTable, q } from './fitsFixture.ts';

/** A fresh folder under os.tmpdir() and a function that removes it. */
export function makeTmpDir(prefix: string): { dir: string; cleanup: () => void } {
  const dir = mkdtempSync(join(tmpdir(), `dawn-readers-${prefix}-`));
  return { dir, cleanup: () => rmSync(dir, { recursive: true, force: true }) };
}

/** Every cell of a table, column-wise, plus the chunks' shapes. */
export interface ReadResult {
  columns: Cell[][];
  chunkShapes: { rowOffset: number; nRows: number }[];
}

/** Reads all chunks of a source and concatenates them column-wise. */
export async function readAll(src: TableSource, chunkRows?: number): Promise<ReadResult> {
  const columns: Cell[][] = src.columns.map(() => []);
  const chunkShapes: ReadResult['chunkShapes'] = [];
  for await (const chunk of src.chunks(chunkRows)) {
    chunkShapes.push({ rowOffset: chunk.rowOffset, nRows: chunk.nRows });
    checkChunk(chunk, src.columns.length);
    chunk.columns.forEach((c, i) => columns[i]!.push(...c));
  }
  return { columns, chunkShapes };
}

function checkChunk(chunk: TableChunk, nCols: number): void {
  if (chunk.columns.length !== nCols) throw new Error(`chunk has ${chunk.columns.length} columns, expected ${nCols}`);
  for (const c of chunk.columns) if (c.length !== chunk.nRows) throw new Error(`column length ${c.length} != nRows ${chunk.nRows}`);
}

/** One row of the invented reference table. */
export interface RefRow {
  id: number;
  z: number | null;
  fwhm: number | null;
  broad: boolean | null;
  name: string | null;
}

const NAMES = ['alpha, "quoted"', 'beta gamma', 'x<y & z>w', "it's", 'plain'];

/**
 * Deterministic invented rows with nulls in every nullable column. Floats are exact in float32
 * (multiples of 1/8 below 2^20) so FITS E and Parquet FLOAT round-trip exactly.
 */
export function refRows(n: number): RefRow[] {
  const rows: RefRow[] = [];
  for (let i = 0; i < n; i++) {
    rows.push({
      id: i % 3 === 0 ? -(i + 1) : i + 1,
      z: i % 5 === 1 ? null : 4 + i * 0.25,
      fwhm: i % 7 === 2 ? null : 1000 + i * 12.5,
      broad: i % 4 === 3 ? null : i % 2 === 0,
      name: i % 6 === 4 ? null : `${NAMES[i % NAMES.length]}-${i}`,
    });
  }
  return rows;
}

/** The reference rows column-wise, as every reader must return them. */
export function refColumns(rows: RefRow[]): Cell[][] {
  return [rows.map((r) => r.id), rows.map((r) => r.z), rows.map((r) => r.fwhm), rows.map((r) => r.broad), rows.map((r) => r.name)];
}

const csvQuote = (s: string) => `"${s.replace(/"/g, '""')}"`;
const text = (x: number | boolean | null) => (x === null ? '' : String(x));

/** Reference table as CSV (strings always quoted) or TSV (no quoting). */
export function writeRefCsv(path: string, rows: RefRow[], delimiter = ','): void {
  const lines = [['id', 'z', 'fwhm', 'broad', 'name'].join(delimiter)];
  for (const r of rows) {
    const name = r.name === null ? '' : delimiter === ',' ? csvQuote(r.name) : r.name;
    lines.push([text(r.id), text(r.z), text(r.fwhm), text(r.broad), name].join(delimiter));
  }
  writeFileSync(path, lines.join('\n') + '\n');
}

/** Reference table as ECSV 1.0 with the space delimiter. */
export function writeRefEcsv(path: string, rows: RefRow[]): void {
  const head = [
    '# %ECSV 1.0', '# ---', '# datatype:',
    '# - {name: id, datatype: int64, description: Invented object number}',
    '# - {name: z, datatype: float64, meta: {ucd: src.redshift}}',
    '# - {name: fwhm, unit: km / s, datatype: float32}',
    '# - {name: broad, datatype: bool}',
    '# - {name: name, datatype: string}',
    '# meta: !!omap', '# - {catalog: invented demo}', '# schema: astropy-2.0',
    'id z fwhm broad name',
  ];
  const body = rows.map((r) => [
    text(r.id), r.z === null ? '""' : text(r.z), r.fwhm === null ? '""' : text(r.fwhm),
    r.broad === null ? '""' : r.broad ? 'True' : 'False', r.name === null ? '""' : csvQuote(r.name),
  ].join(' '));
  writeFileSync(path, [...head, ...body].join('\n') + '\n');
}

const xml = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
const td = (x: number | boolean | string | null) => (x === null ? '<TD/>' : `<TD>${xml(String(x))}</TD>`);

/** Reference table as a VOTable 1.4 with TABLEDATA. */
export function writeRefVotable(path: string, rows: RefRow[]): void {
  const trs = rows.map((r) => `<TR>${td(r.id)}${td(r.z)}${td(r.fwhm)}${td(r.broad === null ? null : r.broad ? 'T' : 'F')}${td(r.name)}</TR>`);
  writeFileSync(path, `<?xml version="1.0" encoding="UTF-8"?>
<VOTABLE version="1.4" xmlns="http://www.ivoa.net/xml/VOTable/v1.3">
 <DESCRIPTION>Invented reference table</DESCRIPTION>
 <RESOURCE>
  <TABLE name="ref">
   <PARAM name="cosmology" datatype="char" arraysize="*" value="invented"/>
   <FIELD name="id" datatype="long"><DESCRIPTION>Invented object number</DESCRIPTION></FIELD>
   <FIELD name="z" datatype="double" ucd="src.redshift"/>
   <FIELD name="fwhm" datatype="float" unit="km/s"/>
   <FIELD name="broad" datatype="boolean"/>
   <FIELD name="name" datatype="char" arraysize="*"/>
   <DATA><TABLEDATA>
${trs.join('\n')}
   </TABLEDATA></DATA>
  </TABLE>
 </RESOURCE>
</VOTABLE>
`);
}

/** Reference table as a FITS BINTABLE (K, D, E, L, 24A); int nulls would need TNULL (ids have none). */
export function writeRefFits(path: string, rows: RefRow[]): void {
  writeFileSync(path, fitsBinTable([
    { name: 'id', tform: 'K', values: rows.map((r) => BigInt(r.id)) },
    { name: 'z', tform: 'D', values: rows.map((r) => r.z ?? NaN) },
    { name: 'fwhm', tform: 'E', unit: 'km/s', values: rows.map((r) => r.fwhm ?? NaN) },
    { name: 'broad', tform: 'L', values: rows.map((r) => r.broad) },
    { name: 'name', tform: '24A', values: rows.map((r) => r.name ?? '') },
  ], { tableCards: [['EXTNAME', q('REF')]] }));
}

/** Runs SQL statements on a throw-away in-memory DuckDB (used to write Parquet fixtures). */
export async function duckdbRun(...statements: string[]): Promise<void> {
  const inst = await DuckDBInstance.create(':memory:');
  const con = await inst.connect();
  try {
    for (const s of statements) await con.run(s);
  } finally {
    con.closeSync();
    inst.closeSync();
  }
}

const sqlText = (s: string) => `'${s.replace(/'/g, "''")}'`;

/** Reference table as Parquet, written by DuckDB `COPY ... TO`. */
export async function writeRefParquet(path: string, rows: RefRow[]): Promise<void> {
  const values = rows.map((r) => `(${r.id}, ${r.z ?? 'NULL'}, ${r.fwhm ?? 'NULL'}, ${r.broad ?? 'NULL'}, ${r.name === null ? 'NULL' : sqlText(r.name)})`);
  await duckdbRun(`COPY (SELECT id::BIGINT AS id, z::DOUBLE AS z, fwhm::FLOAT AS fwhm, broad::BOOLEAN AS broad, name::VARCHAR AS name
    FROM (VALUES ${values.length ? values.join(', ') : '(0, NULL, NULL, NULL, NULL)'}) t(id, z, fwhm, broad, name)
    ${values.length ? '' : 'WHERE false'}) TO ${sqlText(path)} (FORMAT parquet, KV_METADATA {catalog: 'invented demo'})`);
}
