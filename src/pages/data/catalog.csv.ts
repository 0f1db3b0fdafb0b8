// The full derived catalog as CSV, written at build time with DuckDB's COPY, after '#' comment
// lines that give each column's unit, UCD and description.
import type { APIRoute } from 'astro';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { catalogCsv, loadCatalog } from '../../site/build/loadCatalog.ts';
import { csvUnitsComment, readSidecar } from '../../site/build/exportDownloads.ts';

export const GET: APIRoute = async () => {
  const { files } = await loadCatalog();
  const dir = mkdtempSync(join(tmpdir(), 'census-csv-'));
  try {
    const bytes = await catalogCsv(files.parquet, join(dir, 'catalog.csv'));
    const withUnits = Buffer.concat([Buffer.from(csvUnitsComment(readSidecar(files))), bytes]);
    return new Response(new Uint8Array(withUnits), { headers: { 'content-type': 'text/csv; charset=utf-8' } });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
};
