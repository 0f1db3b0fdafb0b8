import { CatalogError } from '../readers/CatalogError.ts';

/**
 * Turns a repeated id into a catalog-level error (`<file>: duplicate id "X" at rows 3 and 17`):
 * ids must be unique since each object's random stream and its page are keyed by id. Reads
 * the first row of each id from the map normalizeChunk keeps (`ColumnPlan.seenIds`), so the
 * ids of a large catalog are held once. Empty ids are left to the row checks.
 */
export class DuplicateIds {
  constructor(
    private readonly label: string,
    private readonly firstRow: ReadonlyMap<string, number>,
  ) {}

  /** Throws if `id`, seen at 1-based `row`, was first seen at an earlier row. */
  check(id: string | null, row: number): void {
    if (id === null || id === '') return;
    const first = this.firstRow.get(id);
    if (first !== undefined && first !== row) throw new CatalogError(`${this.label}: duplicate id "${id}" at rows ${first} and ${row}`);
  }
}
