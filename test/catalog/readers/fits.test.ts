import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { openTable } from '../../../src/catalog/readers/openTable.ts';
import { fitsBinTable, q, type FitsFixtureColumn, type FitsFixtureOptions } from './fitsFixture.ts';
import { makeTmpDir, readAll } from './readerTestKit.ts';

const { dir, cleanup } = makeTmpDir('fits');
afterAll(cleanup);

let n = 0;
async function read(cols: FitsFixtureColumn[], opts?: FitsFixtureOptions, chunkRows?: number) {
  const path = join(dir, `t${n++}.fits`);
  writeFileSync(path, fitsBinTable(cols, opts));
  const src = await openTable(path);
  return { src, ...(await readAll(src, chunkRows)) };
}

describe('the FITS reader', () => {
  it('decodes L, B, I, J, K, E, D and A columns big-endian', async () => {
    const { src, columns } = await read([
      { name: 'l', tform: 'L', values: [true, false, null] },
      { name: 'b', tform: 'B', values: [0, 200, 255] },
      { name: 'i', tform: 'I', values: [-32768, 7, 32767] },
      { name: 'j', tform: '1J', values: [-2147483648, 0, 2147483647] },
      { name: 'k', tform: 'K', values: [-9007199254740991n, 0n, 9007199254740991n] },
      { name: 'e', tform: 'E', values: [1.5, -0.25, 3e38] },
      { name: 'd', tform: 'D', values: [Math.PI, -1e-300, 6.02214076e23] },
      { name: 'a', tform: '6A', values: ['abc', 'abcdef', 'a b'] },
    ]);
    expect(src.columns.map((c) => c.kind)).toEqual(['bool', 'int', 'int', 'int', 'int', 'float', 'float', 'string']);
    expect(columns).toEqual([
      [true, false, null],
      [0, 200, 255],
      [-32768, 7, 32767],
      [-2147483648, 0, 2147483647],
      [-9007199254740991, 0, 9007199254740991],
      [1.5, -0.25, Math.fround(3e38)],
      [Math.PI, -1e-300, 6.02214076e23],
      ['abc', 'abcdef', 'a b'],
    ]);
  });

  it('applies TNULL to integers before scaling and treats NaN floats as null', async () => {
    const { columns } = await read([
      { name: 'b', tform: 'B', tnull: 255, values: [1, 255, 3] },
      { name: 'i', tform: 'I', tnull: -999, values: [-999, 2, 3] },
      { name: 'j', tform: 'J', tnull: -1, tzero: '100', values: [5, -1, 0] },
      { name: 'k', tform: 'K', tnull: -9223372036854775808n, values: [1n, 2n, -9223372036854775808n] },
      { name: 'e', tform: 'E', values: [NaN, 1, 2] },
      { name: 'd', tform: 'D', tscal: 2, values: [1, NaN, 3] },
    ]);
    expect(columns).toEqual([[1, null, 3], [null, 2, 3], [105, null, 100], [1, 2, null], [null, 1, 2], [2, null, 6]]);
  });

  it('applies the TZERO integer conventions (−128 for signed bytes; 32768, 2^31 and 2^63 for unsigned) as integers', async () => {
    // FITS Standard 4.0, Table 19: TZERO values that map signed storage to unsigned integers.
    const { src, columns } = await read([
      { name: 'sb', tform: 'B', tzero: '-128', values: [0, 128, 255] },
      { name: 'u16', tform: 'I', tzero: '32768', values: [-32768, 0, 32767] },
      { name: 'u32', tform: 'J', tzero: '2147483648', values: [-2147483648, 0, 2147483647] },
      { name: 'u64', tform: 'K', tzero: '9223372036854775808', values: [-9223372036854775808n, -9223372036854775807n, -9223372036854775798n] },
    ]);
    expect(src.columns.map((c) => c.kind)).toEqual(['int', 'int', 'int', 'int']);
    expect(columns).toEqual([[-128, 0, 127], [0, 32768, 65535], [0, 2147483648, 4294967295], [0, 1, 10]]);
  });

  it('turns scaled integers (TSCAL, fractional TZERO) into floats', async () => {
    const { src, columns } = await read([
      { name: 'mag', tform: 'I', tscal: 0.001, tzero: '20', tnull: -32768, values: [0, 1500, -32768] },
      { name: 'half', tform: 'J', tzero: '0.5', values: [1, 2, 3] },
    ]);
    expect(src.columns.map((c) => c.kind)).toEqual(['float', 'float']);
    expect(columns[0]![0]).toBe(20);
    expect(columns[0]![1]).toBeCloseTo(21.5, 12); // 20 + 0.001 × 1500, computed by hand
    expect(columns[0]![2]).toBeNull();
    expect(columns[1]).toEqual([1.5, 2.5, 3.5]);
  });

  it('keeps a 64-bit column beyond 2^53 as exact decimal text', async () => {
    const { src, columns } = await read([{ name: 'id', tform: 'K', tnull: 0, values: [9007199254740993n, 0n, -42n] }]);
    expect(src.columns[0]!.kind).toBe('string');
    expect(columns).toEqual([['9007199254740993', null, '-42']]);
  });

  it('trims trailing blanks and stops strings at the first NUL, and an all-blank string is null', async () => {
    const { columns } = await read([{ name: 's', tform: '8A', values: ['ab  ', 'cd\0zz', '   ', ' lead'] }]);
    expect(columns).toEqual([['ab', 'cd', null, ' lead']]);
  });

  it('takes names, units, descriptions and UCDs from TTYPE, TUNIT, TCOMM and TUCD, and skips an image HDU', async () => {
    const { src } = await read(
      [{ name: 'fwhm', tform: 'E', unit: 'km/s', values: [1] }, { tform: 'J', values: [2] }],
      { imageBytes: 3000, primaryCards: [['ORIGIN', q('invented')], ['SEED', '42']], tableCards: [['EXTNAME', q('CAT')], ['TCOMM1', q('line width')], ['TUCD1', q('spect.line.width')], ['ORIGIN', q('table')]] },
    );
    expect(src.columns).toEqual([
      { name: 'fwhm', kind: 'float', unit: 'km/s', description: 'line width', ucd: 'spect.line.width' },
      { name: 'col2', kind: 'int' },
    ]);
    // Table keywords override the primary header's; structural keywords are left out.
    expect(src.meta).toEqual({ ORIGIN: 'table', SEED: 42, EXTNAME: 'CAT' });
  });

  it('joins CONTINUE long strings and reads quotes inside string values', async () => {
    const { src } = await read([{ name: 'x', tform: 'D', values: [1] }], {
      tableCards: [['LONGSTR', "'first part, &'"], ['CONTINUE', "'second part'"], ['QUOTED', "'it''s'"]],
    });
    expect(src.meta.LONGSTR).toBe('first part, second part');
    expect(src.meta.QUOTED).toBe("it's");
  });

  it('returns a table larger than one 4 MiB read intact in any chunk size', async () => {
    const rows = 3000; // 3000 rows × 2008 bytes ≈ 6 MB: several disk reads
    const ids = Array.from({ length: rows }, (_, i) => i);
    const text = ids.map((i) => `row-${i}`);
    const { columns } = await read([{ name: 'id', tform: 'D', values: ids }, { name: 's', tform: '2000A', values: text }], {}, 7);
    expect(columns).toEqual([ids, text]);
  });
});
