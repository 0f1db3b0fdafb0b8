export * from './localRelation.ts';
export * from './localRelations.ts';
