import { CANONICAL_COLUMNS } from '../../../src/catalog/normalize/canonicalColumns.ts';
import type { ColumnPlan } from '../../../src/catalog/normalize/ColumnPlan.ts';
import { buildOutputColumns, type OutputColumn } from '../../../src/catalog/derive/outputColumns.ts';

/** Every column `derive` can write: a plan that reads every canonical column (so every line's columns appear). */
export function allOutputColumns(): OutputColumn[] {
  const plan = {
    label: 'all.csv',
    canonical: CANONICAL_COLUMNS.map((def, i) => ({ name: def.name, sourceIndex: i, sourceName: def.name, convert: (x: number) => x, kind: def.kind, fileKind: 'float', def, unitLabel: '', label: def.name })),
    passthrough: [],
  } as unknown as ColumnPlan;
  return buildOutputColumns(plan);
}
