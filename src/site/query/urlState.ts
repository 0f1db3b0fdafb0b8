/**
 * The workspace's query lives in the page URL as `?sql=…`, so a query can be shared as a
 * link. A page opened from such a link shows the query and runs it only when the reader asks.
 */

/** The SQL carried by a URL's search string, or null. */
export function sqlFromSearch(search: string): string | null {
  const v = new URLSearchParams(search).get('sql');
  return v !== null && v.trim() !== '' ? v : null;
}

/** `href` with its `sql` parameter set to `sql` (other parameters and the hash kept). */
export function hrefWithSql(href: string, sql: string): string {
  const u = new URL(href);
  u.searchParams.set('sql', sql);
  return u.href;
}
