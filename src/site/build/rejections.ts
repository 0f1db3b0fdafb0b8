/**
 * The catalog build's rejection report (`<name>.rejections.csv` beside the Parquet file: row,
 * id, column, value, reason, message), read at site build time so an invalid row's object page
 * can show what was rejected and why — the site does not publish the report itself.
 */
import { existsSync, readFileSync } from 'node:fs';
import { csvRecords } from '../place/csvRow.ts';

/** One rejected input value. */
export interface Rejection {
  column: string;
  value: string;
  reason: string;
  message: string;
}

/** The report's path for a Parquet catalog: `x/catalog.parquet` → `x/catalog.rejections.csv`. */
export function rejectionsPath(parquet: string): string {
  return parquet.replace(/\.parquet$/i, '') + '.rejections.csv';
}

/** The rejections of each object id, read from CSV text (an empty map for a header-only report). */
export function parseRejections(text: string): Map<string, Rejection[]> {
  const out = new Map<string, Rejection[]>();
  const records = csvRecords(text);
  if ('error' in records || records.length === 0) return out;
  const head = records[0]!.map((h) => h.trim());
  const at = (name: string) => head.indexOf(name);
  const [iId, iCol, iVal, iReason, iMsg] = ['id', 'column', 'value', 'reason', 'message'].map(at);
  if (iId! < 0) return out;
  for (const r of records.slice(1)) {
    if (r.length === 1 && r[0] === '') continue;
    const id = r[iId!] ?? '';
    const list = out.get(id) ?? [];
    list.push({ column: r[iCol!] ?? '', value: r[iVal!] ?? '', reason: r[iReason!] ?? '', message: r[iMsg!] ?? '' });
    out.set(id, list);
  }
  return out;
}

let cached: { path: string; map: Map<string, Rejection[]> } | null = null;

/** The rejections recorded beside `parquet` (none when the report is absent). Read once per build. */
export function loadRejections(parquet: string): Map<string, Rejection[]> {
  const path = rejectionsPath(parquet);
  if (cached?.path === path) return cached.map;
  const map = existsSync(path) ? parseRejections(readFileSync(path, 'utf8')) : new Map<string, Rejection[]>();
  cached = { path, map };
  return map;
}
