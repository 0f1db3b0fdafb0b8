import { execFile } from 'node:child_process';
import { existsSync } from 'node:fs';
import { writeFile } from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';

const BIN = fileURLToPath(new URL('../../../bin/dawn-census.js', import.meta.url));
const run = promisify(execFile);

/** A small invented catalog: one full Hα object, one with a flux limit, one without lines, one passthrough column. */
export const TINY_CSV =
  'id,z,fwhm_halpha,fwhm_halpha_err,lum_halpha,lum_halpha_err,log_mstar,log_mstar_err,note\n' +
  'T-1,5.5,2100,200,4.6e42,0.5e42,9.5,0.2,"first, with a comma"\n' +
  'T-2,6.5,1200,150,2.3e42,0.3e42,,,\n' +
  'T-3,5.0,,,,,,,"<b>&</b>"\n';

/** Writes TINY_CSV (and `config`, if given) into `dir` and runs `dawn-census derive` there with `args`. */
export async function deriveTiny(dir: string, args: string[] = [], config?: string): Promise<{ parquet: string; stderr: string }> {
  const input = path.join(dir, 'tiny.csv');
  await writeFile(input, TINY_CSV);
  const extra: string[] = [];
  if (config !== undefined) {
    await writeFile(path.join(dir, 'census.config.yaml'), config);
    extra.push('-c', path.join(dir, 'census.config.yaml'));
  }
  const { stderr } = await run(process.execPath, [BIN, 'derive', input, ...extra, '--draws', '100', '--threads', '1', '--quiet', ...args], { cwd: dir });
  return { parquet: path.join(dir, 'tiny.census.parquet'), stderr };
}

/** Runs the astropy reader script on `file` in `mode` and returns its JSON. */
export async function readWithAstropy(mode: 'ecsv' | 'votable' | 'fits' | 'parquet-keys' | 'parquet', file: string, python = '/usr/bin/python3'): Promise<any> {
  const script = fileURLToPath(new URL('./readWithAstropy.py', import.meta.url));
  const { stdout } = await run(python, [script, mode, file], { maxBuffer: 64 * 1024 * 1024 });
  return JSON.parse(stdout);
}

/**
 * A Python with astropy and pyarrow, for the tests that read our Parquet files with
 * `astropy.table.Table.read` itself: `$DAWN_CENSUS_PYARROW_PYTHON`, else `.venv-pyarrow/bin/python`
 * in the repository (made by .ci/run from the pyarrow wheel when the machine has one), else null
 * (Debian packages no pyarrow; those tests are then skipped and say so).
 */
export function pyarrowPython(): string | null {
  const fromEnv = process.env.DAWN_CENSUS_PYARROW_PYTHON;
  if (fromEnv) return fromEnv;
  const venv = fileURLToPath(new URL('../../../.venv-pyarrow/bin/python', import.meta.url));
  return existsSync(venv) ? venv : null;
}
