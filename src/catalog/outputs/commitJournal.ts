import { lstat, readFile, rename, rm } from 'node:fs/promises';
import path from 'node:path';
import type { OutputRole } from './toolSignature.ts';

/** Order in which new files are moved into place: the metadata sidecar last, as the set's manifest. */
export const PLACE_ORDER: readonly OutputRole[] = ['rejections', 'readings', 'catalog', 'meta'];

/** Name of each new file inside the temporary folder. */
export const STAGED_NAME: Record<OutputRole, string> = { catalog: 'catalog.parquet', meta: 'meta.json', rejections: 'rejections.csv', readings: 'readings.parquet' };

/** Name inside the temporary folder of the previous file of each role, moved aside while the new set goes in. */
export const PREVIOUS_NAME: Record<OutputRole, string> = {
  catalog: 'previous.catalog.parquet',
  meta: 'previous.meta.json',
  rejections: 'previous.rejections.csv',
  readings: 'previous.readings.parquet',
};

/** File in the temporary folder saying what a commit replaces (written before the first rename). */
export const JOURNAL_NAME = 'journal.json';
/** File in the temporary folder written once every new file is in place. */
export const DONE_NAME = 'committed';

/** What a commit is about to do, kept so that an interrupted commit can be undone. */
export interface CommitJournal {
  format: 'dawn-census-commit/1';
  /** Final path of each output. */
  finals: Record<OutputRole, string>;
  /** Whether each output existed before (and is moved aside to PREVIOUS_NAME). */
  hadPrevious: Record<OutputRole, boolean>;
  /**
   * Further files of the set (the ECSV, VOTable and FITS copies), placed before the roles above:
   * final path, whether it existed, and its staged and previous names inside the folder.
   */
  extras?: { final: string; hadPrevious: boolean; staged: string; previous: string }[];
}

/**
 * Undoes a commit that did not finish: each previous file moved aside goes back in place, and a
 * new file moved into a place that had none is removed. Safe to run at any point of the commit.
 */
export async function rollBack(folder: string, journal: CommitJournal): Promise<void> {
  for (const role of [...PLACE_ORDER].reverse()) {
    const final = journal.finals[role];
    // A journal written before the readings table existed names three roles.
    if (final === undefined) continue;
    const previous = path.join(folder, PREVIOUS_NAME[role]);
    if (await exists(previous)) await rename(previous, final);
    else if (!journal.hadPrevious[role] && !(await exists(path.join(folder, STAGED_NAME[role])))) await rm(final, { force: true });
  }
  for (const extra of [...(journal.extras ?? [])].reverse()) {
    const previous = path.join(folder, extra.previous);
    if (await exists(previous)) await rename(previous, extra.final);
    else if (!extra.hadPrevious && !(await exists(path.join(folder, extra.staged)))) await rm(extra.final, { force: true });
  }
}

/**
 * Reads the journal of a temporary folder; null when there is none (the commit had not begun)
 * or it is not one of ours or names files outside the folder's own folder (never acted on).
 */
export async function readJournal(folder: string): Promise<CommitJournal | null> {
  const text = await readFile(path.join(folder, JOURNAL_NAME), 'utf8').catch(() => null);
  if (text === null) return null;
  try {
    const j = JSON.parse(text) as CommitJournal;
    if (j.format !== 'dawn-census-commit/1') return null;
    const home = path.dirname(folder);
    for (const role of PLACE_ORDER) {
      if (role === 'readings' && j.finals[role] === undefined && j.hadPrevious[role] === undefined) continue;
      if (typeof j.finals[role] !== 'string' || path.dirname(j.finals[role]) !== home || typeof j.hadPrevious[role] !== 'boolean') return null;
    }
    for (const e of j.extras ?? []) {
      if (typeof e.final !== 'string' || path.dirname(e.final) !== home || typeof e.hadPrevious !== 'boolean') return null;
      if (!/^(staged|previous)\.extra-\d+$/.test(e.staged) || !/^(staged|previous)\.extra-\d+$/.test(e.previous)) return null;
    }
    return j;
  } catch {
    return null;
  }
}

async function exists(p: string): Promise<boolean> {
  return (await lstat(p).catch(() => null)) !== null;
}
