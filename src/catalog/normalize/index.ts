export * from './canonicalColumns.ts';
export * from './ColumnPlan.ts';
export * from './planColumns.ts';
export * from './normalizeChunk.ts';
export * from './buildInputs.ts';
export * from './readCell.ts';
export * from './errorScale.ts';
