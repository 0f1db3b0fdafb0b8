export type { CitedConstant } from './citedConstant.ts';
export * from './physical.ts';
export * from './eddington.ts';
