/**
 * Reads the derived catalog at build time (Node, @duckdb/node-api): every row for the object
 * pages, a summary for the landing page, and the metadata sidecar. Read once per build.
 */
import { readFileSync } from 'node:fs';
import { DuckDBInstance } from '@duckdb/node-api';
import { catalogFiles, type CatalogFiles } from './catalogFiles.ts';
import { normalizeMeta, type SiteMeta } from './siteMeta.ts';
import { objectPagesMode, type ObjectPagesMode } from '../objectLink.ts';
import { READING_FLAGS } from '../text/readingFlags.ts';

/** A catalog value as the pages see it. */
export type CellValue = number | string | boolean | null;
export type CatalogRow = Record<string, CellValue>;

export interface CatalogSummary {
  objects: number;
  /** Objects with a derived black-hole mass. */
  derived: number;
  /** Objects with at least one flag. */
  flagged: number;
  /** Objects with at least one flag that changes how a number should be read (src/site/text/readingFlags.ts). */
  caveated: number;
  zMin: number | null;
  zMax: number | null;
  /** How many objects carry each flag, most frequent first. */
  flagCounts: { flag: string; count: number }[];
}

export interface SiteCatalog {
  files: CatalogFiles;
  /** One static page per object, or the in-browser viewer (large catalogs). */
  objectPages: ObjectPagesMode;
  meta: SiteMeta;
  /** Column names and DuckDB types, in file order. */
  columns: { name: string; type: string }[];
  rows: CatalogRow[];
  summary: CatalogSummary;
}

const quote = (s: string) => `'${s.replace(/'/g, "''")}'`;

function plain(v: unknown): CellValue {
  if (v === null || v === undefined) return null;
  if (typeof v === 'bigint') return Number(v);
  if (typeof v === 'number') return Number.isFinite(v) ? v : null;
  if (typeof v === 'string' || typeof v === 'boolean') return v;
  return String(v);
}

/** Reads `files` (default: from the environment). */
export async function readCatalog(files: CatalogFiles = catalogFiles()): Promise<SiteCatalog> {
  let rawMeta: unknown;
  try {
    rawMeta = JSON.parse(readFileSync(files.meta, 'utf8'));
  } catch (err) {
    throw new Error(`The metadata sidecar ${files.meta} is not valid JSON: ${(err as Error).message}`);
  }
  const meta = normalizeMeta(rawMeta);
  const instance = await DuckDBInstance.create(':memory:');
  const con = await instance.connect();
  try {
    const src = `read_parquet(${quote(files.parquet)})`;
    let reader;
    try {
      reader = await con.runAndReadAll(`SELECT * FROM ${src}`);
    } catch (err) {
      throw new Error(`The catalog ${files.parquet} could not be read as Parquet: ${(err as Error).message}`);
    }
    const names = reader.columnNames();
    const types = reader.columnTypes().map((t) => t.toString());
    const rows = reader.getRowObjectsJS().map((r) => {
      const o: CatalogRow = {};
      for (const n of names) o[n] = plain(r[n]);
      return o;
    });
    const has = (c: string) => names.includes(c);
    const s = await con.runAndReadAll(
      `SELECT count(*)::DOUBLE AS objects,
        ${has('log_mbh') ? 'count(log_mbh)::DOUBLE' : '0::DOUBLE'} AS derived,
        ${has('flags') ? "count(*) FILTER (WHERE coalesce(trim(flags), '') <> '')::DOUBLE" : '0::DOUBLE'} AS flagged,
        ${has('flags') ? `count(*) FILTER (WHERE list_has_any(list_transform(string_split(coalesce(flags, ''), ','), f -> trim(f)), [${READING_FLAGS.map(quote).join(', ')}]))::DOUBLE` : '0::DOUBLE'} AS caveated,
        ${has('z') ? 'min(z)' : 'NULL::DOUBLE'} AS z_min, ${has('z') ? 'max(z)' : 'NULL::DOUBLE'} AS z_max
       FROM ${src}`,
    );
    const [o] = s.getRowObjectsJS() as Record<string, number | null>[];
    const flagCounts = has('flags')
      ? ((
          await con.runAndReadAll(
            `SELECT trim(f) AS flag, count(*)::DOUBLE AS count FROM (SELECT unnest(string_split(flags, ',')) AS f FROM ${src})
             WHERE trim(f) <> '' GROUP BY flag ORDER BY count DESC, flag`,
          )
        ).getRowObjectsJS() as { flag: string; count: number }[])
      : [];
    const summary: CatalogSummary = {
      objects: Number(o!.objects),
      derived: Number(o!.derived),
      flagged: Number(o!.flagged),
      caveated: Number(o!.caveated),
      zMin: o!.z_min ?? null,
      zMax: o!.z_max ?? null,
      flagCounts: flagCounts.map((f) => ({ flag: String(f.flag), count: Number(f.count) })),
    };
    const objectPages = objectPagesMode(rows.length, process.env.CENSUS_OBJECT_PAGES);
    return { files, objectPages, meta, columns: names.map((name, i) => ({ name, type: types[i]! })), rows, summary };
  } finally {
    con.closeSync();
    instance.closeSync();
  }
}

let cached: Promise<SiteCatalog> | null = null;

/** The build's catalog, read once from the environment (CENSUS_CATALOG). */
export function loadCatalog(): Promise<SiteCatalog> {
  cached ??= readCatalog();
  return cached;
}

/** Writes the catalog as CSV (header line, RFC 4180 quoting) with DuckDB's COPY and returns the bytes. */
export async function catalogCsv(parquet: string, csvPath: string): Promise<Buffer> {
  const instance = await DuckDBInstance.create(':memory:');
  const con = await instance.connect();
  try {
    await con.run(`COPY (SELECT * FROM read_parquet(${quote(parquet)})) TO ${quote(csvPath)} (FORMAT csv, HEADER true)`);
  } finally {
    con.closeSync();
    instance.closeSync();
  }
  return readFileSync(csvPath);
}
