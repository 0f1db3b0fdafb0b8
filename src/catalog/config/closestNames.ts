/**
 * Edit distance (Levenshtein: insertions, deletions, substitutions each cost 1) between two
 * strings, compared case-insensitively. Used only for "did you mean" hints, so short inputs.
 */
export function editDistance(a: string, b: string): number {
  const s = a.toLowerCase();
  const t = b.toLowerCase();
  let prev = new Array<number>(t.length + 1);
  let cur = new Array<number>(t.length + 1);
  for (let j = 0; j <= t.length; j++) prev[j] = j;
  for (let i = 1; i <= s.length; i++) {
    cur[0] = i;
    for (let j = 1; j <= t.length; j++) {
      const sub = (prev[j - 1] as number) + (s[i - 1] === t[j - 1] ? 0 : 1);
      cur[j] = Math.min(sub, (prev[j] as number) + 1, (cur[j - 1] as number) + 1);
    }
    [prev, cur] = [cur, prev];
  }
  return prev[t.length] as number;
}

/**
 * The candidates closest to `name` (case-insensitive edit distance at most a third of the
 * longer name, at least 1; a candidate that contains `name`, or is contained in it, also
 * counts), best first, at most `max` of them.
 */
export function closestNames(name: string, candidates: Iterable<string>, max = 3): string[] {
  const lower = name.toLowerCase();
  const scored: { c: string; d: number }[] = [];
  for (const c of candidates) {
    const cl = c.toLowerCase();
    const d = editDistance(lower, cl);
    const limit = Math.max(1, Math.floor(Math.max(lower.length, cl.length) / 3));
    const contains = lower.length >= 2 && cl.length >= 2 && (cl.includes(lower) || lower.includes(cl));
    if (d <= limit || contains) scored.push({ c, d: contains ? Math.min(d, limit) : d });
  }
  scored.sort((x, y) => x.d - y.d || x.c.localeCompare(y.c));
  return scored.slice(0, max).map((s) => s.c);
}
