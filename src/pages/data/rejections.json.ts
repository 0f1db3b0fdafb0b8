// The rejected input values of the catalog's invalid rows, by object id (for the in-browser object page).
import type { APIRoute } from 'astro';
import { loadCatalog } from '../../site/build/loadCatalog.ts';
import { loadRejections } from '../../site/build/rejections.ts';

export const GET: APIRoute = async () => {
  const { files } = await loadCatalog();
  const body = Object.fromEntries(loadRejections(files.parquet));
  return new Response(JSON.stringify(body), { headers: { 'content-type': 'application/json; charset=utf-8' } });
};
