import { randomBytes } from 'node:crypto';
import { rename, rm } from 'node:fs/promises';

/**
 * The population step's outputs: a set of output files written under temporary names and renamed into place together only
 * when everything succeeded, so that an earlier good output is never replaced by a broken
 * one. Temporary names are `<final>.tmp-<pid>-<random>`, beside the final file (same file
 * system, so the rename is atomic); `.gitignore` ignores `*.tmp-*`.
 */
export class StagedFiles {
  private readonly staged: { temp: string; final: string }[] = [];
  private readonly scratch: string[] = [];
  private readonly tag = `${process.pid}-${randomBytes(3).toString('hex')}`;

  /** Returns the temporary path to write `finalPath` to; `commit` renames it into place. */
  stage(finalPath: string): string {
    const temp = `${finalPath}.tmp-${this.tag}`;
    this.staged.push({ temp, final: finalPath });
    return temp;
  }

  /** Returns a temporary path derived from `basePath` that is removed (never renamed) by `commit` and `discard`. */
  scratchPath(basePath: string, suffix = ''): string {
    const temp = `${basePath}.tmp-${this.tag}${suffix}`;
    this.scratch.push(temp);
    return temp;
  }

  /** Renames every staged file into place, in the order staged, then removes scratch files. */
  async commit(): Promise<void> {
    for (const { temp, final } of this.staged) await rename(temp, final);
    this.staged.length = 0;
    await this.removeScratch();
  }

  /** Removes every temporary file; never throws (it runs while another error is being reported). */
  async discard(): Promise<void> {
    for (const { temp } of this.staged) await rm(temp, { force: true }).catch(() => undefined);
    this.staged.length = 0;
    await this.removeScratch();
  }

  private async removeScratch(): Promise<void> {
    for (const temp of this.scratch) await rm(temp, { force: true, recursive: true }).catch(() => undefined);
    this.scratch.length = 0;
  }
}
