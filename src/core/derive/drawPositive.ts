import type { Rng } from '../random/rng.ts';
import { splitNormal } from '../random/splitNormal.ts';
import { standardNormal } from '../random/standardNormal.ts';
import type { Measured } from './types.ts';

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

/**
 * Fills `out` with draws of a positive quantity, as {@link drawPositive} one by one; the
 * common symmetric case runs as one tight loop (the Monte Carlo's hot path).
 * @param rng - random source.
 * @param m - the measurement.
 * @param out - receives `out.length` draws.
 */
export function drawPositiveInto(rng: Rng, m: Measured, out: Float64Array): void {
  const lo = m.errLo ?? m.errHi ?? 0;
  const hi = m.errHi ?? lo;
  const v = m.value;
  if (lo === 0 && hi === 0) {
    out.fill(v);
    return;
  }
  for (let k = 0; k < out.length; k++) {
    const x = lo === hi ? v + lo * standardNormal(rng) : splitNormal(rng, v, lo, hi);
    out[k] = x > 0 ? x : drawPositive(rng, m);
  }
}

/**
 * One Monte Carlo draw of a quantity that may take any sign (log masses, A_V before clipping).
 * @param rng - random source.
 * @param m - the measurement.
 */
export function drawMeasured(rng: Rng, m: Measured): number {
  const lo = m.errLo ?? m.errHi ?? 0;
  const hi = m.errHi ?? lo;
  return lo === 0 && hi === 0 ? m.value : splitNormal(rng, m.value, lo, hi);
}

/**
 * Fills `out` with draws of a quantity of any sign (see {@link drawMeasured}).
 * @param rng - random source.
 * @param m - the measurement.
 * @param out - receives `out.length` draws.
 */
export function drawMeasuredInto(rng: Rng, m: Measured, out: Float64Array): void {
  const lo = m.errLo ?? m.errHi ?? 0;
  const hi = m.errHi ?? lo;
  const v = m.value;
  if (lo === 0 && hi === 0) out.fill(v);
  else if (lo === hi) for (let k = 0; k < out.length; k++) out[k] = v + lo * standardNormal(rng);
  else for (let k = 0; k < out.length; k++) out[k] = splitNormal(rng, v, lo, hi);
}

/** Signal-to-noise of a positive measurement (Infinity when exact). */
export function snr(m: Measured): number {
  const err = Math.max(m.errLo ?? 0, m.errHi ?? m.errLo ?? 0);
  return err > 0 ? m.value / err : Infinity;
}
