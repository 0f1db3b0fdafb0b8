import { describe, expect, it } from 'vitest';
import { detectionLinear } from '../../../src/core/population/detectionModel.ts';
import { buildSelectionTables, naiveTable } from '../../../src/core/population/selectionTables.ts';
import { schechterPerDex, stellarMassFunctionAt } from '../../../src/core/population/stellarMassFunctions.ts';
import type { SurveySpec } from '../../../src/core/population/surveySpec.ts';
import { cosmo, recipe } from '../../helpers/populationInjection.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const LIMIT = { kind: 'constant' as const, fluxCgs: 3e-18 };
const survey: SurveySpec = {
  fields: [
    { name: 'A', areaArcmin2: 100, limits: { halpha: LIMIT } },
    { name: 'B', areaArcmin2: 40, limits: { halpha: { kind: 'constant', fluxCgs: 3e-18 } } },
    { name: 'C', areaArcmin2: 10, limits: { halpha: { kind: 'constant', fluxCgs: 6e-18 }, hbeta: { kind: 'constant', fluxCgs: 6e-18 } } },
  ],
  lamObsRangeAngstrom: [27000, 53000],
  minFwhmKms: 1000,
  minSnr: 0,
};
const crit = (limit: { kind: 'constant'; fluxCgs: number }) => ({ limit, lamObsRangeAngstrom: survey.lamObsRangeAngstrom, minFwhmKms: survey.minFwhmKms });
const opts = { zSlice: 0.1, mStar: [7, 12, 0.1] as const };

describe('buildSelectionTables', () => {
  it('lays the stellar-mass grid from the first node to the last at the given step', () => {
    // Closed form: 7, 7.1, …, 12 is 51 nodes.
    const { grids } = buildSelectionTables(cosmo, survey, { halpha: recipe }, [], undefined, opts);
    expect(grids.mStar.length).toBe(51);
    expectClose(grids.mStar[0] as number, 7, { atol: 1e-12, source: 'closed form: first node' });
    expectClose(grids.mStar[50] as number, 12, { atol: 1e-12, source: 'closed form: last node' });
  });

  it('shares a table within a redshift slice and between fields with the same limit, and evaluates it at the slice\'s centre', () => {
    // z = 5.01 and 5.09 lie in the slice [5.0, 5.1) (centre 5.05); 5.11 in the next (centre 5.15). Fields A and B have
    // the same limit, C another.
    const sites = [
      { field: 0, line: 'halpha' as const, z: 5.01 },
      { field: 1, line: 'halpha' as const, z: 5.09 },
      { field: 0, line: 'halpha' as const, z: 5.11 },
      { field: 2, line: 'halpha' as const, z: 5.02 },
    ];
    const built = buildSelectionTables(cosmo, survey, { halpha: recipe }, sites, undefined, opts);
    expect(built.index).toEqual([0, 0, 1, 2]);
    expect(built.tables.length).toBe(3);
    const expectLinear = (t: number, z: number, fluxCgs: number): void => {
      const want = detectionLinear(cosmo, recipe, crit({ kind: 'constant', fluxCgs }), z);
      const got = built.tables[t]!.linear!;
      for (const k of ['a0', 'aM', 'aL', 'b0', 'bM', 'bU', 'bL'] as const) expectClose(got[k], want[k], { rtol: 1e-12, source: `internal: the criteria at the slice's centre z = ${z}, ${k}` });
    };
    expectLinear(0, 5.05, 3e-18);
    expectLinear(1, 5.15, 3e-18);
    expectLinear(2, 5.05, 6e-18);
    const smf = stellarMassFunctionAt(5.05);
    built.grids.mStar.forEach((m, j) => expectClose(built.tables[0]!.massPrior[j] as number, schechterPerDex(smf, m), { rtol: 1e-12, source: 'internal: the mass function at the slice\'s centre' }));
    expect(built.tables[0]!.calibrationScatter).toBe(recipe.calibration.scatterDex);
  });

  it('evaluates a slice that straddles the end of the line\'s window at the window\'s end', () => {
    // Hα leaves 53000 Å at z = 53000/6564.61 − 1 = 7.0737; z = 7.05 is in the slice [7.0, 7.25) of width 0.25, whose
    // centre 7.125 is outside the window.
    const built = buildSelectionTables(cosmo, survey, { halpha: recipe }, [{ field: 0, line: 'halpha', z: 7.05 }], undefined, { zSlice: 0.25, mStar: [7, 12, 0.1] });
    const zMax = 53000 / 6564.61 - 1;
    const want = detectionLinear(cosmo, recipe, crit(LIMIT), zMax);
    expect(built.tables[0]!.linear!.possible).toBe(true);
    expectClose(built.tables[0]!.linear!.a0, want.a0, { rtol: 1e-12, source: 'internal: the criteria at the window\'s end' });
  });

  it('uses an object\'s own limit in place of the field\'s, sharing a table when two agree to 0.01 dex', () => {
    // log10 2e-18 = −17.699 and log10 2.005e-18 = −17.698 both round to −17.70; 4e-18 does not. The table's limit is
    // the rounded one, 10^−17.70.
    const sites = [
      { field: 0, line: 'halpha' as const, z: 5.01, limitCgs: 2e-18 },
      { field: 2, line: 'halpha' as const, z: 5.02, limitCgs: 2.005e-18 },
      { field: 0, line: 'halpha' as const, z: 5.03, limitCgs: 4e-18 },
      { field: 0, line: 'halpha' as const, z: 5.04 },
    ];
    const built = buildSelectionTables(cosmo, survey, { halpha: recipe }, sites, undefined, opts);
    expect(built.index).toEqual([0, 0, 1, 2]);
    const want = detectionLinear(cosmo, recipe, crit({ kind: 'constant', fluxCgs: 10 ** -17.7 }), 5.05);
    expectClose(built.tables[0]!.linear!.a0, want.a0, { atol: 1e-12, source: 'closed form: the limit 10^−17.70 at z = 5.05' });
  });

  it('refuses a site without a forward recipe or a flux limit', () => {
    expect(() => buildSelectionTables(cosmo, survey, { halpha: recipe }, [{ field: 3, line: 'halpha', z: 5 }], undefined, opts)).toThrow('no forward recipe or flux limit for halpha in field 3');
    expect(() => buildSelectionTables(cosmo, survey, { halpha: recipe }, [{ field: 2, line: 'hbeta', z: 5 }], undefined, opts)).toThrow('no forward recipe or flux limit for hbeta in field 2');
    expect(() => buildSelectionTables(cosmo, survey, { halpha: recipe }, [{ field: 0, line: 'hbeta', z: 5 }], undefined, opts)).toThrow('no forward recipe or flux limit for hbeta in field 0');
  });
});

describe('naiveTable', () => {
  it('has a flat prior over the grid and no selection', () => {
    const t = naiveTable({ mStar: Float64Array.from([8, 9, 10]) });
    expect([...t.massPrior]).toEqual([1, 1, 1]);
    expect(t.linear).toBeNull();
    expect(t.calibrationScatter).toBe(0);
  });
});
