import { open } from 'node:fs/promises';
import { duckdb } from '../duckdb/nodeApi.ts';
import type { ExportFormat } from '../config/publicationConfig.ts';
import type { CellValue } from '../parquet/parquetWriter.ts';
import { sqlIdentifier, sqlString } from '../parquet/sqlLiteral.ts';
import { ecsvWriter, fitsWriter, votableWriter, type FormatWriter } from './exportWriters.ts';
import type { TableDoc } from './tableDoc.ts';


/** File name ending of each extra format. */
export const EXPORT_EXTENSION: Record<ExportFormat, string> = { ecsv: '.ecsv', votable: '.vot', fits: '.fits' };

/** Where `format` of the catalog at `parquetPath` goes: beside it, `<name>.ecsv`, `<name>.vot`, `<name>.fits`. */
export function exportPath(parquetPath: string, format: ExportFormat): string {
  return parquetPath.replace(/\.parquet$/i, '') + EXPORT_EXTENSION[format];
}

/**
 * Writes the catalog at `parquetPath` (described by `doc`, whose columns are the file's, in
 * order) in each of `targets`, streaming DuckDB's result chunks so memory stays bounded.
 * Each target is written to the path given (the caller stages and renames it).
 */
export async function exportCatalog(parquetPath: string, doc: TableDoc, targets: readonly { format: ExportFormat; path: string }[]): Promise<void> {
  if (targets.length === 0) return;
  const db = await duckdb().DuckDBInstance.create(':memory:', { memory_limit: '256MB', threads: '1' });
  const con = await db.connect();
  const files: { w: FormatWriter; fh: Awaited<ReturnType<typeof open>> }[] = [];
  try {
    const from = `read_parquet(${sqlString(parquetPath)})`;
    let nRows = 0;
    let widths: number[] = [];
    if (targets.some((t) => t.format === 'fits')) {
      const sizes = doc.columns.map((c) => (c.kind === 'string' ? `coalesce(max(octet_length(encode(${sqlIdentifier(c.name)}))), 1)` : '0'));
      const r = (await con.runAndReadAll(`SELECT count(*), ${sizes.join(', ')} FROM ${from}`)).getRows()[0] as (number | bigint)[];
      nRows = Number(r[0]);
      widths = r.slice(1).map(Number);
    }
    for (const t of targets) {
      const w = t.format === 'ecsv' ? ecsvWriter(doc) : t.format === 'votable' ? votableWriter(doc) : fitsWriter(doc, nRows, widths);
      const fh = await open(t.path, 'w');
      files.push({ w, fh });
      await fh.write(w.head());
    }
    const result = await con.stream(`SELECT ${doc.columns.map((c) => sqlIdentifier(c.name)).join(', ')} FROM ${from}`);
    for (;;) {
      const chunk = await result.fetchChunk();
      if (chunk === null || chunk.rowCount === 0) break;
      const rows = chunk.getRows() as CellValue[][];
      for (const { w, fh } of files) await fh.write(w.rows(rows));
    }
    for (const { w, fh } of files) await fh.write(w.tail());
  } finally {
    for (const { fh } of files) await fh.close().catch(() => undefined);
    con.closeSync();
    db.closeSync();
  }
}
