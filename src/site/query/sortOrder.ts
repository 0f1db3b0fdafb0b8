/**
 * The row order of a sorted result column: a permutation of row indices, stable, with
 * missing values last whatever the direction. Numbers compare as numbers, text with the
 * reader's collation (numeric-aware: 'DC-2' before 'DC-10').
 */
export type SortDirection = 'ascending' | 'descending';

const collator = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });

/** Indices 0…n−1 of `values` in sorted order. */
export function sortOrder(values: readonly unknown[], direction: SortDirection): Uint32Array {
  const n = values.length;
  const idx = new Uint32Array(n);
  for (let i = 0; i < n; i++) idx[i] = i;
  const sign = direction === 'ascending' ? 1 : -1;
  const missing = (v: unknown) => v === null || v === undefined || (typeof v === 'number' && Number.isNaN(v));
  const allNumbers = values.every((v) => missing(v) || typeof v === 'number' || typeof v === 'boolean');
  const cmp = (a: number, b: number): number => {
    const va = values[a];
    const vb = values[b];
    const ma = missing(va);
    const mb = missing(vb);
    if (ma || mb) return ma && mb ? a - b : ma ? 1 : -1;
    let c: number;
    if (allNumbers) c = Number(va) - Number(vb);
    else c = collator.compare(String(va), String(vb));
    return c !== 0 ? sign * c : a - b;
  };
  return idx.sort(cmp);
}
