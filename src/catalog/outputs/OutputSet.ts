import { randomBytes } from 'node:crypto';
import { lstat, mkdir, rename, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { OutputPaths } from '../derive/outputPaths.ts';
import { DONE_NAME, JOURNAL_NAME, PLACE_ORDER, PREVIOUS_NAME, rollBack, STAGED_NAME } from './commitJournal.ts';
import type { CommitJournal } from './commitJournal.ts';
import type { OutputRole } from './toolSignature.ts';

/** Marks the temporary folders of a run: `<catalog file name>.tmp-dawn-census-<pid>-<6 hex>`. */
export const TEMP_FOLDER_TAG = '.tmp-dawn-census-';

/** Temporary folders of runs in this process that have not finished (recoverLeftovers skips them). */
export const ACTIVE_FOLDERS = new Set<string>();

/**
 * The three outputs of a run (Parquet, `.meta.json`, `.rejections.csv`), written into one
 * temporary folder beside them and committed as a set:
 * 1. a journal records which outputs exist already;
 * 2. those are moved aside into the folder;
 * 3. the new files are moved into place, the metadata sidecar (the set's manifest) last;
 * 4. a `committed` mark is written and the folder removed.
 * A failure in steps 1–3 moves the earlier files back, so a new Parquet never stands beside old
 * sidecars. If the process is killed meanwhile, the next run finds the folder and does the same
 * (see recoverLeftovers). All renames stay in one folder, so each is atomic.
 */
export class OutputSet {
  /** The temporary folder. */
  readonly folder: string;

  private constructor(
    readonly paths: OutputPaths,
    folder: string,
  ) {
    this.folder = folder;
  }

  /** Creates the temporary folder beside `paths.catalog` (and the output folder if needed). */
  static async create(paths: OutputPaths): Promise<OutputSet> {
    const home = path.dirname(path.resolve(paths.catalog));
    await mkdir(home, { recursive: true });
    const folder = path.join(home, `${path.basename(paths.catalog)}${TEMP_FOLDER_TAG}${process.pid}-${randomBytes(3).toString('hex')}`);
    await mkdir(folder);
    ACTIVE_FOLDERS.add(folder);
    return new OutputSet(paths, folder);
  }

  /** Where to write the new file of `role` before the commit. */
  staged(role: OutputRole): string {
    return path.join(this.folder, STAGED_NAME[role]);
  }

  private readonly extras: { final: string; staged: string; previous: string }[] = [];

  /**
   * Where to write a further file of the set (an ECSV, VOTable or FITS copy) that goes to `finalPath`
   * beside the outputs; it is committed with them, before the roles, and rolled back with them.
   */
  stagedExtra(finalPath: string): string {
    const i = this.extras.length;
    const e = { final: path.resolve(finalPath), staged: `staged.extra-${i}`, previous: `previous.extra-${i}` };
    this.extras.push(e);
    return path.join(this.folder, e.staged);
  }

  /** A scratch path inside the folder (removed with it). */
  scratch(name: string): string {
    return path.join(this.folder, `scratch-${name}`);
  }

  /** Moves the new set into place (see the class comment), then removes the folder. */
  async commit(): Promise<void> {
    const finals = {} as Record<OutputRole, string>;
    const hadPrevious = {} as Record<OutputRole, boolean>;
    for (const role of PLACE_ORDER) {
      finals[role] = path.resolve(this.paths[role]);
      hadPrevious[role] = (await lstat(finals[role]).catch(() => null)) !== null;
    }
    const extras = [];
    for (const e of this.extras) extras.push({ ...e, hadPrevious: (await lstat(e.final).catch(() => null)) !== null });
    const journal: CommitJournal = { format: 'dawn-census-commit/1', finals, hadPrevious, extras };
    const journalPath = path.join(this.folder, JOURNAL_NAME);
    await writeFile(`${journalPath}.part`, JSON.stringify(journal));
    await rename(`${journalPath}.part`, journalPath);
    try {
      for (const e of extras) if (e.hadPrevious) await rename(e.final, path.join(this.folder, e.previous));
      for (const e of extras) await rename(path.join(this.folder, e.staged), e.final);
      for (const role of PLACE_ORDER) if (hadPrevious[role]) await rename(finals[role], path.join(this.folder, PREVIOUS_NAME[role]));
      for (const role of PLACE_ORDER) await rename(this.staged(role), finals[role]);
      await writeFile(path.join(this.folder, DONE_NAME), '');
    } catch (error) {
      await rollBack(this.folder, journal).catch(() => undefined);
      throw error;
    }
    await this.discard();
  }

  /** Removes the folder and everything in it; never throws (it runs while another error is reported). */
  async discard(): Promise<void> {
    await rm(this.folder, { recursive: true, force: true }).catch(() => undefined);
    ACTIVE_FOLDERS.delete(this.folder);
  }
}
