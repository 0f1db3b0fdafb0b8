import { stat } from 'node:fs/promises';
import { CatalogError } from '../readers/CatalogError.ts';

/** What identifies the bytes of a file between two looks at it. */
export interface InputIdentity {
  dev: number;
  ino: number;
  size: number;
  mtimeNs: bigint;
  /** Status-change time: moved on by every write, and, unlike mtime, not settable by a program. */
  ctimeNs: bigint;
}

/** The identity of the file at `path` now; null when it cannot be read (the reader reports that). */
export async function inputIdentity(path: string): Promise<InputIdentity | null> {
  const s = await stat(path, { bigint: true }).catch(() => null);
  return s ? { dev: Number(s.dev), ino: Number(s.ino), size: Number(s.size), mtimeNs: s.mtimeNs, ctimeNs: s.ctimeNs } : null;
}

/**
 * Throws CatalogError when the catalog is no longer the file it was when the run began: another
 * file now at its path (inode or device differ), another size, or another modification or
 * status-change time (a write in place that kept size and modification time still moves the
 * status-change time on; so does a change of permissions, which is refused too, to be safe).
 * `label` names the catalog as the user wrote it. Used after the last chunk and after hashing,
 * so the rows derived and the SHA-256 recorded both come from the same bytes.
 */
export async function checkInputUnchanged(path: string, label: string, before: InputIdentity): Promise<void> {
  const now = await inputIdentity(path);
  const fail = (what: string): never => {
    throw new CatalogError(`${label}: the catalog changed while it was being read (${what}); nothing was written — derive again once it is complete`);
  };
  if (now === null) fail('it was removed');
  else if (now.dev !== before.dev || now.ino !== before.ino) fail('it was replaced by another file');
  else if (now.size !== before.size) fail(`its size went from ${before.size.toLocaleString('en-US')} to ${now.size.toLocaleString('en-US')} bytes`);
  else if (now.mtimeNs !== before.mtimeNs || now.ctimeNs !== before.ctimeNs) fail('it was written to');
}
