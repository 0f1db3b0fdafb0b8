import type { Stats } from 'node:fs';
import { lstat, realpath, stat } from 'node:fs/promises';
import path from 'node:path';
import { displayPath } from '../config/loadConfig.ts';
import type { OutputPaths } from '../derive/outputPaths.ts';
import { OutputRefused } from './OutputRefused.ts';
import { isToolOutput } from './toolSignature.ts';
import type { OutputRole } from './toolSignature.ts';

/** Folders of the system's device, process and kernel files: never written into. */
const SYSTEM_FOLDERS = ['/dev', '/proc', '/sys'];

const ROLE_NAME: Record<OutputRole, string> = {
  catalog: 'output',
  meta: 'metadata sidecar',
  rejections: 'rejection report',
  readings: 'readings table',
};

/**
 * Checks, before anything is written, that the three outputs may be (re)placed:
 * - none is the input catalog, by real path or by device and inode (a hard or symbolic link to
 *   it counts as the input);
 * - none lies in /dev, /proc or /sys, or is a folder, FIFO, socket or device — refused even
 *   with `force`;
 * - an existing file is replaced only when this tool wrote it in the same role (see
 *   isToolOutput), unless `force`.
 * Throws OutputRefused with a one-line message naming the file; returns nothing when all is well.
 */
export async function checkOutputTargets(inputPath: string, paths: OutputPaths, force: boolean): Promise<void> {
  const input = await stat(inputPath).catch(() => null);
  const inputReal = await realpath(inputPath).catch(() => path.resolve(inputPath));
  for (const role of ['catalog', 'meta', 'rejections', 'readings'] as const) {
    const target = path.resolve(paths[role]);
    const what = role === 'catalog' ? `the output ${displayPath(target)}` : `the ${ROLE_NAME[role]} ${displayPath(target)} (beside the output)`;
    const real = await realTarget(target);
    const system = SYSTEM_FOLDERS.find((d) => real === d || real.startsWith(`${d}/`));
    if (system) throw new OutputRefused(`${what} is in the system folder ${system}; choose a file in your own folders with -o`);
    const link = await lstat(target).catch(() => null);
    const info = link?.isSymbolicLink() ? await stat(target).catch(() => null) : link;
    const sameAsInput = real === inputReal || (input !== null && info !== null && info.dev === input.dev && info.ino === input.ino);
    if (sameAsInput) throw new OutputRefused(`${what} is the catalog itself; choose another with -o`);
    if (link === null) continue;
    if (info === null) {
      if (!force) throw new OutputRefused(`${what} is a link to a missing file; remove it, choose another output with -o, or add --force to replace the link`);
      continue;
    }
    if (info.isDirectory()) {
      throw new OutputRefused(
        role === 'catalog'
          ? `the output ${displayPath(target)} is a folder; give a file name, e.g. ${displayPath(path.join(target, 'catalog.parquet'))}`
          : `${what} is a folder; choose another output with -o`,
      );
    }
    if (!info.isFile()) throw new OutputRefused(`${what} is ${specialKind(info)}, not a regular file; choose a file with -o`);
    if (!force && !(await isToolOutput(target, role))) {
      throw new OutputRefused(`${what} exists and was not written by dawn-census; choose another output with -o, or add --force to replace it`);
    }
  }
}

/** The real path of `target` when it exists, else of its nearest existing folder joined with the rest. */
async function realTarget(target: string): Promise<string> {
  let head = target;
  const rest: string[] = [];
  for (;;) {
    const real = await realpath(head).catch(() => null);
    if (real !== null) return path.join(real, ...rest);
    const parent = path.dirname(head);
    if (parent === head) return target;
    rest.unshift(path.basename(head));
    head = parent;
  }
}

function specialKind(s: Stats): string {
  if (s.isFIFO()) return 'a FIFO (named pipe)';
  if (s.isSocket()) return 'a socket';
  if (s.isCharacterDevice()) return 'a character device';
  if (s.isBlockDevice()) return 'a block device';
  return 'a special file';
}
