import type { Rng } from '../random/rng.ts';
import { splitNormal } from '../random/splitNormal.ts';
import type { Measured } from './types.ts';
import type { DrawBank } from '../random/drawBank.ts';

/** Redraws allowed before a non-positive draw is replaced by a tiny positive value. */
const MAX_REDRAWS = 64;

/**
 * One Monte Carlo draw of a strictly positive quantity (a width, a flux, a magnification):
 * a split normal around `m.value` with `m.errLo`/`m.errHi`, truncated at zero by redrawing.
 * Truncation keeps log10 finite; for signal-to-noise above ~3 it never triggers.
 * @param rng - random source.
 * @param m - the measurement (errors absent = exact).
 * @returns a value > 0, in the units of `m`.
 */
export function drawPositive(rng: Rng, m: Measured): number {
  const lo = m.errLo ?? m.errHi ?? 0;
  const hi = m.errHi ?? lo;
  if (lo === 0 && hi === 0) return m.value;
  for (let i = 0; i < MAX_REDRAWS; i++) {
    const x = splitNormal(rng, m.value, lo, hi);
    if (x > 0) return x;
  }
  // Only reached at signal-to-noise far below 1 (the object is flagged low_snr).
  return m.value * 1e-3;
}

/** Signal-to-noise of a positive measurement (Infinity when exact). */
export function snr(m: Measured): number {
  const err = Math.max(m.errLo ?? 0, m.errHi ?? m.errLo ?? 0);
  return err > 0 ? m.value / err : Infinity;
}

/**
 * Fills `out` with draws of a measurement from the deviates a bank keeps for `role`: the same
 * deviates for every reading, whatever the measurement's scale. Symmetric errors: value + σ·z.
 * Split normal (as {@link splitNormal}): below the value with probability σ_lo/(σ_lo + σ_hi),
 * from the role's uniforms, at distance σ·|z|. A positive quantity drawn ≤ 0 is redrawn from
 * the role's own redraw stream (as {@link drawPositive}), the same stream for every reading.
 * @param bank - the object's deviates.
 * @param role - the measurement's role, e.g. 'width_halpha'.
 * @param m - the measurement (errors absent = exact).
 * @param out - receives `bank.n` draws.
 * @param positive - truncate at zero.
 */
export function drawFromBank(bank: DrawBank, role: string, m: Measured, out: Float64Array, positive: boolean): void {
  const lo = m.errLo ?? m.errHi ?? 0;
  const hi = m.errHi ?? lo;
  const v = m.value;
  const n = out.length;
  if (lo === 0 && hi === 0) {
    out.fill(v);
    return;
  }
  const z = bank.normals(role);
  // The smallest draw, to skip the redraw pass when nothing is ≤ 0 (nearly always).
  let min = Infinity;
  if (lo === hi) {
    // Four draws per step: the compiler checks each array passed in at every access it cannot
    // prove repeated, so four accesses per step pay for those checks once (about twice as fast).
    const n4 = n - (n % 4);
    for (let k = 0; k < n4; k += 4) {
      const x0 = v + lo * (z[k] as number);
      const x1 = v + lo * (z[k + 1] as number);
      const x2 = v + lo * (z[k + 2] as number);
      const x3 = v + lo * (z[k + 3] as number);
      out[k] = x0;
      out[k + 1] = x1;
      out[k + 2] = x2;
      out[k + 3] = x3;
      // Plain comparisons: Math.min of four (with its NaN and −0 rules) cost more than the rest of the step.
      if (x0 < min) min = x0;
      if (x1 < min) min = x1;
      if (x2 < min) min = x2;
      if (x3 < min) min = x3;
    }
    for (let k = n4; k < n; k++) {
      const x = v + lo * (z[k] as number);
      out[k] = x;
      if (x < min) min = x;
    }
  } else {
    const u = bank.uniforms(role);
    const width = lo + hi;
    for (let k = 0; k < n; k++) {
      const a = Math.abs(z[k] as number);
      const x = (u[k] as number) * width < lo ? v - lo * a : v + hi * a;
      out[k] = x;
      if (x < min) min = x;
    }
  }
  if (!positive || min > 0) return;
  let redraw: Rng | null = null;
  for (let k = 0; k < n; k++) {
    if ((out[k] as number) > 0) continue;
    redraw ??= bank.redraws(role);
    out[k] = drawPositive(redraw, m);
  }
}
