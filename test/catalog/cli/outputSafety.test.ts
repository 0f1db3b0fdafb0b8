// The output and run-safety rules of `dawn-census derive`, through the real CLI entry (main):
// each refusal gives one exact line and leaves every file as it was.
import { execFileSync } from 'node:child_process';
import { appendFileSync, readFileSync, statSync, utimesSync, writeFileSync } from 'node:fs';
import { link, mkdir, mkdtemp, readdir, readFile, rm, symlink, writeFile } from 'node:fs/promises';
import { availableParallelism, tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { main } from '../../../src/catalog/cli/main.ts';
import type { MainOptions } from '../../../src/catalog/cli/main.ts';

const STAND_IN = new URL('../derive/standIns/deriveObjectStandIn.ts', import.meta.url).href;
const MISBEHAVING = new URL('../derive/standIns/misbehavingDeriveModule.ts', import.meta.url).href;

async function run(argv: string[], options: MainOptions = {}, onErr?: (text: string) => void) {
  const out: string[] = [];
  const err: string[] = [];
  const io = {
    stdout: { write: (s: string) => out.push(s) },
    stderr: {
      isTTY: false,
      write: (s: string) => {
        err.push(s);
        onErr?.(s);
      },
    },
  };
  const status = await main(['derive', ...argv], io, { deriveModule: STAND_IN, ...options });
  return { status, out: out.join(''), err: err.join('') };
}

let dir: string;
let cwd: string;
beforeEach(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-safety-'));
  cwd = process.cwd();
  process.chdir(dir);
});
afterEach(async () => {
  process.chdir(cwd);
  await rm(dir, { recursive: true, force: true });
});

const CSV = 'id,z,fwhm_halpha\nA,5,2000\nB,6,1000\nC,7,1500\n';
const OUTS = ['cat.census.meta.json', 'cat.census.parquet', 'cat.census.readings.parquet', 'cat.census.rejections.csv'];

/** Every file of the folder with its bytes, to show that nothing changed. */
async function snapshot(folder = '.'): Promise<Record<string, string>> {
  const files: Record<string, string> = {};
  for (const f of (await readdir(folder)).sort()) files[f] = (await readFile(path.join(folder, f)).catch(() => Buffer.from('<not a file>'))).toString('base64');
  return files;
}

function manyRows(n: number): string {
  const lines = ['id,z,fwhm_halpha'];
  for (let i = 0; i < n; i++) lines.push(`R-${String(i).padStart(6, '0')},${(4 + (i % 60) / 10).toFixed(1)},${1000 + (i % 90) * 30}`);
  return `${lines.join('\n')}\n`;
}

