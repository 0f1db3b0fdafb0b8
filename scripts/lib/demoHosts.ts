/**
 * The intrinsic population of the demo before any selection: a host stellar mass from the stellar mass function
 * at the object's redshift, a black hole about the demo's intrinsic relation, an Eddington ratio, and the virial
 * mass a single-epoch calibration would give (the true mass plus the calibration's scatter). This is the forward
 * model the population step fits (src/core/population), written again here so the demo is an independent check.
 */
import type { DemoModel } from './demoPopulation.ts';
import { type Rng, standardNormal, truncatedNormal } from './demoRandom.ts';
import { SONG16_SMF, VIRIAL_SCATTER_DEX } from './demoRelations.ts';

/** One intrinsic object. */
export interface IntrinsicDraw {
  logMstar: number;
  logMbh: number;
  logEddRatio: number;
  /** The mass a virial calibration of the detection line recovers from noise-free observables. */
  logMbhVirial: number;
}

/** The Song et al. 2016 record nearest to z. */
export function smfAt(z: number): { logMchar: number; alpha: number } {
  let best: { logMchar: number; alpha: number; z: number } = SONG16_SMF.records[0];
  for (const r of SONG16_SMF.records) if (Math.abs(r.z - z) < Math.abs(best.z - z)) best = r;
  return best;
}

/**
 * log M* from the Schechter shape (per dex: 10^{(1+α)(m − m*)} exp(−10^{m − m*})) on [lo, hi]: the power law by
 * its inverse CDF, then the exponential cut-off by rejection (acceptance near 1 below m*).
 */
export function drawLogMstar(rng: Rng, z: number, lo: number, hi: number): number {
  const { logMchar, alpha } = smfAt(z);
  const k = (1 + alpha) * Math.LN10; // density ∝ exp(k (m − lo)), k < 0
  for (;;) {
    const u = rng();
    const m = lo + Math.log(1 + u * (Math.exp(k * (hi - lo)) - 1)) / k;
    if (rng() < Math.exp(-(10 ** (m - logMchar)))) return m;
  }
}

/**
 * Draws one intrinsic object at redshift z for a detection line.
 * @param line - the line the mass is measured from (sets the virial scatter).
 */
export function drawIntrinsic(rng: Rng, model: DemoModel, z: number, line: 'halpha' | 'hbeta' | 'mgii'): IntrinsicDraw {
  const t = model.truth;
  const e = model.logEddRatio;
  const logMstar = drawLogMstar(rng, z, model.host.logMstarMin, model.host.logMstarMax);
  const logMbh = t.alpha + t.beta * (logMstar - t.pivotLogMstar) + t.sigma * standardNormal(rng);
  const logEddRatio = truncatedNormal(rng, e.meanLog, e.sigmaLog, e.meanLog - 5 * e.sigmaLog, e.meanLog + 5 * e.sigmaLog);
  const logMbhVirial = logMbh + VIRIAL_SCATTER_DEX[line] * standardNormal(rng);
  return { logMstar, logMbh, logEddRatio, logMbhVirial };
}
