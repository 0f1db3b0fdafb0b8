// The readings table (one row per object and reading), copied into the site as
// data/readings.parquet: DuckDB-WASM's `readings` table and a download.
import type { APIRoute } from 'astro';
import { readFileSync } from 'node:fs';
import { loadCatalog } from '../../site/build/loadCatalog.ts';
import { readingsFileOf } from '../../site/build/loadReadings.ts';

export const GET: APIRoute = async () => {
  const { files } = await loadCatalog();
  const file = readingsFileOf(files.parquet);
  // A catalog derived without readings: an empty file, which the browser's DuckDB declines to open
  // (the pages then say the catalog has no readings). A static build writes only 200 responses.
  if (!file) return new Response(new Uint8Array(0), { headers: { 'content-type': 'application/octet-stream' } });
  return new Response(readFileSync(file), { headers: { 'content-type': 'application/vnd.apache.parquet' } });
};
