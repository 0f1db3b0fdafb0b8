// CITATION.cff for the published catalog (Citation File Format 1.2.0), from its metadata.
import type { APIRoute } from 'astro';
import { loadCatalog } from '../site/build/loadCatalog.ts';
import { citationCffOf } from '../site/build/citationFormats.ts';
import { readSidecar } from '../site/build/exportDownloads.ts';

export const GET: APIRoute = async ({ site }) => {
  const { files } = await loadCatalog();
  const url = site ? new URL(import.meta.env.BASE_URL, site).href : undefined;
  return new Response(citationCffOf(readSidecar(files), url), { headers: { 'content-type': 'text/yaml; charset=utf-8' } });
};
