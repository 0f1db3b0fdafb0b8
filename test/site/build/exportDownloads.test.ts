import { describe, expect, it } from 'vitest';
import type { CatalogMetadata } from '../../../src/catalog/metadata/catalogMetadata.ts';
import { csvUnitsComment } from '../../../src/site/build/exportDownloads.ts';
import { BOUNDS_NOTE } from '../../../src/site/text/boundsNote.ts';

const meta = (columns: { name: string; unit?: string; description: string }[]) =>
  ({ title: 'Invented catalog', tool: { name: 'dawn-census', version: '0.1.0' }, input: { sha256: 'ab'.repeat(32) }, columns }) as unknown as CatalogMetadata;

describe('csvUnitsComment', () => {
  it('says in the header of the catalog CSV how its _is_limit columns mark bounds, and documents each of them', () => {
    const text = csvUnitsComment(meta([
      { name: 'log_mbh', unit: 'dex(solMass)', description: 'log10 of the virial black-hole mass' },
      { name: 'log_mbh_is_limit', description: 'True where log_mbh (an upper limit) is a bound' },
    ]));
    const lines = text.split('\n');
    expect(lines[1]).toBe(`# ${BOUNDS_NOTE}`);
    expect(lines).toContain('# log_mbh_is_limit: True where log_mbh (an upper limit) is a bound');
    expect(lines.filter((l) => l.startsWith('# WARNING'))).toEqual([]);
  });

  it('adds no note on bounds to a table that cannot hold any', () => {
    expect(csvUnitsComment(meta([{ name: 'z', description: 'Redshift' }]))).not.toContain('Bounds:');
  });
});
