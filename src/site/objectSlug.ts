/**
 * The URL path segment of an object's page. Catalog ids are arbitrary text (spaces, slashes,
 * quotes, non-Latin letters, even markup), so the slug keeps only [A-Za-z0-9._-] and, when
 * anything had to be replaced, appends a short hash of the full id so that distinct ids
 * never share a page. Pure: used at build time (page paths) and in the browser (links).
 */
export function objectSlug(id: string): string {
  const safe = id.replace(/[^A-Za-z0-9._-]+/g, '_').replace(/^[._]+|[._]+$/g, '').slice(0, 80);
  if (safe === id && safe.length > 0) return safe;
  return `${safe || 'object'}-${fnv1a32(id).toString(16).padStart(8, '0')}`;
}

/** 32-bit FNV-1a over the UTF-16 code units of `s` (Fowler–Noll–Vo, public domain). */
function fnv1a32(s: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < s.length; i++) {
    h ^= s.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return h >>> 0;
}
