import type { ChartPoint } from './chartPoint.ts';
import type { CatalogRow, ChartOptions } from './types.ts';

/** A row's coordinates on a chart (everything of a ChartPoint but its id and role), or null when it cannot be placed. */
export type PointMapper = (row: CatalogRow) => Omit<ChartPoint, 'id' | 'role'> | null;

/**
 * Places the catalog rows and the extra (new) rows on a chart: each row becomes a point with
 * role 'highlight' when its id is in `highlightIds`, 'extra' when it came from `extra`, else
 * 'population'. A mapper may return several points per row (one per series). Returns the
 * points and how many catalog rows could not be placed.
 */
export function pointsFromRows(
  rows: readonly CatalogRow[],
  options: Pick<ChartOptions, 'highlightIds' | 'extra'>,
  map: (row: CatalogRow) => Omit<ChartPoint, 'id' | 'role'>[] | Omit<ChartPoint, 'id' | 'role'> | null,
): { points: ChartPoint[]; unplaced: number } {
  const highlight = new Set(options.highlightIds ?? []);
  const points: ChartPoint[] = [];
  let unplaced = 0;
  const place = (row: CatalogRow, role: ChartPoint['role']): void => {
    const out = map(row);
    if (out === null || (Array.isArray(out) && out.length === 0)) {
      if (role !== 'extra') unplaced += 1;
      return;
    }
    const id = String(row.id);
    // the mapper returns fresh objects: complete them in place rather than copy (100k rows)
    for (const p of Array.isArray(out) ? out : [out]) {
      const q = p as ChartPoint;
      q.id = id;
      q.role = role;
      points.push(q);
    }
  };
  for (const row of rows) place(row, highlight.has(String(row.id)) ? 'highlight' : 'population');
  for (const row of options.extra ?? []) place(row, 'extra');
  return { points, unplaced };
}
