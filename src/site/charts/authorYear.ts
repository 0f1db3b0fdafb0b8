/**
 * The "Author & Author YYYY" / "Author et al. YYYY" part of a reference or label, for short
 * labels on charts: everything up to and including the first four-digit year. Returns the
 * input unchanged when it has no year.
 */
export function authorYear(reference: string): string {
  const m = /^(.*?\b(?:1[89]|20)\d\d[a-z]?)\b/.exec(reference);
  return m ? m[1]!.replace(/[,\s]+$/, '') : reference;
}
