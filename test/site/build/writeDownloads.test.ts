import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { STREAMED_DOWNLOADS, writeDownloads } from '../../../src/site/build/writeDownloads.ts';
import { sidecarPath } from '../../../src/site/build/catalogFiles.ts';
import { deriveTiny } from '../../catalog/publish/deriveTiny.ts';

describe('the downloads streamed into the built site', () => {
  let dir: string;
  let parquet: string;
  const ids = ['T-1', 'T-2', 'T-3'];
  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'census-downloads-'));
    ({ parquet } = await deriveTiny(dir));
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('writes the CSV, ECSV, VOTable and FITS of every row into the data folder', async () => {
    const data = join(dir, 'site/data');
    await writeDownloads(data, { parquet, meta: sidecarPath(parquet) });
    const csv = readFileSync(join(data, 'catalog.csv'), 'utf8').split('\n').filter((l) => l !== '');
    // '#' lines with the units first, then the header and one line per object.
    expect(csv[0]).toMatch(/^# /);
    const body = csv.filter((l) => !l.startsWith('#'));
    expect(body[0]!.split(',')[0]).toBe('id');
    expect(body.slice(1).map((l) => l.split(',')[0])).toEqual(ids);
    expect(csv.join('\n')).toContain('"first, with a comma"');
    const ecsv = readFileSync(join(data, 'catalog.ecsv'), 'utf8');
    expect(ecsv.startsWith('# %ECSV')).toBe(true);
    for (const id of ids) expect(ecsv).toContain(id);
    const vot = readFileSync(join(data, 'catalog.vot'), 'utf8');
    expect(vot.match(/<TR>/g)).toHaveLength(ids.length);
    const fits = readFileSync(join(data, 'catalog.fits'));
    expect(fits.subarray(0, 30).toString('latin1')).toMatch(/^SIMPLE  =\s+T/);
    expect(fits.length % 2880).toBe(0);
    expect(STREAMED_DOWNLOADS).toEqual(['catalog.ecsv', 'catalog.vot', 'catalog.fits', 'catalog.csv']);
  });
});
