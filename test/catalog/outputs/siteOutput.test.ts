import { existsSync } from 'node:fs';
import { mkdir, mkdtemp, readdir, readFile, rm, symlink, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { OutputRefused } from '../../../src/catalog/outputs/OutputRefused.ts';
import { checkSiteOut, commitSite, SITE_MARKER, siteStaging } from '../../../src/catalog/outputs/siteOutput.ts';

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-siteout-'));
  await writeFile(path.join(dir, 'census.config.yaml'), 'title: T\n');
  await mkdir(path.join(dir, 'out'));
  await writeFile(path.join(dir, 'out', 'catalog.parquet'), 'PAR1');
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

const keep = () => [path.join(dir, 'census.config.yaml'), path.join(dir, 'out', 'catalog.parquet'), path.join(dir, 'catalog.csv')];
const refusal = async (out: string): Promise<string> => {
  try {
    await checkSiteOut(out, keep(), path.relative(dir, out) || '.');
  } catch (e) {
    expect(e).toBeInstanceOf(OutputRefused);
    return (e as Error).message;
  }
  throw new Error('expected a refusal');
};

describe('checkSiteOut', () => {
  it('takes a new folder, an empty one, or one a site build left its marker in', async () => {
    await expect(checkSiteOut(path.join(dir, 'site'), keep(), 'site')).resolves.toBeUndefined();
    await mkdir(path.join(dir, 'empty'));
    await expect(checkSiteOut(path.join(dir, 'empty'), keep(), 'empty')).resolves.toBeUndefined();
    await mkdir(path.join(dir, 'built'));
    await writeFile(path.join(dir, 'built', SITE_MARKER), '{}');
    await writeFile(path.join(dir, 'built', 'index.html'), '<p>');
    await expect(checkSiteOut(path.join(dir, 'built'), keep(), 'built')).resolves.toBeUndefined();
  });

  it('refuses the folder of the config or the catalog (`--out .` emptied it), and any folder above them', async () => {
    expect(await refusal(dir)).toBe('--out . holds census.config.yaml, and a site build replaces its whole folder: choose a new folder for the site');
    expect(await refusal(path.join(dir, 'out'))).toBe('--out out holds catalog.parquet, and a site build replaces its whole folder: choose a new folder for the site');
    expect(await refusal(path.dirname(dir))).toMatch(/holds census\.config\.yaml/);
    // Even with a marker someone copied there, and through a symbolic link.
    await writeFile(path.join(dir, SITE_MARKER), '{}');
    expect(await refusal(dir)).toMatch(/holds census\.config\.yaml/);
    await symlink(dir, path.join(path.dirname(dir), `${path.basename(dir)}-link`));
    try {
      expect(await refusal(path.join(path.dirname(dir), `${path.basename(dir)}-link`))).toMatch(/holds census\.config\.yaml/);
    } finally {
      await rm(path.join(path.dirname(dir), `${path.basename(dir)}-link`));
    }
  });

  it('refuses a folder holding anything a site build did not write, and a file, leaving them as they were', async () => {
    await mkdir(path.join(dir, 'thesis'));
    await writeFile(path.join(dir, 'thesis', 'thesis.tex'), '\\documentclass{article}');
    expect(await refusal(path.join(dir, 'thesis'))).toBe('--out thesis holds files dawn-census did not build (thesis.tex), and a site build replaces its whole folder: choose a new or empty folder');
    expect(await readFile(path.join(dir, 'thesis', 'thesis.tex'), 'utf8')).toBe('\\documentclass{article}');
    await writeFile(path.join(dir, 'notes.txt'), 'x');
    expect(await refusal(path.join(dir, 'notes.txt'))).toBe('--out notes.txt is not a folder: choose a new folder for the site');
  });
});

describe('commitSite', () => {
  async function stage(out: string, page: string): Promise<string> {
    const staging = siteStaging(out);
    await mkdir(staging);
    await writeFile(path.join(staging, 'index.html'), page);
    return staging;
  }

  it('moves a finished build into place with its marker, replacing an earlier site and leaving nothing beside it', async () => {
    const out = path.join(dir, 'site');
    await commitSite(await stage(out, 'one'), out, { catalog: 'catalog.parquet', base: '/' });
    expect(await readFile(path.join(out, 'index.html'), 'utf8')).toBe('one');
    expect(JSON.parse(await readFile(path.join(out, SITE_MARKER), 'utf8'))).toEqual({ tool: 'dawn-census', catalog: 'catalog.parquet', base: '/' });
    await writeFile(path.join(out, 'old-page.html'), 'stale');
    await checkSiteOut(out, keep(), 'site');
    await commitSite(await stage(out, 'two'), out, { catalog: 'catalog.parquet', base: '/' });
    expect(await readFile(path.join(out, 'index.html'), 'utf8')).toBe('two');
    expect(existsSync(path.join(out, 'old-page.html'))).toBe(false);
    expect((await readdir(dir)).sort()).toEqual(['census.config.yaml', 'out', 'site']);
  });
});
