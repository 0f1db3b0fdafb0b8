/**
 * Child-process driver of the reader fuzz test: `node --import tsx fuzzDriver.ts <formats,...>
 * <firstSeed> <count> <dir>`. For each format and case it writes the input, then reads it the way
 * `derive` does (openTable → planColumns → every chunk through normalizeChunk) and prints one
 * JSON line: `{format, seed, status, message, ms}` where status 0 = read, 2 = CatalogError (exit status 2), 1 = any
 * other error (a bug: exit status 1). Running in a child bounds memory (--max-old-space-size)
 * and lets the parent kill a hang.
 */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { defaultConfig } from '../../../../src/catalog/config/defaultConfig.ts';
import { normalizeChunk } from '../../../../src/catalog/normalize/normalizeChunk.ts';
import { planColumns } from '../../../../src/catalog/normalize/planColumns.ts';
import { CatalogError } from '../../../../src/catalog/readers/CatalogError.ts';
import { openTable } from '../../../../src/catalog/readers/openTable.ts';
import { fuzzInput, type FuzzFormat } from './fuzzCases.ts';

const EXT: Record<FuzzFormat, string> = { csv: 'csv', ecsv: 'ecsv', fits: 'fits', votable: 'vot', parquet: 'parquet' };

const [formats, first, count, dir] = process.argv.slice(2) as [string, string, string, string];
for (const format of formats.split(',') as FuzzFormat[]) for (let seed = Number(first); seed < Number(first) + Number(count); seed++) {
  const path = join(dir, `${format}-case-${seed}.${EXT[format]}`);
  writeFileSync(path, await fuzzInput(format, seed, join(dir, 'base.parquet')));
  const t0 = performance.now();
  let status = 0;
  let message = '';
  try {
    const src = await openTable(path);
    try {
      const plan = planColumns(src, defaultConfig());
      for await (const chunk of src.chunks(2)) normalizeChunk(chunk, plan);
    } finally {
      await src.close();
    }
  } catch (e) {
    status = e instanceof CatalogError ? 2 : 1;
    message = e instanceof CatalogError ? e.message : String((e as Error)?.stack ?? e);
  }
  process.stdout.write(`${JSON.stringify({ format, seed, status, message, ms: Math.round(performance.now() - t0) })}\n`);
}
