/** The rows the population charts are drawn from (columns and rows), for the browser to redraw them on hover. */
import type { APIRoute } from 'astro';
import { chartRowsJson } from '../../site/build/buildCharts.ts';

export const GET: APIRoute = async () => new Response(await chartRowsJson(), { headers: { 'Content-Type': 'application/json' } });
