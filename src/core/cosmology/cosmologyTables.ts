import type { Expansion } from './expansion.ts';
import { cubicHermite } from './cubicHermite.ts';
import { KRONROD15_POINTS, kronrod15Abscissae, kronrod15FromValues } from './gaussKronrod.ts';
import { ageInHubbleTimes } from './hubbleIntegrals.ts';
import { exp, expm1, log, log1p } from '../math/index.ts';

/**
 * Grid of the distance and age tables: uniform in u = ln(1+z) from z = 0 to about `TABLE_Z_MAX`,
 * step `TABLE_DU`. Cubic Hermite interpolation with exact slopes has error ≈ h⁴/384·|f''''|,
 * about 1e-11 relative here; 1e4 covers seed formation (z ≈ 20–30) and far beyond.
 */
export const TABLE_DU = 1 / 128;
/** Highest redshift the tables reach (the last node is the first grid point at or above it). */
export const TABLE_Z_MAX = 1e4;

/**
 * Tabulated integrals at u_i = i·du, in Hubble units, with their exact derivatives in u:
 * comoving distance D_C/D_H (slope (1+z)/E), lookback time t_L/t_H (slope 1/E) and
 * ln(age/t_H) (slope −1/(E·age/t_H)).
 */
export interface CosmologyTables {
  readonly du: number;
  /** Number of intervals; nodes are 0..n. */
  readonly n: number;
  readonly uMax: number;
  readonly comoving: Float64Array;
  readonly comovingSlope: Float64Array;
  readonly lookback: Float64Array;
  readonly lookbackSlope: Float64Array;
  readonly lnAge: Float64Array;
  readonly lnAgeSlope: Float64Array;
}

/**
 * Builds the tables: 15-point Kronrod on each interval (exact to rounding at this step),
 * summed upward for distance and lookback, downward from a direct age integral at z_max for age.
 * Throws if E(z) is not real and positive somewhere (a model without a big bang).
 */
export function buildCosmologyTables(expansion: Expansion, name: string): CosmologyTables {
  const du = TABLE_DU;
  const n = Math.ceil(log1p(TABLE_Z_MAX) / du);
  const uMax = n * du;
  const comoving = new Float64Array(n + 1);
  const comovingSlope = new Float64Array(n + 1);
  const lookback = new Float64Array(n + 1);
  const lookbackSlope = new Float64Array(n + 1);
  const lnAge = new Float64Array(n + 1);
  const lnAgeSlope = new Float64Array(n + 1);
  const invE = (u: number): number => {
    const e = expansion.efunc(expm1(u));
    if (!(e > 0)) throw new RangeError(`cosmology "${name}": E(z) is not positive at z = ${expm1(u)} (no big bang)`);
    return 1 / e;
  };
  const lookbackStep = new Float64Array(n);
  // Both integrals of an interval take 1/E at the same 15 nodes: evaluated once (E(z) with massive
  // neutrinos is most of the tables' cost, and each derive worker builds them before its first object).
  const nodes = new Float64Array(KRONROD15_POINTS);
  const invEAt = new Float64Array(KRONROD15_POINTS);
  const comovingAt = new Float64Array(KRONROD15_POINTS);
  for (let i = 0; i < n; i++) {
    const u0 = i * du;
    const u1 = u0 + du;
    kronrod15Abscissae(u0, u1, nodes);
    for (let k = 0; k < KRONROD15_POINTS; k++) {
      const u = nodes[k] as number;
      const ie = invE(u);
      invEAt[k] = ie;
      comovingAt[k] = exp(u) * ie;
    }
    comoving[i + 1] = (comoving[i] as number) + kronrod15FromValues(comovingAt, u0, u1).value;
    const step = kronrod15FromValues(invEAt, u0, u1).value;
    lookbackStep[i] = step;
    lookback[i + 1] = (lookback[i] as number) + step;
  }
  let age = ageInHubbleTimes(expansion, exp(-uMax));
  for (let i = n; i >= 0; i--) {
    if (i < n) age += lookbackStep[i] as number;
    const u = i * du;
    const ie = invE(u);
    comovingSlope[i] = exp(u) * ie;
    lookbackSlope[i] = ie;
    lnAge[i] = log(age);
    lnAgeSlope[i] = -ie / age;
  }
  return { du, n, uMax, comoving, comovingSlope, lookback, lookbackSlope, lnAge, lnAgeSlope };
}

/** Interpolates table `y` (slopes `d`) at u ∈ [0, uMax] by cubic Hermite. */
export function interpolateTable(t: CosmologyTables, y: Float64Array, d: Float64Array, u: number): number {
  const x = u / t.du;
  let i = Math.floor(x);
  if (i >= t.n) i = t.n - 1;
  return cubicHermite(y[i] as number, y[i + 1] as number, d[i] as number, d[i + 1] as number, t.du, x - i);
}
