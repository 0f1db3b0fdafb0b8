// The full derived catalog as ecsv, with units, UCDs and descriptions, written at build time.
import type { APIRoute } from 'astro';
import { loadCatalog } from '../../site/build/loadCatalog.ts';
import { catalogIn } from '../../site/build/exportDownloads.ts';

export const GET: APIRoute = async () => {
  const { files } = await loadCatalog();
  return new Response(await catalogIn(files, 'ecsv'), { headers: { 'content-type': 'text/plain; charset=utf-8' } });
};
