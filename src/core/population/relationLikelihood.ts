import { bivariateNodesInto, bivariateNormalCdfAlongLine, type BivariateNodesScratch } from './bivariateNormalCdf.ts';
import { addExpQuadratic } from './addExpQuadratic.ts';
import { criteriaMoments, type DetectionLinear, type MassBelief } from './detectionModel.ts';
import type { EddingtonRatioDistribution } from './eddingtonRatioDistribution.ts';
import { fastNormalCdf as normalCdf } from './fastNormalCdf.ts';

/** One object as the relation fit sees it. */
export interface RelationDatum {
  /** Observed log10 M*, and its 1σ error (dex). */
  readonly x: number;
  readonly ex: number;
  /** Observed log10 M_BH (virial), and its 1σ measurement error WITHOUT the calibration's scatter (dex). */
  readonly y: number;
  readonly ey: number;
  /** Index of the object's selection table (shared by objects of the same field, line and redshift slice). */
  readonly table: number;
}

/** What the fit knows about one field, line and redshift slice. */
export interface SelectionTable {
  /** Prior weights of true log M* on the mass grid (the stellar mass function's shape at that z). */
  readonly massPrior: Float64Array;
  /** The detection criteria as linear conditions; null for a fit without selection (the naive fit). */
  readonly linear: DetectionLinear | null;
  /** Scatter between true and virial mass of the line's calibration, dex. */
  readonly calibrationScatter: number;
}

/** The stellar-mass grid the tables are laid on (uniform nodes, log M_sun). */
export interface RelationGrids {
  readonly mStar: Float64Array;
}

/** Pivot of the fitted relation: log M_BH = alpha + beta (log M* − 10). */
export const RELATION_PIVOT = 10;

/**
 * Detection probability for a Gaussian (M, u) belief whose covariance is fixed: the criteria's standard deviations
 * and correlation are computed once (`prepare`), then each call moves only the means (`along`). On the uniform M*
 * grid the means move by a fixed step from node to node, so a whole window is one line in (h, k)
 * (see bivariateNormalCdfAlongLine).
 */
interface DetectionAt {
  /**
   * The probabilities at `count` points whose means step evenly, (mM0 + dM q, mU0 + dU q) for q = 0 … count − 1,
   * written to `out`.
   */
  along(mM0: number, dM: number, mU0: number, dU: number, count: number, out: Float64Array): void;
}

function prepare(tab: SelectionTable, erdf: EddingtonRatioDistribution, vM: number, vU: number, cMU: number, scratch: BivariateNodesScratch): DetectionAt {
  const lin = tab.linear;
  if (!lin) return { along: (_m, _d, _u, _e, count, out) => out.fill(1, 0, count) };
  if (!lin.possible) return { along: (_m, _d, _u, _e, count, out) => out.fill(0, 0, count) };
  const mo = criteriaMoments(lin, erdf, { mM: 0, mU: 0, vM, vU, cMU });
  // criteriaMoments at zero means gives h = (constant part)/sd: recover the sds to move the means cheaply.
  const sl2 = erdf.sigmaLog * erdf.sigmaLog;
  const sA = Math.sqrt(lin.aM * lin.aM * vM + lin.aL * lin.aL * sl2);
  const sB = Math.sqrt(lin.bM * lin.bM * vM + lin.bU * lin.bU * vU + 2 * lin.bM * lin.bU * cMU + lin.bL * lin.bL * sl2);
  const a0 = lin.a0 + lin.aL * erdf.meanLog;
  const b0 = lin.b0 + lin.bL * erdf.meanLog;
  if (lin.noWidthCut) {
    return {
      along: (mM0, dM, _u, _e, count, out) => {
        for (let q = 0; q < count; q++) out[q] = normalCdf((a0 + lin.aM * (mM0 + dM * q)) / sA);
      },
    };
  }
  // The nodes go into the caller's scratch: each DetectionAt is used before the next is prepared.
  const nodes = bivariateNodesInto(mo.rho, scratch);
  return {
    along: (mM0, dM, mU0, dU, count, out) => {
      const h0 = (a0 + lin.aM * mM0) / sA;
      const dh = (lin.aM * dM) / sA;
      const k0 = (b0 + lin.bM * mM0 + lin.bU * mU0) / sB;
      const dk = (lin.bM * dM + lin.bU * dU) / sB;
      bivariateNormalCdfAlongLine(nodes, h0, dh, k0, dk, count, out);
      for (let q = 0; q < count; q++) {
        const h = h0 + dh * q;
        const k = k0 + dk * q;
        // Far from either boundary one criterion decides alone (error < 1e-12): the bivariate quadrature, which
        // loses relative precision there, is not used.
        if (h < -7 || k < -7) out[q] = 0;
        else if (k > 7) out[q] = normalCdf(h);
        else if (h > 7) out[q] = normalCdf(k);
      }
    },
  };
}

/**
 * The log likelihood of a black-hole–host relation given detected objects, with the selection inside the
 * likelihood: L_i = p(x_i, y_i, detected | θ) / P(detected | θ). Both are marginalised over the true M* (prior: the
 * stellar mass function's shape, on a grid), the true M_BH (normal about the relation with scatter sigma), the
 * virial mass (normal about the true mass with the calibration's scatter) and λ_Edd (the assumed log-normal). Given
 * M*, everything is Gaussian and the criteria are linear, so the detection probability is a bivariate normal
 * probability, exact. The approach follows the selection-aware fits of the field (e.g. Li et al. 2024,
 * arXiv:2403.00074); this implementation is our own. Returns a function of (alpha, beta, sigma). Each object's
 * window of M* nodes, and each table's whole grid, is evaluated at once (the Gaussian factors and the bivariate
 * quadrature by recurrence along the window, {@link addExpQuadratic}): the same sums as node by node, to ~1e-12.
 * @param data - the objects.
 * @param tables - their selection tables.
 * @param grids - the stellar-mass grid of the tables.
 * @param erdf - the Eddington-ratio distribution.
 */