describe('outputs never overwrite the input or a file dawn-census did not write', () => {
  it('refuses an output that exists and was not written by dawn-census, and replaces it with --force', async () => {
    await writeFile('cat.csv', CSV);
    await writeFile('notes.parquet', 'my own notes');
    const before = await snapshot();
    const r = await run(['cat.csv', '-o', 'notes.parquet', '--threads', '1']);
    expect(r).toEqual({ status: 64, out: '', err: 'dawn-census: the output notes.parquet exists and was not written by dawn-census; choose another output with -o, or add --force to replace it\n' });
    expect(await snapshot()).toEqual(before);
    const forced = await run(['cat.csv', '-o', 'notes.parquet', '--threads', '1', '--force', '--quiet']);
    expect(forced.status).toBe(0);
    expect(readFileSync('notes.parquet').subarray(0, 4).toString()).toBe('PAR1');
  });

  it('refuses a sidecar path holding a file dawn-census did not write, naming the sidecar', async () => {
    await writeFile('cat.csv', CSV);
    await writeFile('cat.census.rejections.csv', 'my,own,table\n');
    const before = await snapshot();
    const r = await run(['cat.csv', '--threads', '1']);
    expect(r).toEqual({
      status: 64,
      out: '',
      err: 'dawn-census: the rejection report cat.census.rejections.csv (beside the output) exists and was not written by dawn-census; choose another output with -o, or add --force to replace it\n',
    });
    expect(await snapshot()).toEqual(before);
  });

  it('replaces its own earlier outputs without --force', async () => {
    await writeFile('cat.csv', CSV);
    expect((await run(['cat.csv', '--threads', '1', '--quiet'])).status).toBe(0);
    await writeFile('cat.csv', CSV.replace('C,7,1500\n', 'C,7,1500\nD,8,900\n'));
    const again = await run(['cat.csv', '--threads', '1']);
    expect(again.status, again.err).toBe(0);
    expect(again.err).toContain('Read 4 rows from cat.csv\n');
    expect(JSON.parse(await readFile('cat.census.meta.json', 'utf8')).counts.rows).toBe(4);
    expect((await readdir('.')).sort()).toEqual([...OUTS, 'cat.csv']);
  });

  it('refuses an output that is the catalog itself, by name, through a hard link or through a symbolic link, even with --force', async () => {
    await writeFile('cat.csv', CSV);
    const same = await run(['cat.csv', '-o', 'cat.csv', '--force']);
    expect(same).toEqual({ status: 64, out: '', err: 'dawn-census: the output cat.csv is the catalog itself; choose another with -o\n' });
    await link('cat.csv', 'cat.census.meta.json');
    const before = await snapshot();
    const hard = await run(['cat.csv', '--force']);
    expect(hard).toEqual({ status: 64, out: '', err: 'dawn-census: the metadata sidecar cat.census.meta.json (beside the output) is the catalog itself; choose another with -o\n' });
    await rm('cat.census.meta.json');
    await symlink(path.join(dir, 'cat.csv'), 'out.rejections.csv');
    const soft = await run(['cat.csv', '-o', 'out.parquet', '--force']);
    expect(soft).toEqual({ status: 64, out: '', err: 'dawn-census: the rejection report out.rejections.csv (beside the output) is the catalog itself; choose another with -o\n' });
    expect(readFileSync('cat.csv', 'utf8')).toBe(CSV);
    expect(Object.keys(await snapshot()).sort()).toEqual(['cat.csv', 'out.rejections.csv']);
    expect(before['cat.csv']).toBe(Buffer.from(CSV).toString('base64'));
  });

  it('refuses /dev, /proc and special files such as a FIFO, even with --force', async () => {
    await writeFile('cat.csv', CSV);
    const devNull = await run(['cat.csv', '-o', '/dev/null', '--force']);
    expect(devNull).toEqual({ status: 64, out: '', err: 'dawn-census: the output /dev/null is in the system folder /dev; choose a file in your own folders with -o\n' });
    const proc = await run(['cat.csv', '-o', '/proc/self/x.parquet', '--force']);
    expect(proc).toEqual({ status: 64, out: '', err: 'dawn-census: the output /proc/self/x.parquet is in the system folder /proc; choose a file in your own folders with -o\n' });
    execFileSync('mkfifo', ['pipe.parquet']);
    const fifo = await run(['cat.csv', '-o', 'pipe.parquet', '--force']);
    expect(fifo).toEqual({ status: 64, out: '', err: 'dawn-census: the output pipe.parquet is a FIFO (named pipe), not a regular file; choose a file with -o\n' });
    await symlink('/dev/null', 'null.parquet');
    const linked = await run(['cat.csv', '-o', 'null.parquet', '--force']);
    expect(linked).toEqual({ status: 64, out: '', err: 'dawn-census: the output null.parquet is in the system folder /dev; choose a file in your own folders with -o\n' });
    expect((await readdir('.')).sort()).toEqual(['cat.csv', 'null.parquet', 'pipe.parquet']);
    expect(statSync('pipe.parquet').isFIFO()).toBe(true);
  });

  it('refuses an ECSV, VOTable or FITS copy path holding a file dawn-census did not write, and replaces it with --force', async () => {
    await writeFile('cat.csv', CSV);
    for (const [format, name] of [['ecsv', 'cat.census.ecsv'], ['votable', 'cat.census.vot'], ['fits', 'cat.census.fits']] as const) {
      await writeFile(name, 'my own table\n');
      const before = await snapshot();
      const r = await run(['cat.csv', '--threads', '1', '--format', format]);
      const what = { ecsv: 'ECSV copy', votable: 'VOTable copy', fits: 'FITS copy' }[format];
      expect(r).toEqual({ status: 64, out: '', err: `dawn-census: the ${what} ${name} (beside the output) exists and was not written by dawn-census; choose another output with -o, or add --force to replace it\n` });
      expect(await snapshot()).toEqual(before);
      await rm(name);
    }
    await writeFile('cat.census.ecsv', 'my own table\n');
    const forced = await run(['cat.csv', '--threads', '1', '--format', 'ecsv', '--force', '--quiet']);
    expect(forced.status, forced.err).toBe(0);
    expect(readFileSync('cat.census.ecsv', 'utf8').startsWith('# %ECSV 1.0')).toBe(true);
  });

  it('replaces its own earlier ECSV, VOTable and FITS copies without --force', async () => {
    await writeFile('cat.csv', CSV);
    const args = ['cat.csv', '--threads', '1', '--quiet', '--format', 'ecsv', '--format', 'votable', '--format', 'fits'];
    expect((await run(args)).status).toBe(0);
    await writeFile('cat.csv', CSV.replace('C,7,1500\n', 'C,7,1500\nD,8,900\n'));
    const again = await run(args);
    expect(again.status, again.err).toBe(0);
    expect(readFileSync('cat.census.ecsv', 'utf8')).toContain('\nD,');
    expect((await readdir('.')).sort()).toEqual([...OUTS, 'cat.census.ecsv', 'cat.census.fits', 'cat.census.vot', 'cat.csv'].sort());
  });

  it('refuses an extra copy that is the catalog itself or a FIFO, even with --force', async () => {
    await writeFile('cat.csv', CSV);
    expect((await run(['cat.csv', '--threads', '1', '--quiet', '--format', 'ecsv', '-o', 'first.parquet'])).status).toBe(0);
    const before = await snapshot();
    // the ECSV copy of out.parquet would be out.ecsv: here a hard link to the catalog being read
    await link('first.ecsv', 'out.ecsv');
    const same = await run(['first.ecsv', '-o', 'out.parquet', '--format', 'ecsv', '--force']);
    expect(same).toEqual({ status: 64, out: '', err: 'dawn-census: the ECSV copy out.ecsv (beside the output) is the catalog itself; choose another with -o\n' });
    await rm('out.ecsv');
    expect(await snapshot()).toEqual(before);
    execFileSync('mkfifo', ['out.vot']);
    const fifo = await run(['cat.csv', '-o', 'out.parquet', '--format', 'votable', '--force']);
    expect(fifo).toEqual({ status: 64, out: '', err: 'dawn-census: the VOTable copy out.vot (beside the output) is a FIFO (named pipe), not a regular file; choose a file with -o\n' });
    expect(statSync('out.vot').isFIFO()).toBe(true);
  });

  it("refuses a config's output outside the config's folder unless --force", async () => {
    await mkdir('cfg');
    await writeFile('cfg/cat.csv', CSV);
    await writeFile('cfg/census.yaml', 'input: { path: cat.csv }\noutput: ../elsewhere/out.parquet\ndraws: 10\n');
    const r = await run(['-c', 'cfg/census.yaml', '--threads', '1']);
    expect(r).toEqual({
      status: 64,
      out: '',
      err: "dawn-census: cfg/census.yaml sets output to elsewhere/out.parquet, outside the config's folder; add --force to write there, or choose the output with -o\n",
    });
    expect((await readdir('.')).sort()).toEqual(['cfg']);
    const forced = await run(['-c', 'cfg/census.yaml', '--threads', '1', '--force', '--quiet']);
    expect(forced.status, forced.err).toBe(0);
    expect((await readdir('elsewhere')).sort()).toEqual(['out.meta.json', 'out.parquet', 'out.readings.parquet', 'out.rejections.csv']);
  });
});

