import { randomBytes } from 'node:crypto';
import { lstat, readdir, rename, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { realTarget } from './checkTarget.ts';
import { OutputRefused } from './OutputRefused.ts';

/**
 * The folder `site build` writes. A site build replaces its whole output folder, so the folder
 * must be the tool's own: new, empty, or a site this tool built before (it holds the marker file
 * below). Anything else is refused before the build, whatever it holds (a config, a catalog, a
 * thesis): without this, `--out .` emptied the folder it was run in. The site is built into a
 * staging folder beside it and moved into place only when the build succeeds, so a failed build
 * leaves the earlier site (or nothing) as it was.
 */

/** File a finished site build leaves in its folder, naming the tool: a later build may replace the folder. */
export const SITE_MARKER = '.dawn-census-site.json';

const exists = (p: string): Promise<boolean> =>
  lstat(p).then(
    () => true,
    () => false,
  );

/** True when `inner` is `outer` or lies inside it. */
function within(inner: string, outer: string): boolean {
  const rel = path.relative(outer, inner);
  return rel === '' || (!rel.startsWith('..') && !path.isAbsolute(rel));
}

/**
 * Refuses `out` as a site folder unless it is new, an empty folder, or a folder holding
 * {@link SITE_MARKER}; and in every case when it is or contains one of `keep` (the config, the
 * catalog, its input). Throws OutputRefused (exit 64) with one line naming the folder.
 */
export async function checkSiteOut(out: string, keep: readonly string[], shown: string): Promise<void> {
  const real = await realTarget(path.resolve(out));
  for (const k of keep) {
    if (within(await realTarget(path.resolve(k)), real)) throw new OutputRefused(`--out ${shown} holds ${path.basename(k)}, and a site build replaces its whole folder: choose a new folder for the site`);
  }
  let st;
  try {
    st = await lstat(real);
  } catch {
    return; // new
  }
  if (!st.isDirectory()) throw new OutputRefused(`--out ${shown} is not a folder: choose a new folder for the site`);
  const names = await readdir(real);
  if (names.length === 0 || names.includes(SITE_MARKER)) return;
  const some = names.slice(0, 3).join(', ') + (names.length > 3 ? ', …' : '');
  throw new OutputRefused(`--out ${shown} holds files dawn-census did not build (${some}), and a site build replaces its whole folder: choose a new or empty folder`);
}

/** A fresh staging folder's path beside `out` (not created). */
export function siteStaging(out: string): string {
  return `${out}.tmp-dawn-census-${process.pid}-${randomBytes(4).toString('hex')}`;
}

/**
 * Puts a finished build in place: writes the marker into `staging`, then replaces `out` (checked
 * by {@link checkSiteOut}) by it. The earlier folder is moved aside first and removed only once
 * the new one is in place; if the move fails it is put back.
 */
export async function commitSite(staging: string, out: string, about: Record<string, unknown>): Promise<void> {
  await writeFile(path.join(staging, SITE_MARKER), `${JSON.stringify({ tool: 'dawn-census', ...about }, null, 2)}\n`);
  if (!(await exists(out))) {
    await rename(staging, out);
    return;
  }
  const aside = `${out}.old-dawn-census-${process.pid}-${randomBytes(4).toString('hex')}`;
  await rename(out, aside);
  try {
    await rename(staging, out);
  } catch (error) {
    await rename(aside, out);
    throw error;
  }
  await rm(aside, { recursive: true, force: true });
}
