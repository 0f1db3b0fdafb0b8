export { exp, expInPlace } from './exp.ts';
export { expm1 } from './expm1.ts';
export { log } from './log.ts';
export { log10, log10InPlace } from './log10.ts';
export { log1p } from './log1p.ts';
export { pow } from './pow.ts';
