import { writeFile } from 'node:fs/promises';
import { toolVersion } from '../metadata/toolVersion.ts';
import { openParquetWriter, type CellValue } from '../parquet/parquetWriter.ts';
import { parquetStandardKeys } from '../publish/parquetStandardKeys.ts';
import type { TableDoc } from '../publish/tableDoc.ts';
import { POPULATION_TABLES } from './populationColumns.ts';
import { checkPopulationTargets } from './checkPopulationTargets.ts';
import { POPULATION_METADATA_KEY } from './populationSignature.ts';
import { StagedFiles } from './stagedFiles.ts';
import type { ObjectVolume } from './objectVolumes.ts';
import type { PopulationPaths } from './populationPaths.ts';
import type { RelationFitSummary } from './relationFitRun.ts';
import type { DensityFunction } from './spaceDensities.ts';

async function writeTable(staged: StagedFiles, finalPath: string, table: Omit<TableDoc, 'meta'>, rows: CellValue[][], kv: Record<string, string>): Promise<void> {
  const w = await openParquetWriter(staged.stage(finalPath), table.columns, { scratchDir: staged.scratchPath(finalPath, '.scratch') });
  try {
    for (const r of rows) w.appendRow(r);
    const doc: TableDoc = { ...table, meta: [['tool', `dawn-census ${toolVersion()}`]] };
    await w.finish({ ...kv, ...parquetStandardKeys(doc, w.textLengths()) });
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
    await writeTable(staged, paths.objects, POPULATION_TABLES.objects, volumes.map((v) => [v.id, v.field === null ? null : (fieldNames[v.field] ?? null), v.line, v.vmaxCmpc3, v.vOverVmax, v.belowLimit, v.reason]), kv);
    await writeTable(staged, paths.densities, POPULATION_TABLES.densities, densities.flatMap((d) => d.bins.map((b) => [d.quantity, d.zRange[0], d.zRange[1], b.lo, b.hi, b.count, b.phi, b.phiLo, b.phiHi, b.phiP16, b.phiP84])), kv);
    const post: CellValue[][] = [];
    if (fit) {
      for (const [name, s] of [['selection_aware', fit.samples.intrinsic], ['naive', fit.samples.naive]] as const) {
        for (let k = 0; k < s.length / 3; k++) post.push([name, s[3 * k] as number, s[3 * k + 1] as number, s[3 * k + 2] as number]);
      }
    }
    await writeTable(staged, paths.posterior, POPULATION_TABLES.posterior, post, kv);
    await writeFile(staged.stage(paths.summary), `${JSON.stringify(summary, null, 2)}\n`);
    await checkPopulationTargets(guard.catalogPath, paths, guard.force);
    await staged.commit();
  } catch (e) {
    await staged.discard();
    throw e;
  }
}
