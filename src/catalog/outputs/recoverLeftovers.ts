import { lstat, readdir, rm } from 'node:fs/promises';
import path from 'node:path';
import type { OutputPaths } from '../derive/outputPaths.ts';
import { DONE_NAME, JOURNAL_NAME, PREVIOUS_NAME, readJournal, rollBack, STAGED_NAME } from './commitJournal.ts';
import { ACTIVE_FOLDERS, TEMP_FOLDER_TAG } from './OutputSet.ts';

/** What recoverLeftovers found: one sentence per temporary folder it dealt with. */
export type LeftoverNotes = string[];

/** Names a temporary folder of ours may hold; a folder holding anything else is left alone. */
const KNOWN = new Set([
  ...Object.values(STAGED_NAME),
  ...Object.values(PREVIOUS_NAME),
  JOURNAL_NAME,
  `${JOURNAL_NAME}.part`,
  DONE_NAME,
]);

/**
 * Cleans up after runs for the same output that were killed (SIGKILL, power loss) and so could
 * not remove their temporary folder `<name>.tmp-dawn-census-<pid>-<hex>` beside it. A folder
 * whose process is still running is left alone. One killed mid-commit has its earlier outputs
 * put back (the set is then the earlier set, whole); otherwise the folder is just removed. Old
 * single temporary files `<output>.tmp-<pid>-<hex>` of earlier versions are removed too.
 */
export async function recoverLeftovers(paths: OutputPaths): Promise<LeftoverNotes> {
  const home = path.dirname(path.resolve(paths.catalog));
  const entries = await readdir(home).catch(() => [] as string[]);
  const notes: LeftoverNotes = [];
  const folderPattern = new RegExp(`^${escape(path.basename(paths.catalog))}${escape(TEMP_FOLDER_TAG)}(\\d+)-[0-9a-f]{6}$`);
  const oldPatterns = Object.values(paths).map((p) => new RegExp(`^${escape(path.basename(p))}\\.tmp-(\\d+)-[0-9a-f]{6}(?:\\.d)?$`));
  for (const name of entries) {
    const folder = path.join(home, name);
    const m = folderPattern.exec(name);
    if (m) {
      if (ACTIVE_FOLDERS.has(folder) || isRunning(Number(m[1]))) continue;
      const info = await lstat(folder).catch(() => null);
      if (!info?.isDirectory()) continue;
      const inside = await readdir(folder);
      if (!inside.every((f) => KNOWN.has(f) || f.startsWith('scratch-'))) continue;
      const journal = inside.includes(DONE_NAME) ? null : await readJournal(folder);
      if (journal) {
        await rollBack(folder, journal);
        notes.push(`put back the earlier outputs that a stopped run (process ${m[1]}) was replacing`);
      } else notes.push(`removed the temporary files of a stopped run (process ${m[1]})`);
      await rm(folder, { recursive: true, force: true });
      continue;
    }
    const old = oldPatterns.map((re) => re.exec(name)).find((x) => x !== null);
    if (old && !isRunning(Number(old[1]))) {
      await rm(folder, { recursive: true, force: true });
      notes.push(`removed the temporary file ${name} of a stopped run`);
    }
  }
  return notes;
}

/** Whether a process with this id exists (another run may be writing its temporary folder). */
function isRunning(pid: number): boolean {
  if (pid === process.pid) return false;
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM';
  }
}

function escape(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
