import type { Stats } from 'node:fs';
import { lstat, realpath, stat } from 'node:fs/promises';
import path from 'node:path';
import { OutputRefused } from './OutputRefused.ts';

/** Folders of the system's device, process and kernel files: never written into. */
const SYSTEM_FOLDERS = ['/dev', '/proc', '/sys'];

/** The input a run reads, which no output may replace. */
export interface RunInput {
  /** Its stat (device and inode), or null when it cannot be read. */
  stat: Stats | null;
  /** Its real path. */
  real: string;
}

/** The input at `inputPath`, as {@link checkTarget} compares outputs with it. */
export async function runInput(inputPath: string): Promise<RunInput> {
  return {
    stat: await stat(inputPath).catch(() => null),
    real: await realpath(inputPath).catch(() => path.resolve(inputPath)),
  };
}

/** How one output target is checked. */
export interface TargetRule {
  /** The file as named in messages, e.g. "the output cat.parquet". */
  what: string;
  /** Whether the existing regular file was written by this tool in this role. */
  isOurs: (file: string) => Promise<boolean>;
  /** Replace a file this tool did not write (and a dangling link). */
  force: boolean;
  /** The message for a folder at the target (default: choose another output with -o). */
  folderMessage?: string;
  /** What to do about a file that may be replaced with --force (default "choose another output with -o"). */
  remedy?: string;
  /** What to do about a target never written, even with --force: the input, a system or special file (default: choose with -o). */
  elsewhere?: string;
}

/**
 * Checks, before anything is written, that the file `target` may be (re)placed:
 * - it is not the input, by real path or by device and inode (a hard or symbolic link to it
 *   counts as the input);
 * - it does not lie in /dev, /proc or /sys, and is not a folder, FIFO, socket or device —
 *   refused even with `force`;
 * - an existing file is replaced only when `rule.isOurs` says this tool wrote it, unless `force`.
 * Throws OutputRefused with a one-line message naming the file.
 */
export async function checkTarget(target: string, input: RunInput | null, rule: TargetRule): Promise<void> {
  const file = path.resolve(target);
  const what = rule.what;
  const remedy = rule.remedy ?? 'choose another output with -o';
  const real = await realTarget(file);
  const system = SYSTEM_FOLDERS.find((d) => real === d || real.startsWith(`${d}/`));
  if (system) throw new OutputRefused(`${what} is in the system folder ${system}; ${rule.elsewhere ?? 'choose a file in your own folders with -o'}`);
  const link = await lstat(file).catch(() => null);
  const info = link?.isSymbolicLink() ? await stat(file).catch(() => null) : link;
  const sameAsInput = input !== null && (real === input.real || (input.stat !== null && info !== null && info.dev === input.stat.dev && info.ino === input.stat.ino));
  if (sameAsInput) throw new OutputRefused(`${what} is the catalog itself; ${rule.elsewhere ?? 'choose another with -o'}`);
  if (link === null) return;
  if (info === null) {
    if (!rule.force) throw new OutputRefused(`${what} is a link to a missing file; remove it, ${remedy}, or add --force to replace the link`);
    return;
  }
  if (info.isDirectory()) throw new OutputRefused(rule.folderMessage ?? `${what} is a folder; ${remedy}`);
  if (!info.isFile()) throw new OutputRefused(`${what} is ${specialKind(info)}, not a regular file; ${rule.elsewhere ?? 'choose a file with -o'}`);
  if (!rule.force && !(await rule.isOurs(file))) {
    throw new OutputRefused(`${what} exists and was not written by dawn-census; ${remedy}, or add --force to replace it`);
  }
}

/** The real path of `target` when it exists, else of its nearest existing folder joined with the rest. */
export async function realTarget(target: string): Promise<string> {
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
