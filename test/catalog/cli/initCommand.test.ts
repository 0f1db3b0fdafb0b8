import { existsSync } from 'node:fs';
import { mkdir, mkdtemp, readFile, rm, stat, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { INIT_HELP, parseInitArgs } from '../../../src/catalog/cli/initCommand.ts';
import { main } from '../../../src/catalog/cli/main.ts';
import { parseConfig } from '../../../src/catalog/config/loadConfig.ts';
import { defaultSettings } from '../../../src/catalog/config/defaultConfig.ts';

const STAND_IN = new URL('../derive/standIns/deriveObjectStandIn.ts', import.meta.url).href;

async function run(argv: string[]) {
  const out: string[] = [];
  const err: string[] = [];
  const io = { stdout: { write: (s: string) => out.push(s) }, stderr: { isTTY: false, write: (s: string) => err.push(s) } };
  const status = await main(argv, io, { deriveModule: STAND_IN });
  return { status, out: out.join(''), err: err.join('') };
}

let dir: string;
let cwd: string;
beforeEach(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-init-'));
  cwd = process.cwd();
  process.chdir(dir);
});
afterEach(async () => {
  process.chdir(cwd);
  await rm(dir, { recursive: true, force: true });
});

// A catalog with the usual spellings (common practice), none of them canonical but `ra`.
const CSV = 'Name,z_spec,FWHM_Ha,e_FWHM_Ha,F_Ha,F_Ha_err,RA,field\nA-1,5.1,2100,200,3.1e-17,3e-18,150.1,N\nA-2,6.2,1800,150,2.2e-17,2e-18,150.2,S\nA-3,7.3,2500,300,1.5e-17,2e-18,150.3,N\n';

describe('dawn-census init', () => {
  it('writes a config whose guesses let derive run on the catalog as it is', async () => {
    await writeFile('mine.csv', CSV);
    const r = await run(['init', 'mine.csv']);
    expect(r.status).toBe(0);
    expect(r.err).toContain('Wrote census.config.yaml from mine.csv');
    expect(r.err).toContain('found under their own names: ra');
    expect(r.err).toContain('guessed (check them): id ← Name, z ← z_spec, fwhm_halpha ← FWHM_Ha, fwhm_halpha_err ← e_FWHM_Ha, flux_halpha ← F_Ha, flux_halpha_err ← F_Ha_err');
    expect(r.err).toContain('passed through unchanged: 1 column');
    expect(r.err).toContain('Check it, then run: dawn-census derive -c census.config.yaml');
    const text = await readFile('census.config.yaml', 'utf8');
    const cfg = parseConfig(text, path.join(dir, 'census.config.yaml'));
    expect(cfg.settings).toEqual(defaultSettings());
    expect(cfg.columns.id).toEqual({ source: 'Name' });
    expect(cfg.input).toEqual({ path: path.join(dir, 'mine.csv'), format: 'csv' });
    // The schema line points at the package's schema from the config's folder.
    const schema = /^# yaml-language-server: \$schema=(.+)$/m.exec(text)![1]!;
    expect(existsSync(path.resolve(dir, schema))).toBe(true);
    expect(path.basename(schema)).toBe('census.config.schema.json');

    const d = await run(['derive', '-c', 'census.config.yaml', '--quiet']);
    expect(d.err).toBe('');
    expect(d.status).toBe(0);
    expect(existsSync('mine.census.parquet')).toBe(true);
  });

  it('writes into another folder with the catalog named relative to it', async () => {
    await mkdir('data');
    await mkdir('conf');
    await writeFile('data/mine.csv', CSV);
    const r = await run(['init', 'data/mine.csv', '-o', 'conf/census.config.yaml']);
    expect(r.status).toBe(0);
    const text = await readFile('conf/census.config.yaml', 'utf8');
    const doc = parse(text) as { input: { path: string }; output: string };
    expect(doc.input.path).toBe('../data/mine.csv');
    expect(doc.output).toBe('mine.census.parquet');
    const d = await run(['derive', '-c', 'conf/census.config.yaml', '--quiet']);
    expect(d.status).toBe(0);
    expect(existsSync('conf/mine.census.parquet')).toBe(true);
  });

  it('never replaces a file, even one it wrote', async () => {
    await writeFile('mine.csv', CSV);
    expect((await run(['init', 'mine.csv'])).status).toBe(0);
    await writeFile('census.config.yaml', '# edited by hand\n');
    const before = await stat('census.config.yaml');
    const r = await run(['init', 'mine.csv']);
    expect(r.status).toBe(64);
    expect(r.err).toBe('dawn-census: census.config.yaml exists; init never replaces a file: choose another name with -o\n');
    expect(await readFile('census.config.yaml', 'utf8')).toBe('# edited by hand\n');
    expect((await stat('census.config.yaml')).mtimeMs).toBe(before.mtimeMs);
    // A folder of that name is refused the same way.
    await mkdir('cfgdir');
    expect((await run(['init', '-o', 'cfgdir'])).status).toBe(64);
  });

  it('stops with one line and writes nothing when the catalog cannot be read or the folder is missing', async () => {
    const missing = await run(['init', 'nope.csv']);
    expect(missing.status).toBe(2);
    expect(missing.err.trim().split('\n')).toHaveLength(1);
    expect(missing.err).toContain('nope.csv');
    expect(existsSync('census.config.yaml')).toBe(false);
    const folder = await run(['init', '-o', 'no/such/census.config.yaml']);
    expect(folder.status).toBe(64);
    expect(folder.err).toContain('is not a folder');
  });

  it('writes a template without a catalog, which loads with the default settings', async () => {
    const r = await run(['init']);
    expect(r.status).toBe(0);
    expect(r.err).toContain('a template: set input.path and the columns');
    const cfg = parseConfig(await readFile('census.config.yaml', 'utf8'), path.join(dir, 'census.config.yaml'));
    expect(cfg.settings).toEqual(defaultSettings());
  });

  it('has its help, and refuses what it does not know', async () => {
    const h = await run(['init', '--help']);
    expect(h.status).toBe(0);
    expect(h.out).toBe(INIT_HELP);
    expect((await run(['init', '--draws', '5'])).status).toBe(64);
    expect((await run(['init', 'a.csv', 'b.csv'])).err).toContain('init takes one catalog');
    expect(parseInitArgs(['--output=x.yaml', 'c.fits'])).toEqual({ help: false, output: 'x.yaml', catalog: 'c.fits' });
    expect(() => parseInitArgs(['-o'])).toThrow('-o needs a value');
    expect((await run(['--help'])).out).toContain('dawn-census init [<catalog>] [-o <config>]');
  });
});
