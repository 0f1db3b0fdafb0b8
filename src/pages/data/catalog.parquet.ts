// The full derived catalog, copied into the site as data/catalog.parquet: what DuckDB-WASM
// queries in the browser, and the Parquet download.
import type { APIRoute } from 'astro';
import { readFileSync } from 'node:fs';
import { loadCatalog } from '../../site/build/loadCatalog.ts';

export const GET: APIRoute = async () => {
  const { files } = await loadCatalog();
  return new Response(readFileSync(files.parquet), { headers: { 'content-type': 'application/vnd.apache.parquet' } });
};
