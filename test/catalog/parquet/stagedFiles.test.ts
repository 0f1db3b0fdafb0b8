import { mkdir, mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { StagedFiles } from '../../../src/catalog/parquet/stagedFiles.ts';

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-staged-'));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('StagedFiles', () => {
  it('writes under temporary names and renames every file into place on commit', async () => {
    const staged = new StagedFiles();
    const a = staged.stage(path.join(dir, 'a.parquet'));
    const b = staged.stage(path.join(dir, 'a.meta.json'));
    expect(path.basename(a)).toMatch(/^a\.parquet\.tmp-\d+-[0-9a-f]+$/);
    await writeFile(a, 'A');
    await writeFile(b, 'B');
    const scratch = staged.scratchPath(path.join(dir, 'a.parquet'), '.d');
    await mkdir(scratch);
    await writeFile(path.join(scratch, 'x'), 'x');
    await staged.commit();
    expect((await readdir(dir)).sort()).toEqual(['a.meta.json', 'a.parquet']);
    expect(await readFile(path.join(dir, 'a.parquet'), 'utf8')).toBe('A');
  });

  it('leaves an earlier output untouched and removes its temporary files on discard', async () => {
    const final = path.join(dir, 'out.parquet');
    await writeFile(final, 'earlier good output');
    const staged = new StagedFiles();
    await writeFile(staged.stage(final), 'half-written');
    await staged.discard();
    expect(await readdir(dir)).toEqual(['out.parquet']);
    expect(await readFile(final, 'utf8')).toBe('earlier good output');
  });
});
