import { describe, expect, it } from 'vitest';
import { bivariateNormalCdf } from '../../../src/core/population/bivariateNormalCdf.ts';
import { criteriaMoments, detectionLinear } from '../../../src/core/population/detectionModel.ts';
import { fastNormalCdf } from '../../../src/core/population/fastNormalCdf.ts';
import { RELATION_PIVOT, relationLogLikelihood, type RelationDatum, type SelectionTable } from '../../../src/core/population/relationLikelihood.ts';
import { buildSelectionTables, naiveTable } from '../../../src/core/population/selectionTables.ts';
import { simulateSample } from '../../../src/core/population/simulateSample.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { cosmo, erdf, ERRORS, recipe, surveyWith, TRUTH } from '../../helpers/populationInjection.ts';

/**
 * The likelihood as its documentation states it, one M* node at a time with one bivariate probability per node:
 * the reference the fast evaluation (whole windows of nodes at once) must reproduce.
 */
function referenceLogLikelihood(data: readonly RelationDatum[], tables: readonly SelectionTable[], ms: Float64Array, alpha: number, beta: number, sigma: number): number {
  const s2 = sigma * sigma;
  const detect = (tab: SelectionTable, mM: number, mU: number, vM: number, vU: number, cMU: number): number => {
    const lin = tab.linear;
    if (!lin) return 1;
    if (!lin.possible) return 0;
    const mo = criteriaMoments(lin, erdf, { mM, mU, vM, vU, cMU });
    if (lin.noWidthCut) return fastNormalCdf(mo.hA);
    // One criterion decides alone far from the other's boundary, as in the likelihood.
    if (mo.hA < -7 || mo.hB < -7) return 0;
    if (mo.hB > 7) return fastNormalCdf(mo.hA);
    if (mo.hA > 7) return fastNormalCdf(mo.hB);
    return bivariateNormalCdf(mo.hA, mo.hB, mo.rho);
  };
  const priorSum = (tab: SelectionTable): number => tab.massPrior.reduce((a, b) => a + b, 0);
  let total = 0;
  for (const d of data) {
    const tab = tables[d.table] as SelectionTable;
    const sc2 = tab.calibrationScatter ** 2;
    let den = 0;
    ms.forEach((m, j) => {
      const mu = alpha + beta * (m - RELATION_PIVOT);
      den += (tab.massPrior[j] as number) * detect(tab, mu, mu, s2, s2 + sc2, s2);
    });
    const vTot = s2 + sc2;
    const vy = vTot + d.ey * d.ey;
    let num = 0;
    ms.forEach((m, j) => {
      const zx = (d.x - m) / d.ex;
      if (zx * zx > 16) return;
      const mu = alpha + beta * (m - RELATION_PIVOT);
      const r = d.y - mu;
      const p = detect(tab, mu + (s2 / vy) * r, mu + (vTot / vy) * r, s2 - (s2 * s2) / vy, vTot - (vTot * vTot) / vy, s2 - (s2 * vTot) / vy);
      num += (((tab.massPrior[j] as number) * Math.exp(-0.5 * zx * zx)) / (d.ex * priorSum(tab))) * Math.exp((-0.5 * r * r) / vy) * p;
    });
    total += Math.log(num / Math.sqrt(vy)) - Math.log(den / priorSum(tab));
  }
  return total;
}

describe('relationLogLikelihood', () => {
  const survey = surveyWith(1000);
  const sim = simulateSample(cosmo, survey, recipe, TRUTH, 4000, ERRORS, createRng(3));
  const built = buildSelectionTables(cosmo, survey, { halpha: recipe }, sim.objects.map((o) => ({ field: 0, line: 'halpha' as const, z: o.z })), undefined, { zSlice: 0.25, mStar: [7, 12, 0.1] });
  const data = sim.objects.map((o, i) => ({ x: o.x, ex: o.ex, y: o.y, ey: ERRORS.eyMeas, table: built.index[i] as number }));
  const thetas = [[6.4, 1.05, 0.5], [6.1, 0.7, 0.3], [7.0, 1.4, 0.8], [5.5, 0.2, 0.05]] as const;

  it('equals the node-by-node evaluation of its stated formula to 1e-9, with the selection and without', () => {
    // Internal check: the fast evaluation reuses one set of bivariate nodes along each object's window.
    expect(data.length).toBeGreaterThan(20);
    const selection = relationLogLikelihood(data, built.tables, built.grids, erdf);
    const naiveData = data.map((d) => ({ ...d, table: 0 }));
    const naive = relationLogLikelihood(naiveData, [naiveTable(built.grids)], built.grids, erdf);
    for (const [a, b, s] of thetas) {
      const ref = referenceLogLikelihood(data, built.tables, built.grids.mStar, a, b, s);
      expect(Math.abs(selection(a, b, s) - ref), `selection-aware at (${a}, ${b}, ${s}): ${selection(a, b, s)} against ${ref}`).toBeLessThan(1e-9);
      const refNaive = referenceLogLikelihood(naiveData, [naiveTable(built.grids)], built.grids.mStar, a, b, s);
      expect(Math.abs(naive(a, b, s) - refNaive), `naive at (${a}, ${b}, ${s})`).toBeLessThan(1e-9);
    }
  });
});

