import type { CatalogCell, CatalogRow } from './types.ts';

/** A cell as a finite number, or null when it is missing, text that is not a number, NaN or infinite. */
export function num(cell: CatalogCell): number | null {
  if (cell === null || cell === undefined || typeof cell === 'boolean') return null;
  const v = typeof cell === 'number' ? cell : Number(cell);
  return Number.isFinite(v) ? v : null;
}

/** True when the row's comma-separated `flags` contain `flag`. */
export function hasFlag(row: CatalogRow, flag: string): boolean {
  const f = row.flags;
  // most rows lack the flag: a substring test first spares splitting their flags (4 charts × 10,000 rows per redraw)
  if (typeof f !== 'string' || !f.includes(flag)) return false;
  return f.split(',').some((s) => s.trim() === flag);
}

/** A boolean cell: true for true, 1, 'true', 't', '1' (as Parquet/CSV may spell it). */
export function isTrue(cell: CatalogCell): boolean {
  if (typeof cell === 'boolean') return cell;
  if (typeof cell === 'number' || typeof cell === 'bigint') return Number(cell) === 1;
  if (typeof cell === 'string') return ['true', 't', '1', 'yes'].includes(cell.trim().toLowerCase());
  return false;
}
