export * from './dustCurve.ts';
export * from './calzetti00.ts';
export * from './ccm89.ts';
export * from './smcGordon03.ts';
export * from './notAKnotSpline.ts';
export * from './kLambda.ts';
export * from './lineWavelengths.ts';
export * from './balmerDecrement.ts';