describe('relationLogLikelihood at the edges of its grid and of its tables', () => {
  it('equals the node-by-node evaluation without a width cut, for objects whose window starts at the first node, and on a one-node grid', () => {
    // Internal check against the stated formula, as above: a survey with minimum FWHM 0 (the flux criterion alone), and
    // objects within 4 ex of the grid's first node (x = 7.05 and 7.6 on a grid from 7).
    const survey = surveyWith(0);
    const sim = simulateSample(cosmo, survey, recipe, TRUTH, 600, ERRORS, createRng(5));
    const sites = sim.objects.map((o) => ({ field: 0, line: 'halpha' as const, z: o.z }));
    const built = buildSelectionTables(cosmo, survey, { halpha: recipe }, sites, undefined, { zSlice: 0.25, mStar: [7, 12, 0.1] });
    expect(built.tables.every((t) => t.linear?.noWidthCut === true)).toBe(true);
    const data = sim.objects.map((o, i) => ({ x: o.x, ex: o.ex, y: o.y, ey: ERRORS.eyMeas, table: built.index[i] as number }));
    data.push({ x: 7.05, ex: 0.25, y: 5.8, ey: 0.15, table: 0 }, { x: 7.6, ex: 0.25, y: 6.1, ey: 0.15, table: 0 });
    const fast = relationLogLikelihood(data, built.tables, built.grids, erdf);
    const oneNode = { mStar: Float64Array.from([9]) };
    const oneData = [{ x: 9.1, ex: 0.25, y: 5.9, ey: 0.15, table: 0 }];
    const oneTables = [{ ...built.tables[0]!, massPrior: Float64Array.from([1]) }];
    const one = relationLogLikelihood(oneData, oneTables, oneNode, erdf);
    for (const [a, b, sg] of [[6.4, 1.05, 0.5], [6.1, 0.7, 0.3], [7.0, 1.4, 0.8]] as const) {
      const ref = referenceLogLikelihood(data, built.tables, built.grids.mStar, a, b, sg);
      expect(Math.abs(fast(a, b, sg) - ref), `no width cut at (${a}, ${b}, ${sg}): ${fast(a, b, sg)} against ${ref}`).toBeLessThan(1e-9);
      const refOne = referenceLogLikelihood(oneData, oneTables, oneNode.mStar, a, b, sg);
      expect(Math.abs(one(a, b, sg) - refOne), `one node at (${a}, ${b}, ${sg}): ${one(a, b, sg)} against ${refOne}`).toBeLessThan(1e-9);
    }
  });

  it('is −∞ for an object more than 4 ex from every grid node, and in a table where the line cannot be detected', () => {
    // Closed form: p(x | M*) is cut to zero beyond 4σ, and P(detected) = 0 outside the spectrograph (z = 9 puts Hα
    // at 65655 Å, beyond 53000 Å), so the likelihood is zero.
    const survey = surveyWith(1000);
    const built = buildSelectionTables(cosmo, survey, { halpha: recipe }, [{ field: 0, line: 'halpha', z: 5 }], undefined, { zSlice: 0.25, mStar: [7, 12, 0.1] });
    // Each case has a detectable object beside it (y = 8 is detectable at every node), so that nothing else gives −∞.
    const far = relationLogLikelihood([{ x: 3, ex: 0.25, y: 8, ey: 0.15, table: 0 }, { x: 10, ex: 0.25, y: 8, ey: 0.15, table: 0 }], built.tables, built.grids, erdf);
    expect(far(6.4, 1.05, 0.5)).toBe(-Infinity);
    const outside = { massPrior: built.tables[0]!.massPrior, linear: detectionLinear(cosmo, recipe, { limit: { kind: 'constant', fluxCgs: 3e-18 }, lamObsRangeAngstrom: [27000, 53000], minFwhmKms: 1000 }, 9), calibrationScatter: 0.3 };
    expect(outside.linear.possible).toBe(false);
    const none = relationLogLikelihood([{ x: 10, ex: 0.25, y: 8, ey: 0.15, table: 0 }, { x: 10, ex: 0.25, y: 8, ey: 0.15, table: 1 }], [built.tables[0]!, outside], built.grids, erdf);
    expect(none(6.4, 1.05, 0.5)).toBe(-Infinity);
    const inside = relationLogLikelihood([{ x: 10, ex: 0.25, y: 8, ey: 0.15, table: 0 }], built.tables, built.grids, erdf);
    expect(Number.isFinite(inside(6.4, 1.05, 0.5))).toBe(true);
  });

  it('is −∞, not +∞, where the population\'s detection probability underflows but the object\'s own does not', () => {
    // At α = −20, σ = 2 the relation's black holes are all far below the flux limit (the flux criterion's mean is at least
    // 12σ under it at every node, so P(detected) is taken as 0, like every probability below Φ(−7)), while an object
    // measured at y = 8 is detectable under its own posterior: p(x, y, detected) / P(detected) with P(detected) = 0 must
    // not become +∞, which a sampler would run to.
    const survey = surveyWith(1000);
    const built = buildSelectionTables(cosmo, survey, { halpha: recipe }, [{ field: 0, line: 'halpha', z: 5 }], undefined, { zSlice: 0.25, mStar: [7, 12, 0.1] });
    const like = relationLogLikelihood([{ x: 10, ex: 0.25, y: 8, ey: 0.15, table: 0 }], built.tables, built.grids, erdf);
    expect(like(-20, 1, 2)).toBe(-Infinity);
    expect(Number.isFinite(like(0, 1, 2))).toBe(true);
  });
});

describe('relationLogLikelihood on a grid that is not uniform', () => {
  it('refuses it, since it steps the means by one fixed step from node to node', () => {
    const grids = { mStar: Float64Array.from([8, 8.1, 8.25, 8.3]) };
    const table = naiveTable(grids);
    expect(() => relationLogLikelihood([{ x: 8.1, ex: 0.2, y: 7, ey: 0.1, table: 0 }], [table], grids, erdf)).toThrow(/uniform/);
  });
});
