import { CatalogError } from './CatalogError.ts';
import { MAX_COLUMNS } from './limits.ts';

/**
 * Settles the column names of a table: an empty name becomes `col<N>` (1-based, as when a
 * spreadsheet leaves the index column unnamed); a name used twice is a {@link CatalogError}
 * `<where>: duplicate column name "x" (columns 2 and 5)`; more than MAX_COLUMNS columns is one too.
 *
 * @param names - names in file order
 * @param where - file (and line) prefix for the error message
 */
export function settleColumnNames(names: readonly string[], where: string): string[] {
  if (names.length > MAX_COLUMNS) throw new CatalogError(`${where}: ${names.length} columns, more than the ${MAX_COLUMNS} a catalog may have`);
  const out = names.map((n, i) => (n === '' ? `col${i + 1}` : n));
  const seen = new Map<string, number>();
  out.forEach((n, i) => {
    const j = seen.get(n);
    if (j !== undefined) throw new CatalogError(`${where}: duplicate column name "${n}" (columns ${j + 1} and ${i + 1})`);
    seen.set(n, i);
  });
  return out;
}
