import { getCosmology } from '../../core/cosmology/getCosmology.ts';
import { lineRedshiftWindow } from '../../core/population/lineRedshiftWindow.ts';
import { GEHRELS86_REFERENCE } from '../../core/population/poissonInterval.ts';
import { RELATION_PIVOT } from '../../core/population/relationLikelihood.ts';
import type { LineId } from '../../core/derive/types.ts';
import type { CensusConfig } from '../config/CensusConfig.ts';
import { ConfigError } from '../config/ConfigError.ts';
import { checkPopulationTargets } from './checkPopulationTargets.ts';
import { objectVolumes } from './objectVolumes.ts';
import { POPULATION_SUMMARY_FORMAT } from './populationSignature.ts';
import { populationPaths, type PopulationPaths } from './populationPaths.ts';
import { readPopulationRows } from './readPopulationRows.ts';
import { relationFitRun, TAU_FACTOR, type SamplerRun } from './relationFitRun.ts';
import { spaceDensities } from './spaceDensities.ts';
import { writePopulationOutputs } from './writePopulationOutputs.ts';

/** What a population run did. */
export interface PopulationSummary {
  readonly paths: PopulationPaths;
  readonly objects: number;
  readonly withVmax: number;
  readonly belowLimit: number;
  readonly sentence: string | null;
  /** How the selection-aware fit's sampler ran (null without a fit). */
  readonly sampler: SamplerRun | null;
}

/**
 * `dawn-census population`: V_max and space densities of a derived catalog, and the selection-aware fit of its
 * black-hole–host relation, under the config's `survey:` block. Writes the results beside the catalog as one set.
 * @param config - the validated config (must have `survey`).
 * @param catalogPath - the derived catalog (Parquet written by `derive`).
 * @param label - the config as named in messages.
 * @param onStep - progress of the relation fit (sampler steps done, the step cap).
 * @param options - `force`: replace output files `dawn-census population` did not write (never the catalog or a special
 *   file); `threads`: worker threads for the selection-aware likelihood (the results do not depend on it).
 * Throws OutputRefused, before reading the catalog, when an output may not be written (see checkPopulationTargets).
 */
export async function runPopulation(
  config: CensusConfig, catalogPath: string, label: string, onStep?: (done: number, total: number) => void,
  options: { force?: boolean; threads?: number } = {},
): Promise<PopulationSummary> {
  const survey = config.survey;
  if (!survey) throw new ConfigError(`${label}: no survey block: describe the survey's fields, limits and spectrograph range under survey: (see README)`);
  const searched = new Set<LineId>(survey.spec.fields.flatMap((f) => Object.keys(f.limits) as LineId[]));
  if (![...searched].some((l) => lineRedshiftWindow(l, survey.spec.lamObsRangeAngstrom))) {
    const [a, b] = survey.spec.lamObsRangeAngstrom;
    throw new ConfigError(`${label}: survey.wavelength_range_angstrom [${a}, ${b}] excludes every line the fields search (${[...searched].join(', ')}) at every redshift`);
  }
  await checkPopulationTargets(catalogPath, populationPaths(catalogPath), options.force ?? false);
  const cosmo = getCosmology(config.settings.cosmology);
  const rows = await readPopulationRows(catalogPath, survey.fieldColumn, survey.limitColumns, survey.fluxScale);
  const volumes = objectVolumes(rows, survey, cosmo, catalogPath);
  const densities = spaceDensities(rows, volumes, survey, cosmo, config.settings.seed);
  const fit = await relationFitRun(rows, volumes, survey, config.settings, cosmo, onStep, options.threads ?? 1);
  const paths = populationPaths(catalogPath);
  const withVmax = volumes.filter((v) => v.vmaxCmpc3 !== null).length;
  const belowLimit = volumes.filter((v) => v.belowLimit).length;
  const { samples: _drop, ...fitOut } = fit ?? { samples: null };
  void _drop;
  const summary = {
    format: POPULATION_SUMMARY_FORMAT,
    catalog: catalogPath,
    cosmology: config.settings.cosmology,
    seed: config.settings.seed,
    survey: {
      fields: survey.spec.fields.map((f) => ({ name: f.name, areaArcmin2: f.areaArcmin2, sourcePlaneAreaArcmin2: f.sourcePlaneAreaArcmin2 ?? null })),
      wavelengthRangeAngstrom: survey.spec.lamObsRangeAngstrom, minFwhmKms: survey.spec.minFwhmKms, minSnr: survey.spec.minSnr,
    },
    objects: rows.length, withVmax, belowSurveyLimit: belowLimit,
    densities: densities.map((d) => ({ quantity: d.quantity, zRange: d.zRange, bins: d.bins })),
    relation: fit ? { ...fitOut, pivotLogMstar: RELATION_PIVOT } : null,
    relationNote: fit ? null : 'fewer than 8 objects with a V_max and a host mass: no relation fit',
    assumptions: {
      eddingtonRatio: survey.fit.eddingtonRatio,
      mStarRange: survey.fit.mStarRange,
      // steps: what the selection-aware fit ran (it stops once the kept chain is TAU_FACTOR autocorrelation times long).
      sampler: {
        walkers: survey.fit.walkers, move: 'differential evolution (affine-invariant ensemble)', steps: fit?.sampler.intrinsic.stepsRun ?? survey.fit.steps, stepCap: survey.fit.steps, burn: survey.fit.burn,
        stopRule: `kept chain ≥ ${TAU_FACTOR} autocorrelation times`, converged: fit?.sampler.intrinsic.converged ?? null,
      },
    },
    references: {
      vmax: 'Schmidt 1968, ApJ 151, 393; fields combined as Avni & Bahcall 1980, ApJ 235, 694',
      poisson: GEHRELS86_REFERENCE,
      sampler: 'ensemble MCMC with the differential-evolution move: ter Braak 2006, Statistics and Computing 16, 239; Nelson et al. 2014, ApJS 210, 11; stop rule and τ estimate: Foreman-Mackey et al. 2013, PASP 125, 306',
      selection: 'selection inside the likelihood, as in Li et al. 2024 (arXiv:2403.00074); our own implementation',
    },
  };
  await writePopulationOutputs(paths, volumes, survey.spec.fields.map((f) => f.name), densities, fit, summary, { catalogPath, force: options.force ?? false });
  return { paths, objects: rows.length, withVmax, belowLimit, sentence: fit?.sentence ?? null, sampler: fit?.sampler.intrinsic ?? null };
}
