import { execFile, spawn } from 'node:child_process';
import { mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import { DuckDBInstance } from '@duckdb/node-api';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';

const BIN = fileURLToPath(new URL('../../../bin/dawn-census.js', import.meta.url));
const run = promisify(execFile);

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-bin-'));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('bin/dawn-census.js', () => {
  it('derives a catalog with the real deriveObject on two worker threads', async () => {
    const input = path.join(dir, 'tiny.csv');
    await writeFile(input, 'id,z,fwhm_halpha,fwhm_halpha_err,lum_halpha,lum_halpha_err\nT-1,5.5,2100,200,4.6e42,0.5e42\nT-2,6.5,1200,150,2.3e42,0.3e42\nT-3,5.0,,,,\n');
    const { stderr } = await run(process.execPath, [BIN, 'derive', input, '--draws', '200', '--threads', '2'], { cwd: dir });
    expect(stderr).toContain('Read 3 rows from tiny.csv');
    expect((await readdir(dir)).sort()).toEqual(['tiny.census.meta.json', 'tiny.census.parquet', 'tiny.census.readings.parquet', 'tiny.census.rejections.csv', 'tiny.csv']);
    const db = await DuckDBInstance.create(':memory:');
    const con = await db.connect();
    const rows = (await con.runAndReadAll(`SELECT id, log_mbh, log_mbh_p16, log_mbh_p84 FROM '${path.join(dir, 'tiny.census.parquet')}' ORDER BY row`)).getRowObjectsJS();
    con.closeSync();
    db.closeSync();
    expect(rows.map((r) => r.id)).toEqual(['T-1', 'T-2', 'T-3']);
    // Only sanity here (the masses themselves are tested in test/core): a finite mass inside its own 16–84 % range.
    const m = rows[0]!;
    expect(Number.isFinite(m.log_mbh)).toBe(true);
    expect(m.log_mbh_p16 as number).toBeLessThan(m.log_mbh_p84 as number);
  });

  it('exits with status 2 and one line on stderr when the catalog does not exist', async () => {
    const failure = await run(process.execPath, [BIN, 'derive', 'missing.csv'], { cwd: dir }).catch((e: { code: number; stderr: string }) => e);
    expect('code' in failure && failure.code).toBe(2);
    expect((failure as { stderr: string }).stderr.trim().split('\n')).toHaveLength(1);
    expect(await readdir(dir)).toEqual([]);
  });

  it.each([
    { signal: 'SIGINT', status: 130, message: 'dawn-census: interrupted; nothing was written (an earlier output is unchanged)' },
    { signal: 'SIGTERM', status: 143, message: 'dawn-census: stopped by SIGTERM; nothing was written (an earlier output is unchanged)' },
  ] as const)('stops on $signal with status $status, removing its temporary folder and leaving an earlier output set as it was', async ({ signal, status, message }) => {
    const input = path.join(dir, 'many.csv');
    // An earlier output set at the same path, written by the tool from a small catalog.
    await writeFile(input, 'id,z,fwhm_halpha,fwhm_halpha_err,lum_halpha,lum_halpha_err\nE-1,5.5,2100,200,4.6e42,0.5e42\n');
    await run(process.execPath, [BIN, 'derive', input, '--draws', '20', '--threads', '1', '--quiet'], { cwd: dir });
    const names = ['many.census.meta.json', 'many.census.parquet', 'many.census.readings.parquet', 'many.census.rejections.csv'];
    const earlier = await Promise.all(names.map((n) => readFile(path.join(dir, n))));
    const lines = ['id,z,fwhm_halpha,fwhm_halpha_err,lum_halpha,lum_halpha_err'];
    for (let i = 0; i < 20000; i++) lines.push(`M-${i},${(4 + (i % 60) / 10).toFixed(1)},${1000 + (i % 90) * 30},150,${2 + (i % 9)}e42,0.3e42`);
    await writeFile(input, lines.join('\n'));
    // 500 draws: every object is derived under the four readings, about the work of 2000 draws under one.
    const child = spawn(process.execPath, [BIN, 'derive', input, '--draws', '500', '--threads', '2'], { cwd: dir });
    let stderr = '';
    let sent = false;
    child.stderr.on('data', (d: Buffer) => {
      stderr += d.toString();
      // One signal (a second Ctrl-C would end the process at once, as usual).
      if (!sent && /derive: \d+%/.test(stderr)) sent = child.kill(signal);
    });
    const code = await new Promise<number | null>((resolve) => child.on('exit', (c) => resolve(c)));
    expect(code, stderr).toBe(status);
    expect(stderr).toContain(message);
    expect((await readdir(dir)).sort()).toEqual([...names, 'many.csv']);
    for (let i = 0; i < names.length; i++) expect((await readFile(path.join(dir, names[i]!))).equals(earlier[i]!), names[i]).toBe(true);
  });
});
