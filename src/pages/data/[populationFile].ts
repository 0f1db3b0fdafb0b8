// The results of `dawn-census population`, copied into the site beside data/catalog.parquet as downloads (and the
// per-object table for the SQL workspace). None when the catalog has no survey block.
import type { APIRoute, GetStaticPaths } from 'astro';
import { readFileSync } from 'node:fs';
import { loadPopulation } from '../../site/build/loadPopulation.ts';

export const getStaticPaths: GetStaticPaths = async () => {
  const pop = await loadPopulation();
  return (pop?.downloads ?? []).map((d) => ({ params: { populationFile: d.name }, props: { path: d.path } }));
};

export const GET: APIRoute = ({ props }) => {
  const path = (props as { path: string }).path;
  const type = path.endsWith('.json') ? 'application/json; charset=utf-8' : 'application/vnd.apache.parquet';
  return new Response(readFileSync(path), { headers: { 'content-type': type } });
};
