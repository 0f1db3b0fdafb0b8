/** The population's derivation inputs for the Readings page's live custom reading (src/site/build/readingsInputs.ts). */
import type { APIRoute } from 'astro';
import { loadCatalog } from '../../site/build/loadCatalog.ts';
import { readingsInputs } from '../../site/build/readingsInputs.ts';

export const GET: APIRoute = async () => {
  const { files } = await loadCatalog();
  const body = await readingsInputs(files);
  return new Response(JSON.stringify(body ?? { inputs: [], logMstar: [], tooLarge: true }), { headers: { 'content-type': 'application/json; charset=utf-8' } });
};
