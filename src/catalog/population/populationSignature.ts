import { MAX_SIGNATURE_BYTES, parquetFooter, testFileSignature } from '../outputs/signatureReader.ts';

/** The key/value entry every Parquet file of `dawn-census population` carries in its footer. */
export const POPULATION_METADATA_KEY = 'dawn_census_population';

/** The `format` of the population summary JSON. */
export const POPULATION_SUMMARY_FORMAT = 'dawn-census-population/1';

/** Keys every population summary has had, including those written before it carried `format`. */
const SUMMARY_KEYS = ['catalog', 'cosmology', 'seed', 'survey', 'densities', 'assumptions', 'references'];

/**
 * Whether the regular file at `path` was written by `dawn-census population` in the given role:
 * - summary: JSON with `format` `dawn-census-population/…` (or, as written before that key, every
 *   key of the summary: catalog, cosmology, seed, survey, densities, assumptions, references);
 * - table: a Parquet file (PAR1 at both ends) whose footer holds the `dawn_census_population` key.
 * Reads at most 64 MB; any read error or oversize file counts as "not ours".
 */
export async function isPopulationOutput(path: string, role: 'summary' | 'table'): Promise<boolean> {
  return testFileSignature(path, async (read, size) => {
    if (role === 'summary') {
      if (size > MAX_SIGNATURE_BYTES) return false;
      const json = JSON.parse((await read(0, size)).toString('utf8')) as unknown;
      if (typeof json !== 'object' || json === null || Array.isArray(json)) return false;
      const o = json as Record<string, unknown>;
      if (typeof o.format === 'string') return o.format.startsWith('dawn-census-population/');
      return SUMMARY_KEYS.every((k) => k in o);
    }
    const footer = await parquetFooter(read, size);
    return footer !== null && footer.includes(POPULATION_METADATA_KEY, 0, 'latin1');
  });
}
