import { describe, expect, it } from 'vitest';
import { fitRelation } from '../../../src/core/population/fitRelation.ts';
import { buildSelectionTables } from '../../../src/core/population/selectionTables.ts';
import { simulateSample } from '../../../src/core/population/simulateSample.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { createRelationLikelihoodPool } from '../../../src/catalog/population/relationLikelihoodPool.ts';
import { cosmo, erdf, ERRORS, GRID, recipe, surveyWith, TRUTH } from '../../helpers/populationInjection.ts';

describe('createRelationLikelihoodPool', () => {
  it('gives the same posterior samples as the in-thread likelihood, with one thread or two', { timeout: 120_000 }, async () => {
    const survey = surveyWith(1000);
    const sim = simulateSample(cosmo, survey, recipe, TRUTH, 2000, ERRORS, createRng(31));
    const built = buildSelectionTables(cosmo, survey, { halpha: recipe }, sim.objects.map((o) => ({ field: 0, line: 'halpha' as const, z: o.z })), undefined, GRID);
    const problem = { data: sim.objects.map((o, i) => ({ x: o.x, ex: o.ex, y: o.y, ey: ERRORS.eyMeas, table: built.index[i] as number })), tables: built.tables, grids: built.grids, erdf };
    const opts = { walkers: 8, steps: 30, burn: 10 };
    const inThread = await fitRelation(problem, createRng(5), opts);
    for (const threads of [1, 2]) {
      const pool = createRelationLikelihoodPool(threads, problem);
      try {
        const pooled = await fitRelation(problem, createRng(5), opts, pool.evaluate);
        expect(Array.from(pooled.samples), `${threads} thread(s)`).toEqual(Array.from(inThread.samples));
      } finally {
        await pool.close();
      }
    }
  });
});
