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
    const list = out === null ? [] : Array.isArray(out) ? out : [out];
    if (!list.length && role !== 'extra') unplaced += 1;
    for (const p of list) points.push({ ...p, id: String(row.id), role });
  };
  for (const row of rows) place(row, highlight.has(String(row.id)) ? 'highlight' : 'population');
  for (const row of options.extra ?? []) place(row, 'extra');
  return { points, unplaced };
}
