import { mkdir, mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { DERIVE_HELP, MAIN_HELP } from '../../../src/catalog/cli/helpText.ts';
import { main } from '../../../src/catalog/cli/main.ts';

const STAND_IN = new URL('../derive/standIns/deriveObjectStandIn.ts', import.meta.url).href;
const PACKAGE_VERSION = (JSON.parse(await readFile(new URL('../../../package.json', import.meta.url), 'utf8')) as { version: string }).version;

function io() {
  const out: string[] = [];
  const err: string[] = [];
  return {
    io: { stdout: { write: (s: string) => out.push(s) }, stderr: { isTTY: false, write: (s: string) => err.push(s) } },
    out: () => out.join(''),
    err: () => err.join(''),
  };
}

async function run(argv: string[]) {
  const t = io();
  const status = await main(argv, t.io, { deriveModule: STAND_IN });
  return { status, out: t.out(), err: t.err() };
}

let dir: string;
let cwd: string;
beforeEach(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-cli-'));
  cwd = process.cwd();
  process.chdir(dir);
});
afterEach(async () => {
  process.chdir(cwd);
  await rm(dir, { recursive: true, force: true });
});

const CSV = 'id,z,fwhm_halpha\nA,5,2000\nB,6,-3\nC,7,1500\n';

describe('dawn-census', () => {
  it('prints its help on stdout with --help and exits 0', async () => {
    expect(await run(['--help'])).toEqual({ status: 0, out: MAIN_HELP, err: '' });
    expect(await run(['derive', '--help'])).toEqual({ status: 0, out: DERIVE_HELP, err: '' });
  });

  it('prints the package version with --version', async () => {
    expect(await run(['--version'])).toEqual({ status: 0, out: `dawn-census ${PACKAGE_VERSION}\n`, err: '' });
  });

  it('exits 64 with the help on stderr when no command is given, and 64 for an unknown command or option', async () => {
    expect(await run([])).toEqual({ status: 64, out: '', err: MAIN_HELP });
    expect(await run(['derve'])).toEqual({ status: 64, out: '', err: 'dawn-census: unknown command "derve" (see dawn-census --help)\n' });
    expect((await run(['derive', 'x.csv', '--fast'])).status).toBe(64);
  });

  it('exits 64 when derive is given no catalog and no config', async () => {
    expect(await run(['derive'])).toEqual({ status: 64, out: '', err: 'dawn-census: no catalog given: dawn-census derive <catalog> (see dawn-census derive --help)\n' });
  });

  it('exits 2 with a one-line message for a config that does not exist or an out-of-range --draws', async () => {
    await writeFile('cat.csv', CSV);
    const missing = await run(['derive', 'cat.csv', '-c', 'nope.yaml']);
    expect(missing.status).toBe(2);
    expect(missing.err).toBe('nope.yaml: cannot read the config file: no such file\n');
    const draws = await run(['derive', 'cat.csv', '--draws', '0']);
    expect(draws.status).toBe(2);
    expect(draws.err.trim().split('\n')).toHaveLength(1);
    expect(draws.err).toMatch(/^--draws must be/);
    expect(await readdir('.')).toEqual(['cat.csv']);
  });

  it('derives a catalog to <name>.census.parquet beside it, with a summary, and ignores a config lying beside it', async () => {
    await writeFile('cat.csv', CSV);
    await writeFile('census.config.yaml', 'title: Not to be read\ndraws: 7\n');
    const r = await run(['derive', 'cat.csv', '--draws', '40', '--threads', '1']);
    expect(r.status).toBe(0);
    expect(r.out).toBe('');
    expect(r.err).toContain('cat.csv: row 2 (id B): fwhm_halpha = -3 km/s: must be positive\n');
    expect(r.err).toContain('Read 3 rows from cat.csv\n');
    expect(r.err).toContain('Derived 2 (40 draws each, seed 1, 1 thread)\n');
    expect(r.err).toContain('Flagged 1 row with input problems (1 problem): listed in cat.census.rejections.csv\n');
    expect(r.err).toMatch(/Wrote cat\.census\.parquet \(3 rows, \d+ columns\) and cat\.census\.meta\.json\n/);
    expect(r.err).toContain('Wrote cat.census.readings.parquet (every object under 4 readings: standard, scattering_core, dense_gas, small_bolometric)\n');
    // The headline numbers of each reading, as stored in the metadata (2 of the 3 rows derive).
    expect(r.err).toMatch(/\n {2}standard +\d+ of 2 \(\d+ %\)/);
    expect(r.err).toMatch(/\n {2}small_bolometric +/);
    expect((await readdir('.')).sort()).toEqual(['cat.census.meta.json', 'cat.census.parquet', 'cat.census.readings.parquet', 'cat.census.rejections.csv', 'cat.csv', 'census.config.yaml']);
    const meta = JSON.parse(await readFile('cat.census.meta.json', 'utf8'));
    expect(meta.title).toBeUndefined();
    expect(meta.config).toEqual({ file: null, sha256: null });
    expect(meta.settings.settings.draws).toBe(40);
  });

  it('takes the input, output and settings from the config given with -c, resolved from its folder', async () => {
    await writeFile('cat.csv', CSV);
    await writeFile('my.yaml', 'title: Mine\ninput: { path: cat.csv }\noutput: out/mine.parquet\ndraws: 30\nseed: 5\n');
    const r = await run(['derive', '-c', 'my.yaml', '--quiet']);
    expect(r).toEqual({ status: 0, out: '', err: '' });
    expect((await readdir('out')).sort()).toEqual(['mine.meta.json', 'mine.parquet', 'mine.readings.parquet', 'mine.rejections.csv']);
    const meta = JSON.parse(await readFile('out/mine.meta.json', 'utf8'));
    expect(meta.title).toBe('Mine');
    expect(meta.config.file).toBe('my.yaml');
    expect(meta.config.sha256).toMatch(/^[0-9a-f]{64}$/);
    expect(meta.settings.settings).toMatchObject({ draws: 30, seed: 5 });
  });

  it('exits 2 on duplicate ids and writes nothing', async () => {
    await writeFile('dup.csv', 'id,z,fwhm_halpha\nA,5,2000\nB,6,1000\nA,7,1500\n');
    const r = await run(['derive', 'dup.csv', '-o', 'dup.parquet']);
    expect(r).toEqual({ status: 2, out: '', err: 'dup.csv: duplicate id "A" at rows 1 and 3\n' });
    expect(await readdir('.')).toEqual(['dup.csv']);
  });

  it('refuses to write the output over the catalog or onto a folder', async () => {
    await writeFile('cat.csv', CSV);
    const r = await run(['derive', 'cat.csv', '-o', 'cat.csv']);
    expect(r.status).toBe(64);
    expect(r.err).toBe('dawn-census: the output cat.csv is the catalog itself; choose another with -o\n');
    await mkdir('out');
    const folder = await run(['derive', 'cat.csv', '-o', 'out/']);
    expect(folder.status).toBe(64);
    expect(folder.err).toBe(`dawn-census: the output out is a folder; give a file name, e.g. ${path.join('out', 'catalog.parquet')}\n`);
  });
});
