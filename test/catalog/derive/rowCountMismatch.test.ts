// A reader that yields fewer rows than it counted when the file was opened (the file was cut
// short between its two passes in a way its size and times did not show): the run must stop.
import { mkdtemp, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { defaultConfig } from '../../../src/catalog/config/defaultConfig.ts';
import { runDerive } from '../../../src/catalog/derive/runDerive.ts';
import { CatalogError } from '../../../src/catalog/readers/CatalogError.ts';
import { memorySource } from '../normalize/memorySource.ts';
import { STAND_IN } from './fixtures.ts';

vi.mock('../../../src/catalog/readers/openTable.ts', () => ({
  openTable: async (file: string) => {
    const src = memorySource([['id', ['A', 'B', 'C']], ['z', [5, 6, 7]]], path.basename(file));
    return { ...src, nRows: 5 };
  },
}));

let dir: string;
let cwd: string;
beforeEach(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-rows-'));
  cwd = process.cwd();
  process.chdir(dir);
});
afterEach(async () => {
  process.chdir(cwd);
  await rm(dir, { recursive: true, force: true });
});

describe('rows read against rows counted', () => {
  it('stops with a catalog error and writes nothing when the reader yields fewer rows than it counted', async () => {
    await writeFile('cat.csv', 'stand-in: the rows come from the mocked reader\n');
    const run = runDerive({ catalogPath: 'cat.csv', config: defaultConfig(), outputPath: path.join(dir, 'out.parquet'), threads: 1, deriveModule: STAND_IN });
    await expect(run).rejects.toThrow(CatalogError);
    await expect(run).rejects.toThrow('cat.csv: the catalog changed while it was being read (5 rows counted when it was opened, 3 read); nothing was written — derive again once it is complete');
    expect(await readdir('.')).toEqual(['cat.csv']);
  });
});
