export * from './virialCalibration.ts';
export * from './calibrations.ts';
export * from './powerLawRelation.ts';
export * from './lineContinuumRelations.ts';
export * from './halphaHbetaWidth.ts';
export * from './massScale.ts';
