// The rejection report of the derive run (every problem found in a row), published beside the catalog.
import type { APIRoute } from 'astro';
import { existsSync, readFileSync } from 'node:fs';
import { REJECTION_HEADER } from '../../catalog/derive/rejectionReport.ts';
import { loadCatalog } from '../../site/build/loadCatalog.ts';

export const GET: APIRoute = async () => {
  const { files } = await loadCatalog();
  const report = files.parquet.replace(/\.parquet$/i, '') + '.rejections.csv';
  const body = existsSync(report) ? readFileSync(report) : Buffer.from(`${REJECTION_HEADER.join(',')}\n`);
  return new Response(new Uint8Array(body), { headers: { 'content-type': 'text/csv; charset=utf-8' } });
};
