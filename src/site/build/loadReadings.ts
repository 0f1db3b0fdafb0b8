/**
 * Reads the readings table and its metadata at build time (Node): every object's values under
 * every reading (object pages), each reading's record and summary (Readings and methods pages).
 * A catalog derived without readings gives an empty result, never an error.
 */
import { existsSync, readFileSync } from 'node:fs';
import { DuckDBInstance } from '@duckdb/node-api';
import type { Reading } from '../../core/readings/reading.ts';
import type { ReadingSummary } from '../../core/readings/readingSummary.ts';
import { catalogFiles, sidecarPath } from './catalogFiles.ts';
import { loadCatalog } from './loadCatalog.ts';

/** One object's values under one reading, as the pages show them. */
export interface ReadingValues {
  reading: string;
  log_mbh: number | null;
  log_mbh_p16: number | null;
  log_mbh_p84: number | null;
  log_lbol: number | null;
  log_edd_ratio: number | null;
  p_super_eddington: number | null;
  delta_log_mbh_local: number | null;
  lambda_req_light: number | null;
  flags: string;
}

export interface SiteReadings {
  /** The reading the main catalog is derived under. */
  primary: string;
  readings: Reading[];
  summary: ReadingSummary[];
  intervalMethod: string;
  flags: Record<string, string>;
  /** Object id → its values under each reading, in reading order (empty when the build makes no object pages). */
  byId: Map<string, ReadingValues[]>;
}

/** The readings file beside a catalog (`x/catalog.parquet` → `x/catalog.readings.parquet`), or null when there is none. */
export function readingsFileOf(parquet: string): string | null {
  const file = parquet.replace(/\.parquet$/i, '') + '.readings.parquet';
  return existsSync(file) ? file : null;
}

const num = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : typeof v === 'bigint' ? Number(v) : null);

/**
 * Reads the readings of the catalog `parquet` (default: the build's catalog). `withObjects`
 * false skips every object's values (`byId` stays empty): a large catalog has no static object
 * pages to list them on, and a million objects under four readings would not fit the build's memory.
 */
export async function readReadings(parquet: string = catalogFiles().parquet, withObjects = true): Promise<SiteReadings> {
  const meta = JSON.parse(readFileSync(sidecarPath(parquet), 'utf8')) as { readings?: Partial<SiteReadings> };
  const r = meta.readings;
  const out: SiteReadings = {
    primary: r?.primary ?? 'standard',
    readings: r?.readings ?? [],
    summary: r?.summary ?? [],
    intervalMethod: r?.intervalMethod ?? '',
    flags: r?.flags ?? {},
    byId: new Map(),
  };
  const file = readingsFileOf(parquet);
  if (!file || out.readings.length === 0 || !withObjects) return out;
  const instance = await DuckDBInstance.create(':memory:');
  const con = await instance.connect();
  try {
    const cols = ['log_mbh', 'log_mbh_p16', 'log_mbh_p84', 'log_lbol', 'log_edd_ratio', 'p_super_eddington', 'delta_log_mbh_local', 'lambda_req_light'] as const;
    const rows = (await con.runAndReadAll(`SELECT id, reading, ${cols.join(', ')}, flags FROM read_parquet('${file.replace(/'/g, "''")}')`)).getRowObjectsJS();
    for (const row of rows) {
      const v = { reading: String(row.reading), flags: String(row.flags ?? '') } as ReadingValues;
      for (const c of cols) v[c] = num(row[c]);
      const id = String(row.id);
      const list = out.byId.get(id);
      if (list) list.push(v);
      else out.byId.set(id, [v]);
    }
  } finally {
    con.closeSync();
    instance.closeSync();
  }
  return out;
}

let cached: Promise<SiteReadings> | null = null;

/** The build's readings, read once (every object's values only when the build makes one page per object). */
export function loadReadings(): Promise<SiteReadings> {
  cached ??= loadCatalog().then((c) => readReadings(c.files.parquet, c.objectPages === 'static'));
  return cached;
}
