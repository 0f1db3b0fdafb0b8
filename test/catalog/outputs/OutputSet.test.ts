import { mkdir, mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { outputPaths } from '../../../src/catalog/derive/outputPaths.ts';
import { OutputSet } from '../../../src/catalog/outputs/OutputSet.ts';

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-set-'));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

async function stageAll(set: OutputSet, tag: string): Promise<void> {
  await writeFile(set.staged('catalog'), `${tag} catalog`);
  await writeFile(set.staged('meta'), `${tag} meta`);
  await writeFile(set.staged('rejections'), `${tag} rejections`);
  await writeFile(set.staged('readings'), `${tag} readings`);
}

describe('OutputSet', () => {
  it('writes into one temporary folder beside the outputs and moves the four files into place on commit', async () => {
    const paths = outputPaths(path.join(dir, 'out.parquet'));
    const set = await OutputSet.create(paths);
    expect(path.dirname(set.folder)).toBe(dir);
    expect(path.basename(set.folder)).toMatch(/^out\.parquet\.tmp-dawn-census-\d+-[0-9a-f]{6}$/);
    await stageAll(set, 'new');
    await set.commit();
    expect((await readdir(dir)).sort()).toEqual(['out.meta.json', 'out.parquet', 'out.readings.parquet', 'out.rejections.csv']);
    expect(await readFile(paths.catalog, 'utf8')).toBe('new catalog');
    expect(await readFile(paths.meta, 'utf8')).toBe('new meta');
  });

  it('puts the whole earlier set back when a file cannot be moved into place, so a new Parquet never stands beside old sidecars', async () => {
    const paths = outputPaths(path.join(dir, 'out.parquet'));
    await writeFile(paths.catalog, 'old catalog');
    await writeFile(paths.rejections, 'old rejections');
    await writeFile(paths.meta, 'old meta');
    const set = await OutputSet.create(paths);
    await stageAll(set, 'new');
    // The new sidecar, moved last, is gone: its move fails after the new Parquet and rejection
    // report are already in place.
    await rm(set.staged('meta'));
    await expect(set.commit()).rejects.toThrow(/ENOENT/);
    expect(await readFile(paths.catalog, 'utf8')).toBe('old catalog');
    expect(await readFile(paths.rejections, 'utf8')).toBe('old rejections');
    expect(await readFile(paths.meta, 'utf8')).toBe('old meta');
    await set.discard();
    // No earlier readings table: the new one is taken away again with the rest of the new set.
    expect((await readdir(dir)).sort()).toEqual(['out.meta.json', 'out.parquet', 'out.rejections.csv']);
  });

  it('removes a new file whose place was empty before when the commit fails', async () => {
    const paths = outputPaths(path.join(dir, 'out.parquet'));
    await writeFile(paths.meta, 'old meta');
    const set = await OutputSet.create(paths);
    await stageAll(set, 'new');
    await rm(set.staged('meta'));
    await expect(set.commit()).rejects.toThrow(/ENOENT/);
    await set.discard();
    expect(await readdir(dir)).toEqual(['out.meta.json']);
    expect(await readFile(paths.meta, 'utf8')).toBe('old meta');
  });

  it('leaves nothing behind on discard', async () => {
    const set = await OutputSet.create(outputPaths(path.join(dir, 'sub', 'out.parquet')));
    await stageAll(set, 'new');
    await mkdir(set.scratch('rows'));
    await set.discard();
    expect(await readdir(path.join(dir, 'sub'))).toEqual([]);
  });
});
