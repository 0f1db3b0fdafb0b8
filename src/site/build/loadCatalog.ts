/**
 * Reads the derived catalog at build time (Node, @duckdb/node-api): every row for the object
 * pages, a summary for the landing page, and the metadata sidecar. Read once per build.
 */
import { createWriteStream, readFileSync } from 'node:fs';
import { once } from 'node:events';
import { DuckDBInstance } from '@duckdb/node-api';
import { catalogFiles, type CatalogFiles } from './catalogFiles.ts';
import { normalizeMeta, type SiteMeta } from './siteMeta.ts';
import { csvCell } from '../../shared/text/csvCell.ts';
import { objectPagesMode, type ObjectPagesMode } from '../objectLink.ts';
import { CHART_COLUMNS, DENSE_COLUMNS_BY_CHART, NARROW_ABOVE } from '../population/populationCharts.ts';

/** The columns the build-time charts read when they draw densities (large catalogs). */
const DENSE_CHART_COLUMNS: readonly string[] = [...new Set(Object.values(DENSE_COLUMNS_BY_CHART).flat())];
import { READING_FLAGS } from '../text/readingFlags.ts';

/** A catalog value as the pages see it. */
export type CellValue = number | string | boolean | null;
export type CatalogRow = Record<string, CellValue>;

export interface CatalogSummary {
  objects: number;
  /** Objects with a measured black-hole mass (upper limits not counted). */
  derived: number;
  /** Objects whose black-hole mass is an upper limit. */
  massLimits: number;
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
  /**
   * Every row with every column when the build makes one page per object; otherwise (large
   * catalogs) every row with only the columns the build-time charts read (src/site/build/buildCharts.ts).
   */
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
    let names: string[];
    let types: string[];
    let count: number;
    try {
      const described = await con.runAndReadAll(`SELECT * FROM ${src} LIMIT 0`);
      names = described.columnNames();
      types = described.columnTypes().map((t) => t.toString());
      count = Number((await con.runAndReadAll(`SELECT count(*)::DOUBLE AS n FROM ${src}`)).getRowObjectsJS()[0]!.n);
    } catch (err) {
      throw new Error(`The catalog ${files.parquet} could not be read as Parquet: ${(err as Error).message}`);
    }
    const objectPages = objectPagesMode(count, process.env.CENSUS_OBJECT_PAGES);
    // One page per object needs every column; otherwise only the build-time charts read rows.
    const wanted = objectPages === 'static' ? names : names.filter((n) => (count > NARROW_ABOVE ? DENSE_CHART_COLUMNS : CHART_COLUMNS).includes(n));
    const reader = await con.runAndReadAll(`SELECT ${wanted.map((n) => `"${n.replace(/"/g, '""')}"`).join(', ') || '1'} FROM ${src}`);
    const rows = reader.getRowObjectsJS().map((r) => {
      const o: CatalogRow = {};
      for (const n of wanted) o[n] = plain(r[n]);
      return o;
    });
    const has = (c: string) => names.includes(c);
    // An upper-limit mass: its _is_limit column, or for a catalog written before those its flag.
    const massBound = has('log_mbh_is_limit')
      ? 'coalesce(log_mbh_is_limit, false)'
      : has('flags')
        ? "list_contains(string_split(coalesce(flags, ''), ','), 'mbh_upper_limit')"
        : 'false';
    const s = await con.runAndReadAll(
      `SELECT count(*)::DOUBLE AS objects,
        ${has('log_mbh') ? `(count(log_mbh) FILTER (WHERE NOT ${massBound}))::DOUBLE` : '0::DOUBLE'} AS derived,
        ${has('log_mbh') ? `(count(log_mbh) FILTER (WHERE ${massBound}))::DOUBLE` : '0::DOUBLE'} AS mass_limits,
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
      massLimits: Number(o!.mass_limits),
      flagged: Number(o!.flagged),
      caveated: Number(o!.caveated),
      zMin: o!.z_min ?? null,
      zMax: o!.z_max ?? null,
      flagCounts: flagCounts.map((f) => ({ flag: String(f.flag), count: Number(f.count) })),
    };
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

/**
 * Writes the catalog as CSV to `csvPath` (header line, RFC 4180 quoting, `\n` line ends), after
 * `head` (e.g. `#` lines with units), streaming DuckDB's chunks so memory stays bounded. Cells
 * go through the shared `csvCell`, as the query download does: text that starts like a
 * spreadsheet formula gets a leading `'` and control characters are escaped; numbers are
 * written as JavaScript prints them (shortest round-trip form), missing values empty.
 */
export async function writeCatalogCsv(parquet: string, csvPath: string, head = ''): Promise<void> {
  const instance = await DuckDBInstance.create(':memory:');
  const con = await instance.connect();
  const out = createWriteStream(csvPath, { encoding: 'utf8' });
  try {
    const result = await con.stream(`SELECT * FROM read_parquet(${quote(parquet)})`);
    out.write(head);
    out.write(`${result.columnNames().map(csvCell).join(',')}\n`);
    for (let chunk = await result.fetchChunk(); chunk && chunk.rowCount > 0; chunk = await result.fetchChunk()) {
      const lines = chunk.getRows().map((row) => row.map((v) => (typeof v === 'number' && !Number.isFinite(v) ? '' : csvCell(v))).join(','));
      if (!out.write(`${lines.join('\n')}\n`)) await once(out, 'drain');
    }
  } finally {
    await new Promise<void>((resolve, reject) => out.end((e?: Error | null) => (e ? reject(e) : resolve())));
    con.closeSync();
    instance.closeSync();
  }
}

/** {@link writeCatalogCsv} without a head, returning the bytes written (small catalogs, tests). */
export async function catalogCsv(parquet: string, csvPath: string): Promise<Buffer> {
  await writeCatalogCsv(parquet, csvPath);
  return readFileSync(csvPath);
}
