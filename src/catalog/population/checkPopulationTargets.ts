import path from 'node:path';
import { displayPath } from '../config/loadConfig.ts';
import { checkTarget, runInput } from '../outputs/checkTarget.ts';
import type { PopulationPaths } from './populationPaths.ts';
import { isPopulationOutput } from './populationSignature.ts';

/**
 * Checks, before anything is written, that the four population outputs may be (re)placed, by the
 * rules of the derive outputs (checkTarget): never the derived catalog they read nor a special
 * file, even with `force`; an existing file only when `dawn-census population` wrote it in the
 * same role, unless `force`. Throws OutputRefused with a one-line message naming the file.
 * @param catalogPath - the derived catalog the population step reads.
 */
export async function checkPopulationTargets(catalogPath: string, paths: PopulationPaths, force: boolean): Promise<void> {
  const input = await runInput(catalogPath);
  const roles: [keyof PopulationPaths, string, 'summary' | 'table'][] = [
    ['summary', 'population summary', 'summary'],
    ['objects', 'population table', 'table'],
    ['densities', 'densities table', 'table'],
    ['posterior', 'posterior samples', 'table'],
  ];
  for (const [key, name, role] of roles) {
    const target = path.resolve(paths[key]);
    await checkTarget(target, input, {
      what: `the ${name} ${displayPath(target)} (beside the catalog)`,
      isOurs: (f) => isPopulationOutput(f, role),
      force,
      remedy: 'move it away',
      elsewhere: 'derive the catalog under another name or in another folder',
    });
  }
}
