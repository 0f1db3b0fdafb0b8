import { exp } from './exp.ts';
import { log } from './log.ts';

/**
 * x^y, the same in every JavaScript engine (Math.pow and `**` differ in the last bits between
 * Node 20 and recent Chromium): e^(y·ln x) from this folder's exp and log, exact for y = 0, 1, 2.
 * Relative error about (2 + |y ln x|) · 2^-53: below 1e-15 where the core uses it (|y ln x| < 10).
 * Zero, infinite and NaN arguments take Math.pow's exact special values.
 * @param x - base; a negative base needs an integer exponent (NaN otherwise, as Math.pow).
 * @param y - exponent.
 */
export function pow(x: number, y: number): number {
  if (y === 0) return 1;
  if (y === 1) return x;
  if (y === 2) return x * x;
  if (!Number.isFinite(x) || !Number.isFinite(y) || x === 0) return Math.pow(x, y);
  if (x > 0) return exp(y * log(x));
  if (!Number.isInteger(y)) return NaN;
  const r = exp(y * log(-x));
  return y % 2 === 0 ? r : -r;
}
