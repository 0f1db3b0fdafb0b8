import { execFileSync } from 'node:child_process';
import { mkdir, mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { outputPaths } from '../../../src/catalog/derive/outputPaths.ts';
import { recoverLeftovers } from '../../../src/catalog/outputs/recoverLeftovers.ts';

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-left-'));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

/** The id of a process that has ended. */
function deadPid(): number {
  return Number(execFileSync(process.execPath, ['-e', 'process.stdout.write(String(process.pid))']).toString());
}

describe('recoverLeftovers', () => {
  it('puts back the earlier set when a run was killed in the middle of its commit', async () => {
    const paths = outputPaths(path.join(dir, 'out.parquet'));
    const pid = deadPid();
    const folder = path.join(dir, `out.parquet.tmp-dawn-census-${pid}-a1b2c3`);
    await mkdir(folder);
    // Killed after moving the earlier files aside and the new rejection report and catalog in,
    // before the new sidecar: the folder holds the earlier three and the new sidecar.
    await writeFile(path.join(folder, 'journal.json'), JSON.stringify({
      format: 'dawn-census-commit/1',
      finals: { catalog: paths.catalog, meta: paths.meta, rejections: paths.rejections },
      hadPrevious: { catalog: true, meta: true, rejections: true },
    }));
    await writeFile(path.join(folder, 'previous.catalog.parquet'), 'old catalog');
    await writeFile(path.join(folder, 'previous.meta.json'), 'old meta');
    await writeFile(path.join(folder, 'previous.rejections.csv'), 'old rejections');
    await writeFile(path.join(folder, 'meta.json'), 'new meta');
    await writeFile(paths.catalog, 'new catalog');
    await writeFile(paths.rejections, 'new rejections');
    expect(await recoverLeftovers(paths)).toEqual([`put back the earlier outputs that a stopped run (process ${pid}) was replacing`]);
    expect((await readdir(dir)).sort()).toEqual(['out.meta.json', 'out.parquet', 'out.rejections.csv']);
    expect(await readFile(paths.catalog, 'utf8')).toBe('old catalog');
    expect(await readFile(paths.meta, 'utf8')).toBe('old meta');
    expect(await readFile(paths.rejections, 'utf8')).toBe('old rejections');
  });

  it('keeps the new set when the run was killed after its commit was complete', async () => {
    const paths = outputPaths(path.join(dir, 'out.parquet'));
    const folder = path.join(dir, `out.parquet.tmp-dawn-census-${deadPid()}-a1b2c3`);
    await mkdir(folder);
    await writeFile(path.join(folder, 'journal.json'), JSON.stringify({
      format: 'dawn-census-commit/1',
      finals: { catalog: paths.catalog, meta: paths.meta, rejections: paths.rejections },
      hadPrevious: { catalog: true, meta: true, rejections: true },
    }));
    await writeFile(path.join(folder, 'previous.catalog.parquet'), 'old catalog');
    await writeFile(path.join(folder, 'committed'), '');
    await writeFile(paths.catalog, 'new catalog');
    await recoverLeftovers(paths);
    expect(await readdir(dir)).toEqual(['out.parquet']);
    expect(await readFile(paths.catalog, 'utf8')).toBe('new catalog');
  });

  it('leaves alone the folder of a run still going, one holding files it does not know, and other outputs\' folders', async () => {
    const paths = outputPaths(path.join(dir, 'out.parquet'));
    const live = `out.parquet.tmp-dawn-census-${process.ppid}-a1b2c3`;
    const strange = `out.parquet.tmp-dawn-census-${deadPid()}-d4e5f6`;
    const other = `other.parquet.tmp-dawn-census-${deadPid()}-a1b2c3`;
    for (const f of [live, strange, other]) await mkdir(path.join(dir, f));
    await writeFile(path.join(dir, strange, 'thesis.tex'), 'not ours');
    expect(await recoverLeftovers(paths)).toEqual([]);
    expect((await readdir(dir)).sort()).toEqual([live, other, strange].sort());
  });

  it('never acts on a journal that names files in another folder', async () => {
    const paths = outputPaths(path.join(dir, 'out.parquet'));
    const victim = path.join(tmpdir(), `dc-victim-${process.pid}.txt`);
    await writeFile(victim, 'precious');
    const folder = path.join(dir, `out.parquet.tmp-dawn-census-${deadPid()}-a1b2c3`);
    await mkdir(folder);
    await writeFile(path.join(folder, 'journal.json'), JSON.stringify({
      format: 'dawn-census-commit/1',
      finals: { catalog: victim, meta: paths.meta, rejections: paths.rejections },
      hadPrevious: { catalog: false, meta: false, rejections: false },
    }));
    try {
      await recoverLeftovers(paths);
      expect(await readFile(victim, 'utf8')).toBe('precious');
    } finally {
      await rm(victim, { force: true });
    }
  });
});