describe('the run itself', () => {
  it('refuses more threads than cores unless --force', async () => {
    await writeFile('cat.csv', CSV);
    const cores = availableParallelism();
    const r = await run(['cat.csv', '--threads', String(cores + 1)]);
    expect(r).toEqual({ status: 64, out: '', err: `dawn-census: --threads ${cores + 1} is more than the ${cores} ${cores === 1 ? 'core' : 'cores'} of this machine; add --force to run that many anyway\n` });
    expect(await readdir('.')).toEqual(['cat.csv']);
    const forced = await run(['cat.csv', '--threads', String(cores + 1), '--force', '--quiet']);
    expect(forced.status, forced.err).toBe(0);
  });

  it('ends with a one-line message, writing nothing, when a worker stalls in the middle of a batch', async () => {
    await writeFile('cat.csv', CSV.replace('B,6,1000', 'STALL,6,1000'));
    const r = await run(['cat.csv', '--threads', '2', '--quiet'], { deriveModule: MISBEHAVING, batchTimeoutMs: 1500 });
    expect(r).toEqual({ status: 1, out: '', err: 'dawn-census: a derive worker stopped answering: no result for a batch of 3 objects after 1.5 s; the run was stopped\n' });
    expect(await readdir('.')).toEqual(['cat.csv']);
  });

  it('ends with a one-line message, writing nothing, when a worker exits in the middle of a batch', async () => {
    await writeFile('cat.csv', CSV.replace('B,6,1000', 'EXIT,6,1000'));
    const r = await run(['cat.csv', '--threads', '2', '--quiet'], { deriveModule: MISBEHAVING });
    expect(r).toEqual({ status: 1, out: '', err: 'dawn-census: a derive worker exited (code 0) in the middle of a batch; the run was stopped\n' });
    expect(await readdir('.')).toEqual(['cat.csv']);
  });

  it('shows control characters of catalog values as escapes on the terminal', async () => {
    await writeFile('cat.csv', 'id,z,fwhm_halpha\n"X\u001b]0;owned\u0007",5,-3\n"Y\u001b[2J\nZ",5,-3\n"Y\u001b[2J\nZ",6,100\n');
    const r = await run(['cat.csv', '--threads', '1']);
    expect(r.status, r.err).toBe(2);
    expect(r.err).toBe(
      'cat.csv: row 1 (id X\\x1B]0;owned\\x07): fwhm_halpha = -3 km/s: must be positive\n' +
        'cat.csv: row 2 (id Y\\x1B[2J\\x0AZ): fwhm_halpha = -3 km/s: must be positive\n' +
        // CatalogError itself turns a line break into a blank (its one-line rule).
        'cat.csv: duplicate id "Y\\x1B[2J Z" at rows 2 and 3\n',
    );
    expect(r.err).not.toContain('\u001b');
    const usage = await run(['a\u001b[31m.csv', 'b\u202e.csv']);
    expect(usage).toEqual({ status: 64, out: '', err: 'dawn-census: more than one catalog given ("a\\x1B[31m.csv" and "b\\u202E.csv"); derive reads one catalog\n' });
  });
});

