import path from 'node:path';
import type { ExportFormat } from '../config/publicationConfig.ts';
import { displayPath } from '../config/loadConfig.ts';
import type { OutputPaths } from '../derive/outputPaths.ts';
import { checkTarget, runInput } from './checkTarget.ts';
import { isToolExport } from './exportSignature.ts';
import { isToolOutput } from './toolSignature.ts';
import type { OutputRole } from './toolSignature.ts';

const ROLE_NAME: Record<OutputRole, string> = {
  catalog: 'output',
  meta: 'metadata sidecar',
  rejections: 'rejection report',
  readings: 'readings table',
};

const FORMAT_NAME: Record<ExportFormat, string> = { ecsv: 'ECSV copy', votable: 'VOTable copy', fits: 'FITS copy' };

/**
 * Checks, before anything is written, that the outputs of a derive run may be (re)placed: the
 * Parquet catalog, its sidecars and the extra copies of `exports` (`--format`, `output.formats`).
 * Each follows {@link checkTarget}: never the input or a special file (even with `force`), and an
 * existing file only when this tool wrote it in the same role (see isToolOutput, isToolExport),
 * unless `force`. Throws OutputRefused with a one-line message naming the file.
 */
export async function checkOutputTargets(
  inputPath: string, paths: OutputPaths, force: boolean, exports: readonly { format: ExportFormat; path: string }[] = [],
): Promise<void> {
  const input = await runInput(inputPath);
  for (const role of ['catalog', 'meta', 'rejections', 'readings'] as const) {
    const target = path.resolve(paths[role]);
    await checkTarget(target, input, {
      what: role === 'catalog' ? `the output ${displayPath(target)}` : `the ${ROLE_NAME[role]} ${displayPath(target)} (beside the output)`,
      isOurs: (f) => isToolOutput(f, role),
      force,
      ...(role === 'catalog' ? { folderMessage: `the output ${displayPath(target)} is a folder; give a file name, e.g. ${displayPath(path.join(target, 'catalog.parquet'))}` } : {}),
    });
  }
  for (const e of exports) {
    const target = path.resolve(e.path);
    await checkTarget(target, input, { what: `the ${FORMAT_NAME[e.format]} ${displayPath(target)} (beside the output)`, isOurs: (f) => isToolExport(f, e.format), force });
  }
}
