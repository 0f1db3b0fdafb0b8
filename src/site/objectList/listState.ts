/**
 * The object list's state in the page URL (?q=…&flag=…&sort=…&desc=1&page=3, page counted
 * from 1 for the reader), so a search, filter or sort can be shared as a link.
 */
import { DEFAULT_STATE, type ListState } from './listQuery.ts';

/** The state carried by a URL's search string (defaults for anything absent or malformed). */
export function listStateFromSearch(search: string): ListState {
  const p = new URLSearchParams(search);
  const page = Number.parseInt(p.get('page') ?? '', 10);
  return {
    q: p.get('q') ?? DEFAULT_STATE.q,
    flag: p.get('flag') ?? DEFAULT_STATE.flag,
    sort: p.get('sort') || DEFAULT_STATE.sort,
    desc: p.get('desc') === '1',
    page: Number.isFinite(page) && page >= 1 ? page - 1 : 0,
  };
}

/** The search string for `state`, leaving out what equals the default ('' for the default state). */
export function listStateSearch(state: ListState): string {
  const p = new URLSearchParams();
  if (state.q) p.set('q', state.q);
  if (state.flag) p.set('flag', state.flag);
  if (state.sort !== DEFAULT_STATE.sort) p.set('sort', state.sort);
  if (state.desc) p.set('desc', '1');
  if (state.page > 0) p.set('page', String(state.page + 1));
  const s = p.toString();
  return s ? `?${s}` : '';
}