describe('a catalog that changes during the run', () => {
  it('stops with exit status 2 and writes nothing when the catalog grows while it is read', async () => {
    await writeFile('big.csv', manyRows(20000));
    const size = statSync('big.csv').size;
    let touched = false;
    const r = await run(['big.csv', '--threads', '1', '--draws', '20'], { chunkRows: 500 }, (text) => {
      if (!touched && text.startsWith('derive: 10%')) {
        touched = true;
        appendFileSync('big.csv', 'LATE,5,2000\n');
      }
    });
    const n = (x: number): string => x.toLocaleString('en-US');
    expect(touched).toBe(true);
    expect(r.status, r.err).toBe(2);
    expect(r.err.split('\n').at(-2), r.err).toBe(`big.csv: the catalog changed while it was being read (its size went from ${n(size)} to ${n(size + 12)} bytes); nothing was written — derive again once it is complete`);
    expect(await readdir('.')).toEqual(['big.csv']);
  });

  it('stops with exit status 2 when the catalog is rewritten in place, even with the same size and modification time', async () => {
    await writeFile('big.csv', manyRows(20000));
    // A whole-second modification time, so that it can be put back exactly.
    utimesSync('big.csv', 1_700_000_000, 1_700_000_000);
    let touched = false;
    const r = await run(['big.csv', '--threads', '1', '--draws', '20'], { chunkRows: 500 }, (text) => {
      if (!touched && text.startsWith('derive: 10%')) {
        touched = true;
        // The last row becomes two, in the same number of bytes, written in place.
        const text = readFileSync('big.csv', 'utf8');
        const last = text.slice(text.lastIndexOf('\n', text.length - 2) + 1);
        const first = 'R-019999,5\n';
        const second = `Q,5,${'1'.repeat(last.length - first.length - 5)}\n`;
        writeFileSync('big.csv', `${text.slice(0, -last.length)}${first}${second}`);
        utimesSync('big.csv', 1_700_000_000, 1_700_000_000);
      }
    });
    expect(touched).toBe(true);
    expect(r.status, r.err).toBe(2);
    expect(r.err.split('\n').at(-2)).toBe(
      'big.csv: the catalog changed while it was being read (it was written to); nothing was written — derive again once it is complete',
    );
    expect(await readdir('.')).toEqual(['big.csv']);
  });
});

describe('leftovers of a killed run', () => {
  it('removes the temporary folder of a run that was killed and says so', async () => {
    await writeFile('cat.csv', CSV);
    // A process id that no longer runs: a child that has exited.
    const deadPid = Number(execFileSync(process.execPath, ['-e', 'process.stdout.write(String(process.pid))']).toString());
    const leftover = `cat.census.parquet.tmp-dawn-census-${deadPid}-abc123`;
    await mkdir(leftover);
    await writeFile(path.join(leftover, 'catalog.parquet'), 'half written');
    const r = await run(['cat.csv', '--threads', '1']);
    expect(r.status, r.err).toBe(0);
    expect(r.err.split('\n')[0]).toBe(`dawn-census: removed the temporary files of a stopped run (process ${deadPid})`);
    expect((await readdir('.')).sort()).toEqual([...OUTS, 'cat.csv']);
  });
});
