import { getCosmology } from '../../src/core/cosmology/getCosmology.ts';
import { DEFAULT_SETTINGS } from '../../src/core/derive/defaultSettings.ts';
import type { Rng } from '../../src/core/random/rng.ts';
import { CALIBRATIONS } from '../../src/core/virial/calibrations.ts';
import { fitRelation } from '../../src/core/population/fitRelation.ts';
import { buildSelectionTables, naiveTable } from '../../src/core/population/selectionTables.ts';
import { simulateSample, type IntrinsicPopulation } from '../../src/core/population/simulateSample.ts';
import type { ForwardRecipe } from '../../src/core/population/detectionModel.ts';
import type { SurveySpec } from '../../src/core/population/surveySpec.ts';

/** Shared set-up of the injection–recovery tests of the selection-aware relation fit. */
export const cosmo = getCosmology('planck18');
export const recipe: ForwardRecipe = { line: 'halpha', calibration: CALIBRATIONS.rv15_halpha, bc5100: 10.33, eddingtonPerMsun: DEFAULT_SETTINGS.eddingtonPerMsun };
export const erdf = { meanLog: -0.6, sigmaLog: 0.4, reference: 'common practice, no source (test population)' };
export const surveyWith = (minFwhmKms: number): SurveySpec => ({
  fields: [{ name: 'sim', areaArcmin2: 100, limits: { halpha: { kind: 'constant', fluxCgs: 3e-18 } } }],
  lamObsRangeAngstrom: [27000, 53000], minFwhmKms, minSnr: 0,
});
// Truth: the local AGN relation of Reines & Volonteri 2015 (eq. 4: log M_BH = 7.45 + 1.05 (log M* − 11); coefficients from
// memory) with 0.5 dex intrinsic scatter, the injection example of the selection-aware papers; at log M* = 10 it is 6.40.
export const TRUTH: IntrinsicPopulation = { alpha: 6.4, beta: 1.05, sigma: 0.5, erdf, mStarRange: [8, 11.5] };
export const GRID = { zSlice: 0.25, mStar: [8, 11.5, 0.125] as const };
export const ERRORS = { ex: 0.25, eyMeas: 0.15 };

export async function simulateAndFit(survey: SurveySpec, n: number, rng: Rng, steps: number) {
  const sim = simulateSample(cosmo, survey, recipe, TRUTH, n, ERRORS, rng);
  const built = buildSelectionTables(cosmo, survey, { halpha: recipe }, sim.objects.map((o) => ({ field: 0, line: 'halpha' as const, z: o.z })), undefined, GRID);
  const data = sim.objects.map((o, i) => ({ x: o.x, ex: o.ex, y: o.y, ey: ERRORS.eyMeas, table: built.index[i] as number }));
  const opts = { walkers: 12, steps, burn: Math.round(steps / 2) };
  const fit = await fitRelation({ data, tables: built.tables, grids: built.grids, erdf }, rng, opts);
  const naive = await fitRelation({ data: data.map((d) => ({ ...d, table: 0 })), tables: [naiveTable(built.grids)], grids: built.grids, erdf }, rng, opts);
  return { sim, built, fit, naive };
}

