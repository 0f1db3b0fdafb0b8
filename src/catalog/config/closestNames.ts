/**
 * Edit distance between two strings, compared case-insensitively: insertions, deletions,
 * substitutions and swaps of two neighbours each cost 1 (optimal string alignment distance).
 * Used only for "did you mean" hints, so short inputs.
 */
export function editDistance(a: string, b: string): number {
  const s = a.toLowerCase();
  const t = b.toLowerCase();
  const w = t.length + 1;
  const d = new Array<number>((s.length + 1) * w);
  for (let i = 0; i <= s.length; i++) d[i * w] = i;
  for (let j = 0; j <= t.length; j++) d[j] = j;
  for (let i = 1; i <= s.length; i++) {
    for (let j = 1; j <= t.length; j++) {
      const cost = s[i - 1] === t[j - 1] ? 0 : 1;
      let v = Math.min(d[(i - 1) * w + j]! + 1, d[i * w + j - 1]! + 1, d[(i - 1) * w + j - 1]! + cost);
      if (i > 1 && j > 1 && s[i - 1] === t[j - 2] && s[i - 2] === t[j - 1]) v = Math.min(v, d[(i - 2) * w + j - 2]! + 1);
      d[i * w + j] = v;
    }
  }
  return d[s.length * w + t.length]!;
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
