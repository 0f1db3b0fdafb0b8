import { poissonInterval } from './poissonInterval.ts';
import { percentiles16_50_84 } from '../random/percentiles.ts';

/** One object's contribution to a binned space density. */
export interface DensityMember {
  /** The binned quantity's nominal value (e.g. log M_BH, or log L_bol). */
  readonly x: number;
  /** Monte Carlo draws of the same quantity (same length for every member), or empty. */
  readonly xDraws: ArrayLike<number>;
  /** The object's maximum volume, comoving Mpc³. */
  readonly vmaxCmpc3: number;
}

/** One bin of a space-density function (mass or luminosity function), per comoving Mpc³ per dex. */
export interface DensityBin {
  readonly lo: number;
  readonly hi: number;
  /** Objects whose nominal value falls in the bin. */
  readonly count: number;
  /** Σ 1/V_max / Δx (Schmidt 1968). */
  readonly phi: number;
  /** Poisson 1σ limits on phi (Gehrels 1986) scaled by phi/count; for count 0 the upper limit over `volumeCeilingCmpc3`. */
  readonly phiLo: number;
  readonly phiHi: number;
  /** 16th and 84th percentiles of phi over the Monte Carlo draws (null without draws). */
  readonly phiP16: number | null;
  readonly phiP84: number | null;
}

/**
 * A binned 1/V_max space density (Schmidt 1968, ApJ 151, 393) with small-count Poisson
 * limits (Gehrels 1986, ApJ 303, 336) and the spread from the Monte Carlo draws of each
 * member's value (members move between bins draw by draw).
 * @param members - the objects (V_max > 0).
 * @param edges - bin edges in x, increasing (dex).
 * @param volumeCeilingCmpc3 - the largest volume any object could have (the survey's whole volume in
 *   the redshift range); an empty bin's upper limit is 1.841/(ceiling × Δx).
 */
export function binnedDensity(members: readonly DensityMember[], edges: readonly number[], volumeCeilingCmpc3: number): DensityBin[] {
  const nBins = edges.length - 1;
  const binOf = (x: number): number => {
    if (!(x >= (edges[0] as number)) || !(x < (edges[nBins] as number))) return -1;
    let i = 0;
    while (x >= (edges[i + 1] as number)) i++;
    return i;
  };
  const counts = new Array<number>(nBins).fill(0);
  const sums = new Array<number>(nBins).fill(0);
  for (const m of members) {
    const b = binOf(m.x);
    if (b < 0) continue;
    counts[b] = (counts[b] as number) + 1;
    sums[b] = (sums[b] as number) + 1 / m.vmaxCmpc3;
  }
  const nDraws = members.length > 0 ? (members[0] as DensityMember).xDraws.length : 0;
  const drawPhi: Float64Array[] = Array.from({ length: nBins }, () => new Float64Array(nDraws));
  for (let k = 0; k < nDraws; k++) {
    for (const m of members) {
      const b = binOf(m.xDraws[k] as number);
      if (b < 0) continue;
      const arr = drawPhi[b] as Float64Array;
      arr[k] = (arr[k] as number) + 1 / m.vmaxCmpc3;
    }
  }
  const out: DensityBin[] = [];
  for (let i = 0; i < nBins; i++) {
    const lo = edges[i] as number;
    const hi = edges[i + 1] as number;
    const dx = hi - lo;
    const n = counts[i] as number;
    const phi = (sums[i] as number) / dx;
    const lim = poissonInterval(n);
    const perObject = n > 0 ? phi / n : 1 / (volumeCeilingCmpc3 * dx);
    let phiP16: number | null = null;
    let phiP84: number | null = null;
    if (nDraws > 0) {
      const d = drawPhi[i] as Float64Array;
      for (let k = 0; k < nDraws; k++) d[k] = (d[k] as number) / dx;
      const p = percentiles16_50_84(d);
      phiP16 = p.p16;
      phiP84 = p.p84;
    }
    out.push({ lo, hi, count: n, phi, phiLo: lim.lower * perObject, phiHi: lim.upper * perObject, phiP16, phiP84 });
  }
  return out;
}
