// A small gzip file that expands to gigabytes (a "gzip bomb") stops with a one-line CatalogError
// in bounded time and memory; the expanded bytes are never written anywhere.
import { existsSync } from 'node:fs';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { main } from '../../../src/catalog/cli/main.ts';
import { CatalogError } from '../../../src/catalog/readers/CatalogError.ts';
import { openTable } from '../../../src/catalog/readers/openTable.ts';

const STAND_IN = new URL('../derive/standIns/deriveObjectStandIn.ts', import.meta.url).href;

/** 64 MiB of CSV rows, compressed once; members of a gzip file may follow one another, and gunzip reads them all. */
const ROW_BLOCK_BYTES = 64 << 20;
const MEMBERS = 64; // 64 × 64 MiB = 4 GiB once expanded

let dir: string;
let bomb: string;
let bombBytes: number;
beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-gzip-bomb-'));
  const row = 'A,5,2000\n';
  const block = gzipSync(Buffer.from(row.repeat(Math.floor(ROW_BLOCK_BYTES / row.length))), { level: 9 });
  const file = Buffer.concat([gzipSync(Buffer.from('id,z,fwhm_halpha\n')), ...Array.from({ length: MEMBERS }, () => block)]);
  bomb = path.join(dir, 'bomb.csv.gz');
  bombBytes = file.length;
  await writeFile(bomb, file);
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('gzip-compressed catalogs have bounded decompressed sizes', () => {
  it('builds a bomb of a few megabytes that would expand to 4 GiB', () => {
    expect(bombBytes).toBeLessThan(10e6);
    expect(bombBytes * 500).toBeLessThan(MEMBERS * ROW_BLOCK_BYTES);
  });

  it('stops reading a gzip bomb at the ratio bound, long before it is expanded, with heap use bounded', async () => {
    const heapBefore = process.memoryUsage().heapUsed;
    const started = performance.now();
    const e = await openTable(bomb).then(() => null, (err: unknown) => err);
    expect(e).toBeInstanceOf(CatalogError);
    expect((e as Error).message).toMatch(new RegExp(`^${bomb.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}: gzip data expands more than 250 times \\(\\d+(\\.\\d+)? MB from \\d+(\\.\\d+)? kB so far\\), as a decompression bomb does; stopped \\(raise input\\.gzip_max_ratio in the config if the catalog is right\\)$`));
    expect((e as Error).message).not.toContain('\n');
    // Expanding all 4 GiB would take tens of seconds; the bound stops within the first ~100 MB.
    expect(performance.now() - started).toBeLessThan(20_000);
    expect(process.memoryUsage().heapUsed - heapBefore).toBeLessThan(512e6);
  });

  it('stops at the size bound when the ratio bound is raised', async () => {
    const e = await openTable(bomb, { gzipLimits: { maxRatio: 1e6, maxBytes: 20e6 } }).then(() => null, (err: unknown) => err);
    expect(e).toBeInstanceOf(CatalogError);
    expect((e as Error).message).toBe(`${bomb}: gzip data expands to more than 20 MB; stopped (raise input.gzip_max_gb in the config if the catalog really is that large)`);
  });

  it('reads an ordinary gzip catalog as before', async () => {
    const ok = path.join(dir, 'ok.csv.gz');
    await writeFile(ok, gzipSync(Buffer.from('id,z,fwhm_halpha\nA,5,2000\nB,6,1500\n')));
    const t = await openTable(ok);
    expect(t.nRows).toBe(2);
    await t.close();
  });

  it('ends derive with exit status 2 and one line, writing nothing, for a gzip bomb', async () => {
    const err: string[] = [];
    const io = { stdout: { write: () => true }, stderr: { isTTY: false, write: (s: string) => err.push(s) } };
    const status = await main(['derive', bomb, '-o', path.join(dir, 'out.parquet'), '--threads', '1', '--quiet'], io, { deriveModule: STAND_IN });
    expect(status).toBe(2);
    const lines = err.join('').split('\n').filter(Boolean);
    expect(lines).toHaveLength(1);
    expect(lines[0]).toContain('gzip data expands more than 250 times');
    expect(existsSync(path.join(dir, 'out.parquet'))).toBe(false);
  });

  it('takes the bounds from the config, and refuses a ratio bound below 2', async () => {
    const config = path.join(dir, 'census.config.yaml');
    await writeFile(config, 'input: { path: bomb.csv.gz, gzip_max_ratio: 100000, gzip_max_gb: 0.02 }\noutput: out2.parquet\n');
    const err: string[] = [];
    const io = { stdout: { write: () => true }, stderr: { isTTY: false, write: (s: string) => err.push(s) } };
    expect(await main(['derive', '-c', config, '--threads', '1', '--quiet'], io, { deriveModule: STAND_IN })).toBe(2);
    expect(err.join('')).toContain('gzip data expands to more than 20 MB');
    await writeFile(config, 'input: { path: bomb.csv.gz, gzip_max_ratio: 1 }\n');
    err.length = 0;
    expect(await main(['derive', '-c', config, '--quiet'], io, { deriveModule: STAND_IN })).toBe(2);
    expect(err.join('')).toContain('input.gzip_max_ratio must be a number of at least 2');
  });
});
