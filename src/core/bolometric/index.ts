export * from './fixedCorrections.ts';
export * from './netzer19.ts';
export * from './logLbolFromContinuum.ts';
export * from './logLbolFromHalpha.ts';
export * from './smallCorrections.ts';
