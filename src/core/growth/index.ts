export * from './salpeterGrowth.ts';
