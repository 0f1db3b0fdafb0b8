// The catalog's metadata sidecar (units, descriptions, settings, provenance), as recorded.
import type { APIRoute } from 'astro';
import { readFileSync } from 'node:fs';
import { loadCatalog } from '../../site/build/loadCatalog.ts';

export const GET: APIRoute = async () => {
  const { files } = await loadCatalog();
  return new Response(readFileSync(files.meta), { headers: { 'content-type': 'application/json; charset=utf-8' } });
};
