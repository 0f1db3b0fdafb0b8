/** The population charts as SVG files, drawn at build time; object pages mark their object over them. */
import type { APIRoute, GetStaticPaths } from 'astro';
import { buildCharts, POPULATION_CHARTS } from '../../site/build/buildCharts.ts';

export const getStaticPaths = (() => POPULATION_CHARTS.map((c) => ({ params: { key: c.key } }))) satisfies GetStaticPaths;

export const GET: APIRoute = async ({ params }) => {
  const chart = (await buildCharts()).get(String(params.key))!;
  return new Response(chart.file, { headers: { 'Content-Type': 'image/svg+xml' } });
};
