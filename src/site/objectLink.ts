/**
 * Where an object's page is. Catalogs up to OBJECT_PAGE_LIMIT objects get one static page per
 * object (`object/<slug>/`); larger ones (benchmarks, big surveys) get one viewer page that
 * reads the object from the catalog in the browser (`object/?id=<id>`), so the build stays
 * small. The build chooses (see objectPagesMode) and writes its choice on <body>.
 */
import { objectSlug } from './objectSlug.ts';

export type ObjectPagesMode = 'static' | 'viewer';

/** Above this many objects the build makes the viewer page instead of one page per object. */
export const OBJECT_PAGE_LIMIT = 20_000;

/** The mode for a catalog of `rows` objects; CENSUS_OBJECT_PAGES=static|viewer overrides. */
export function objectPagesMode(rows: number, override?: string): ObjectPagesMode {
  if (override === 'static' || override === 'viewer') return override;
  if (override) throw new Error(`CENSUS_OBJECT_PAGES must be "static" or "viewer", not "${override}".`);
  return rows <= OBJECT_PAGE_LIMIT ? 'static' : 'viewer';
}

/** The page of object `id` under the site base `base` (which ends in '/'). */
export function objectHref(base: string, id: string, mode: ObjectPagesMode = 'static'): string {
  return mode === 'static' ? `${base}object/${objectSlug(id)}/` : `${base}object/?id=${encodeURIComponent(id)}`;
}

/** In the browser: the page of object `id`, as the build laid the site out. */
export function objectHrefHere(id: string): string {
  const body = document.body.dataset;
  return objectHref(body.base ?? '/', id, body.objectPages === 'viewer' ? 'viewer' : 'static');
}
