import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { openTable } from '../../../src/catalog/readers/openTable.ts';
import type { TableFormat } from '../../../src/catalog/readers/types.ts';
import {
  makeTmpDir, readAll, refColumns, refRows, writeRefCsv, writeRefEcsv, writeRefFits, writeRefParquet, writeRefVotable,
} from './readerTestKit.ts';

const { dir, cleanup } = makeTmpDir('roundtrip');
afterAll(cleanup);

interface Case { format: TableFormat; file: string; write: (path: string, n: number) => void | Promise<void>; unit?: string }

// Each generator writes the same invented rows; every reader must give them back unchanged.
const cases: Case[] = [
  { format: 'csv', file: 'ref.csv', write: (p, n) => writeRefCsv(p, refRows(n)) },
  { format: 'tsv', file: 'ref.tsv', write: (p, n) => writeRefCsv(p, refRows(n), '\t') },
  { format: 'ecsv', file: 'ref.ecsv', write: (p, n) => writeRefEcsv(p, refRows(n)), unit: 'km / s' },
  { format: 'fits', file: 'ref.fits', write: (p, n) => writeRefFits(p, refRows(n)), unit: 'km/s' },
  { format: 'votable', file: 'ref.vot', write: (p, n) => writeRefVotable(p, refRows(n)), unit: 'km/s' },
  { format: 'parquet', file: 'ref.parquet', write: (p, n) => writeRefParquet(p, refRows(n)) },
];

describe.each(cases)('the $format reader', ({ format, file, write, unit }) => {
  it('round-trips a table with float, int, bool and string columns and nulls', async () => {
    const path = join(dir, `small-${file}`);
    await write(path, 12);
    const src = await openTable(path);
    try {
      expect(src.format).toBe(format);
      expect(src.nRows).toBe(12);
      expect(src.columns.map((c) => [c.name, c.kind])).toEqual([
        ['id', 'int'], ['z', 'float'], ['fwhm', 'float'], ['broad', 'bool'], ['name', 'string'],
      ]);
      if (unit !== undefined) expect(src.columns[2]!.unit).toBe(unit);
      const { columns } = await readAll(src);
      expect(columns).toEqual(refColumns(refRows(12)));
      // The generator does put nulls in every nullable column.
      for (const c of columns.slice(1)) expect(c).toContain(null);
    } finally {
      await src.close();
    }
  });

  it('gives identical rows for chunkRows 1, 7 and 10000, in full chunks with contiguous offsets', async () => {
    const path = join(dir, `chunked-${file}`);
    await write(path, 53);
    const src = await openTable(path);
    try {
      const expected = refColumns(refRows(53));
      for (const chunkRows of [1, 7, 10000]) {
        const { columns, chunkShapes } = await readAll(src, chunkRows);
        expect(columns).toEqual(expected);
        const sizes = chunkShapes.map((s) => s.nRows);
        const nFull = Math.floor(53 / chunkRows);
        const full: number[] = Array.from({ length: nFull }, () => chunkRows);
        expect(sizes).toEqual(53 % chunkRows === 0 ? full : [...full, 53 % chunkRows]);
        let offset = 0;
        for (const s of chunkShapes) {
          expect(s.rowOffset).toBe(offset);
          offset += s.nRows;
        }
      }
    } finally {
      await src.close();
    }
  });

  it('reads a header-only or zero-row table as zero rows', async () => {
    const path = join(dir, `empty-${file}`);
    await write(path, 0);
    const src = await openTable(path);
    try {
      expect(src.nRows).toBe(0);
      expect(src.columns.map((c) => c.name)).toEqual(['id', 'z', 'fwhm', 'broad', 'name']);
      const { chunkShapes } = await readAll(src, 7);
      expect(chunkShapes).toEqual([]);
    } finally {
      await src.close();
    }
  });
});
