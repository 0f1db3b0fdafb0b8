export * from './eddingtonLuminosity.ts';
export * from './eddingtonAccretionRate.ts';
