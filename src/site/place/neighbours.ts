/** A population member near the new object, with its standardised distance. */
export interface Neighbour<T> {
  item: T;
  distance: number;
}

/**
 * The `k` members of `population` nearest to `target` in standardised space: each coordinate
 * is divided by its standard deviation over the population members that have every coordinate
 * (so a redshift unit and a dex weigh alike), then Euclidean distance. Members missing any
 * coordinate are skipped; ties keep population order. Returns [] when the target lacks a
 * coordinate or fewer than two members are usable.
 */
export function nearestNeighbours<T>(
  target: readonly (number | null)[],
  population: readonly T[],
  coords: (item: T) => readonly (number | null)[],
  k = 5,
): Neighbour<T>[] {
  if (target.some((v) => v === null || !Number.isFinite(v))) return [];
  const usable: { item: T; c: number[] }[] = [];
  for (const item of population) {
    const c = coords(item);
    if (c.length === target.length && c.every((v) => v !== null && Number.isFinite(v))) usable.push({ item, c: c as number[] });
  }
  if (usable.length < 2) return [];
  const dims = target.length;
  const sd: number[] = [];
  for (let d = 0; d < dims; d++) {
    let mean = 0;
    for (const u of usable) mean += u.c[d]!;
    mean /= usable.length;
    let ss = 0;
    for (const u of usable) ss += (u.c[d]! - mean) ** 2;
    const s = Math.sqrt(ss / (usable.length - 1));
    // a coordinate with no spread cannot separate anyone: give it unit weight rather than divide by 0
    sd.push(s > 0 ? s : 1);
  }
  const scored = usable.map((u, i) => {
    let d2 = 0;
    for (let d = 0; d < dims; d++) d2 += ((u.c[d]! - (target[d] as number)) / sd[d]!) ** 2;
    return { item: u.item, distance: Math.sqrt(d2), i };
  });
  scored.sort((a, b) => a.distance - b.distance || a.i - b.i);
  return scored.slice(0, k).map(({ item, distance }) => ({ item, distance }));
}
