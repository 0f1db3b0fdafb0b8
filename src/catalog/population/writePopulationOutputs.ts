import { writeFile } from 'node:fs/promises';
import { openParquetWriter, type CellValue, type ParquetColumn } from '../parquet/parquetWriter.ts';
import { checkPopulationTargets } from './checkPopulationTargets.ts';
import { POPULATION_METADATA_KEY } from './populationSignature.ts';
import { StagedFiles } from './stagedFiles.ts';
import type { ObjectVolume } from './objectVolumes.ts';
import type { PopulationPaths } from './populationPaths.ts';
import type { RelationFitSummary } from './relationFitRun.ts';
import type { DensityFunction } from './spaceDensities.ts';

async function writeTable(staged: StagedFiles, finalPath: string, columns: ParquetColumn[], rows: CellValue[][], kv: Record<string, string>): Promise<void> {
  const w = await openParquetWriter(staged.stage(finalPath), columns, { scratchDir: staged.scratchPath(finalPath, '.scratch') });
  try {
    for (const r of rows) w.appendRow(r);
    await w.finish(kv);
  } catch (e) {
    await w.abort();
    throw e;
  }
}

/**
 * Writes the population results as one set: every file under a temporary name, renamed into place only when all
 * were written, so a failure leaves any earlier results untouched. Just before the renames the targets are checked
 * again (checkPopulationTargets: files may have appeared there while the fit ran): a refused target leaves every
 * file as it was.
 * @param guard - the catalog read (never replaced) and whether files this tool did not write may be replaced.
 */
export async function writePopulationOutputs(
  paths: PopulationPaths, volumes: readonly ObjectVolume[], fieldNames: readonly string[], densities: readonly DensityFunction[],
  fit: RelationFitSummary | null, summary: object, guard: { catalogPath: string; force: boolean },
): Promise<void> {
  const staged = new StagedFiles();
  try {
    const kv = { [POPULATION_METADATA_KEY]: JSON.stringify({ summary: paths.summary }) };
    await writeTable(staged, paths.objects, [
      { name: 'id', kind: 'string' }, { name: 'survey_field', kind: 'string' }, { name: 'detection_line', kind: 'string' },
      { name: 'vmax_cmpc3', kind: 'float' }, { name: 'v_over_vmax', kind: 'float' }, { name: 'below_survey_limit', kind: 'bool' },
      { name: 'no_vmax_reason', kind: 'string' },
    ], volumes.map((v) => [v.id, v.field === null ? null : (fieldNames[v.field] ?? null), v.line, v.vmaxCmpc3, v.vOverVmax, v.belowLimit, v.reason]), kv);
    await writeTable(staged, paths.densities, [
      { name: 'quantity', kind: 'string' }, { name: 'z_lo', kind: 'float' }, { name: 'z_hi', kind: 'float' }, { name: 'bin_lo', kind: 'float' },
      { name: 'bin_hi', kind: 'float' }, { name: 'count', kind: 'int' }, { name: 'phi', kind: 'float' }, { name: 'phi_poisson_lo', kind: 'float' },
      { name: 'phi_poisson_hi', kind: 'float' }, { name: 'phi_p16', kind: 'float' }, { name: 'phi_p84', kind: 'float' },
    ], densities.flatMap((d) => d.bins.map((b) => [d.quantity, d.zRange[0], d.zRange[1], b.lo, b.hi, b.count, b.phi, b.phiLo, b.phiHi, b.phiP16, b.phiP84])), kv);
    const post: CellValue[][] = [];
    if (fit) {
      for (const [name, s] of [['selection_aware', fit.samples.intrinsic], ['naive', fit.samples.naive]] as const) {
        for (let k = 0; k < s.length / 3; k++) post.push([name, s[3 * k] as number, s[3 * k + 1] as number, s[3 * k + 2] as number]);
      }
    }
    await writeTable(staged, paths.posterior, [
      { name: 'fit', kind: 'string' }, { name: 'alpha', kind: 'float' }, { name: 'beta', kind: 'float' }, { name: 'sigma', kind: 'float' },
    ], post, kv);
    await writeFile(staged.stage(paths.summary), `${JSON.stringify(summary, null, 2)}\n`);
    await checkPopulationTargets(guard.catalogPath, paths, guard.force);
    await staged.commit();
  } catch (e) {
    await staged.discard();
    throw e;
  }
}