export function relationLogLikelihood(
  data: readonly RelationDatum[], tables: readonly SelectionTable[], grids: RelationGrids, erdf: EddingtonRatioDistribution,
): (alpha: number, beta: number, sigma: number) => number {
  const ms = grids.mStar;
  const nm = ms.length;
  // Per object: the M* nodes within 4σ of its measurement, with prior × N(x | m, ex) / Σ prior (θ-independent).
  const first = new Int32Array(data.length);
  const count = new Int32Array(data.length);
  const offset = new Int32Array(data.length);
  const wx: number[] = [];
  data.forEach((d, i) => {
    const tab = tables[d.table] as SelectionTable;
    let priorSum = 0;
    for (let j = 0; j < nm; j++) priorSum += tab.massPrior[j] as number;
    let j0 = -1;
    let j1 = -1;
    for (let j = 0; j < nm; j++) {
      const zx = (d.x - (ms[j] as number)) / d.ex;
      if (zx * zx <= 16) { if (j0 < 0) j0 = j; j1 = j; }
    }
    offset[i] = wx.length;
    first[i] = Math.max(j0, 0);
    count[i] = j0 < 0 ? 0 : j1 - j0 + 1;
    for (let j = j0; j0 >= 0 && j <= j1; j++) {
      const zx = (d.x - (ms[j] as number)) / d.ex;
      wx.push(((tab.massPrior[j] as number) * Math.exp(-0.5 * zx * zx)) / (d.ex * priorSum));
    }
  });
  const wxa = Float64Array.from(wx);
  const priorSums = tables.map((t) => t.massPrior.reduce((a, b) => a + b, 0));
  const logDen = new Float64Array(tables.length);
  const scratch: BivariateNodesScratch = { scale: 0, sin: new Float64Array(20), invCos2: new Float64Array(20), w: new Float64Array(20), n: 0 };
  // The grid is uniform, so every mean below moves by a fixed step from node to node (see DetectionAt.along).
  const step = nm > 1 ? (ms[1] as number) - (ms[0] as number) : 0;
  for (let j = 1; j < nm; j++) {
    if (Math.abs((ms[j] as number) - (ms[0] as number) - j * step) > 1e-9) throw new RangeError('relationLogLikelihood: the M* grid must be uniform');
  }
  const detBuf = new Float64Array(nm);
  const gaussBuf = new Float64Array(nm);
  return (alpha: number, beta: number, sigma: number): number => {
    const s2 = sigma * sigma;
    const dmu = beta * step;
    const muAt = (j: number): number => alpha + beta * ((ms[j] as number) - RELATION_PIVOT);
    for (let t = 0; t < tables.length; t++) {
      const tab = tables[t] as SelectionTable;
      const sc2 = tab.calibrationScatter * tab.calibrationScatter;
      const mu0 = muAt(0);
      prepare(tab, erdf, s2, s2 + sc2, s2, scratch).along(mu0, dmu, mu0, dmu, nm, detBuf);
      let den = 0;
      for (let j = 0; j < nm; j++) den += (tab.massPrior[j] as number) * (detBuf[j] as number);
      logDen[t] = den > 0 ? Math.log(den / (priorSums[t] as number)) : -Infinity;
    }
    let total = 0;
    for (let i = 0; i < data.length; i++) {
      const d = data[i] as RelationDatum;
      const tab = tables[d.table] as SelectionTable;
      const sc2 = tab.calibrationScatter * tab.calibrationScatter;
      const vTot = s2 + sc2;
      const vy = vTot + d.ey * d.ey;
      const sy = Math.sqrt(vy);
      // (M, u) given y: the same covariance at every M* node; only the means move.
      const vM = s2 - (s2 * s2) / vy;
      const vU = vTot - (vTot * vTot) / vy;
      const cMU = s2 - (s2 * vTot) / vy;
      const n = count[i] as number;
      const o = offset[i] as number;
      const mu0 = muAt(first[i] as number);
      const r0 = d.y - mu0;
      // N(y | mu, sy) up to 1/(sy√2π) at the window's nodes: exp(−(r0 − dmu q)² / (2 vy)).
      gaussBuf.fill(0, 0, n);
      addExpQuadratic(gaussBuf, n, (-0.5 * dmu * dmu) / vy, (r0 * dmu) / vy, (-0.5 * r0 * r0) / vy, 1);
      prepare(tab, erdf, vM, vU, cMU, scratch).along(mu0 + (s2 / vy) * r0, dmu * (1 - s2 / vy), mu0 + (vTot / vy) * r0, dmu * (1 - vTot / vy), n, detBuf);
      let num = 0;
      for (let q = 0; q < n; q++) num += (wxa[o + q] as number) * (gaussBuf[q] as number) * (detBuf[q] as number);
      const ld = logDen[d.table] as number;
      if (!(num > 0) || !Number.isFinite(ld)) return -Infinity;
      total += Math.log(num / sy) - ld;
    }
    return total;
  };
}
