import { METADATA_FORMAT, METADATA_KEY } from '../metadata/catalogMetadata.ts';
import { REJECTION_HEADER } from '../derive/rejectionReport.ts';
import { READINGS_METADATA_KEY } from '../readings/readingsMetadata.ts';

/** The files of a derive run. */
export type OutputRole = 'catalog' | 'meta' | 'rejections' | 'readings';

import { MAX_SIGNATURE_BYTES, parquetFooter, testFileSignature } from './signatureReader.ts';

/** The first bytes of the format name, which every version of our metadata starts with. */
const FORMAT_PREFIX = METADATA_FORMAT.slice(0, METADATA_FORMAT.indexOf('/') + 1);

/**
 * Whether the regular file at `path` was written by this tool in the given role:
 * - catalog: a Parquet file (PAR1 at both ends) whose footer holds the `dawn_census` key/value
 *   entry with our metadata format;
 * - meta: JSON whose `format` is `dawn-census-catalog/…` and whose `tool.name` is `dawn-census`;
 * - rejections: a CSV whose first line is exactly our header;
 * - readings: a Parquet file whose footer holds the `dawn_census_readings` key.
 * Reads at most 64 MB; any read error or oversize file counts as "not ours".
 */
export async function isToolOutput(path: string, role: OutputRole): Promise<boolean> {
  return testFileSignature(path, async (read, size) => {
    if (role === 'rejections') {
      const header = `${REJECTION_HEADER.join(',')}\n`;
      return (await read(0, header.length)).toString('utf8') === header;
    }
    if (role === 'meta') {
      if (size > MAX_SIGNATURE_BYTES) return false;
      const meta = JSON.parse((await read(0, size)).toString('utf8')) as { format?: unknown; tool?: { name?: unknown } };
      return typeof meta.format === 'string' && meta.format.startsWith(FORMAT_PREFIX) && meta.tool?.name === 'dawn-census';
    }
    const footer = await parquetFooter(read, size);
    if (!footer) return false;
    if (role === 'readings') return footer.includes(READINGS_METADATA_KEY, 0, 'latin1');
    return footer.includes(METADATA_KEY, 0, 'latin1') && footer.includes(FORMAT_PREFIX, 0, 'latin1');
  });
}
