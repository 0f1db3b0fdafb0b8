import { cubicHermite, cubicHermiteSlope } from './cubicHermite.ts';
import type { CosmologyTables } from './cosmologyTables.ts';
import type { Expansion } from './expansion.ts';
import { ageInHubbleTimes } from './hubbleIntegrals.ts';
import { exp, expm1, log } from '../math/index.ts';

/**
 * Safeguarded Newton for a decreasing g on [lo, hi] with g(lo) ≥ 0 ≥ g(hi): Newton steps,
 * bisection whenever a step leaves the bracket. Converges to ~1e-15 of the bracket width.
 */
function solveDecreasing(g: (x: number) => { v: number; dv: number }, lo: number, hi: number, guess: number): number {
  let x = Math.min(Math.max(guess, lo), hi);
  for (let k = 0; k < 100; k++) {
    const { v, dv } = g(x);
    if (v === 0) return x;
    if (v > 0) lo = x;
    else hi = x;
    let next = x - v / dv;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - x) <= 1e-15 * Math.max(1, Math.abs(x)) || hi - lo <= 1e-15 * Math.max(1, Math.abs(hi))) return next;
    x = next;
  }
  return x;
}

/**
 * u = ln(1+z) at which ln(age/t_H) equals `lnAge` (which must be ≤ the table's value at z = 0).
 * Inside the table it inverts the same Hermite interpolant that gives the age, so age and its
 * inverse agree to rounding; beyond the table (z > z_max) it runs Newton on the direct age integral.
 */
export function uAtLnAge(t: CosmologyTables, expansion: Expansion, lnAge: number): number {
  const y = t.lnAge;
  const d = t.lnAgeSlope;
  if (lnAge >= (y[t.n] as number)) {
    // lnAge decreases with i: find i with y[i] ≥ lnAge ≥ y[i+1].
    let lo = 0;
    let hi = t.n;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if ((y[mid] as number) >= lnAge) lo = mid;
      else hi = mid;
    }
    const y0 = y[lo] as number;
    const y1 = y[lo + 1] as number;
    const d0 = d[lo] as number;
    const d1 = d[lo + 1] as number;
    const guess = y0 === y1 ? 0 : (y0 - lnAge) / (y0 - y1);
    const f = solveDecreasing(
      (x) => ({ v: cubicHermite(y0, y1, d0, d1, t.du, x) - lnAge, dv: cubicHermiteSlope(y0, y1, d0, d1, t.du, x) * t.du }),
      0,
      1,
      guess,
    );
    return (lo + f) * t.du;
  }
  // Beyond the table: ln(age) falls with slope between −1.5 (matter) and −2 (radiation) in u.
  const g = (u: number) => {
    const age = ageInHubbleTimes(expansion, exp(-u));
    return { v: log(age) - lnAge, dv: -1 / (expansion.efunc(expm1(u)) * age) };
  };
  const excess = (y[t.n] as number) - lnAge;
  let hi = t.uMax + excess / 1.4;
  while (g(hi).v > 0) hi += excess;
  return solveDecreasing(g, t.uMax, hi, t.uMax + excess / 1.75);
}
