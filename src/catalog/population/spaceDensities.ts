import type { Cosmology } from '../../core/cosmology/cosmology.ts';
import { binnedDensity, type DensityBin, type DensityMember } from '../../core/population/binnedDensity.ts';
import { comovingVolumeMpc3Sr } from '../../core/population/comovingVolume.ts';
import { fieldSolidAngleSr } from '../../core/population/surveySpec.ts';
import { createRng } from '../../core/random/createRng.ts';
import { seedFor } from '../../core/random/seedFor.ts';
import { splitNormal } from '../../core/random/splitNormal.ts';
import type { SurveyConfig } from '../config/SurveyConfig.ts';
import type { ObjectVolume } from './objectVolumes.ts';
import type { PopulationRow } from './readPopulationRows.ts';

/** One binned function: which quantity, which redshift range, its bins. */
export interface DensityFunction {
  readonly quantity: 'log_mbh' | 'log_lbol';
  readonly zRange: readonly [number, number];
  readonly bins: DensityBin[];
}

/** Monte Carlo draws of each object's value for the spread of the binned functions. */
export const DENSITY_DRAWS = 200;

/**
 * Black-hole mass functions and bolometric luminosity functions (1/V_max) per redshift range. Each object's value
 * is redrawn DENSITY_DRAWS times from a split normal through its 16th and 84th percentiles, seeded by (seed, id).
 */
export function spaceDensities(
  rows: readonly PopulationRow[], volumes: readonly ObjectVolume[], survey: SurveyConfig, cosmo: Cosmology, seed: number,
): DensityFunction[] {
  const out: DensityFunction[] = [];
  const omega = survey.spec.fields.reduce((a, f) => a + fieldSolidAngleSr(f), 0);
  for (const quantity of ['log_mbh', 'log_lbol'] as const) {
    const edges = quantity === 'log_mbh' ? survey.densities.logMbhEdges : survey.densities.logLbolEdges;
    for (const zRange of survey.densities.zRanges) {
      const members: DensityMember[] = [];
      rows.forEach((r, i) => {
        const v = volumes[i] as ObjectVolume;
        if (v.vmaxCmpc3 === null || !(v.vmaxCmpc3 > 0) || r.z === null || r.z < zRange[0] || r.z >= zRange[1]) return;
        const [x, p16, p84] = quantity === 'log_mbh' ? [r.logMbh, r.logMbhP16, r.logMbhP84] : [r.logLbol, r.logLbolP16, r.logLbolP84];
        if (x === null) return;
        const rng = createRng(seedFor(seed, `${r.id}|${quantity}`));
        const lo = p16 === null ? 0 : Math.max(x - p16, 0);
        const hi = p84 === null ? 0 : Math.max(p84 - x, 0);
        const xDraws = new Float64Array(DENSITY_DRAWS);
        for (let k = 0; k < DENSITY_DRAWS; k++) xDraws[k] = lo === 0 && hi === 0 ? x : splitNormal(rng, x, lo, hi);
        members.push({ x, xDraws, vmaxCmpc3: v.vmaxCmpc3 });
      });
      const ceiling = omega * comovingVolumeMpc3Sr(cosmo, zRange[0], zRange[1]);
      out.push({ quantity, zRange, bins: binnedDensity(members, edges, ceiling) });
    }
  }
  return out;
}
