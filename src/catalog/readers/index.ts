export type { Cell, ColumnInfo, ColumnKind, TableChunk, TableFormat, TableSource } from './types.ts';
export { CatalogError } from './CatalogError.ts';
export { openTable, formatFromPath } from './openTable.ts';
