/** What the query page's downloads record about the catalog: its hashes, its title and the VOUnits, UCD and description of each column. */
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import type { CatalogFiles } from './catalogFiles.ts';
import { readSidecar } from './exportDownloads.ts';
import type { ResultContext } from '../query/resultDownloads.ts';

/** The context of query downloads, built once at build time and put in a data attribute. */
export function queryContext(files: CatalogFiles): ResultContext {
  const m = readSidecar(files);
  return {
    title: m.title ?? 'Derived catalog',
    tool: `${m.tool.name} ${m.tool.version}`,
    catalogSha256: createHash('sha256').update(readFileSync(files.parquet)).digest('hex'),
    inputSha256: m.input.sha256,
    columns: Object.fromEntries(m.columns.map((c) => [c.name, { ...(c.unit ? { unit: c.unit } : {}), ...(c.ucd ? { ucd: c.ucd } : {}), description: c.description }])),
  };
}
