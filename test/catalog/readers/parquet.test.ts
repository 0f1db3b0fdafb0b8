import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { openTable } from '../../../src/catalog/readers/openTable.ts';
import { duckdbRun, makeTmpDir, readAll } from './readerTestKit.ts';

const { dir, cleanup } = makeTmpDir('parquet');
afterAll(cleanup);

let n = 0;
async function read(select: string, copyOptions = '') {
  const path = join(dir, `t${n++}.parquet`);
  await duckdbRun(`COPY (${select}) TO '${path}' (FORMAT parquet${copyOptions})`);
  const src = await openTable(path);
  try {
    return { src, ...(await readAll(src, 2)) };
  } finally {
    await src.close();
  }
}

describe('the Parquet reader', () => {
  // (DuckDB writes HUGEINT to Parquet as DOUBLE, so 128-bit integers cannot be tested this way.)
  it('maps DuckDB integer, float, decimal, boolean, text and date types to kinds', async () => {
    const { src, columns } = await read(`SELECT -1::TINYINT a, 2::SMALLINT b, 3::INTEGER c, 4::BIGINT d, 5::UTINYINT e, 6::UBIGINT f,
      1.5::FLOAT h, 2.25::DOUBLE i, 3.75::DECIMAL(6,2) j, true k, 'txt' l, DATE '2024-02-29' m,
      TIMESTAMP '2024-02-29 12:30:00' o, 'x'::ENUM('x','y') p`);
    expect(src.columns.map((c) => c.kind)).toEqual(['int', 'int', 'int', 'int', 'int', 'int', 'float', 'float', 'float', 'bool', 'string', 'string', 'string', 'string']);
    expect(columns.map((c) => c[0])).toEqual([-1, 2, 3, 4, 5, 6, 1.5, 2.25, 3.75, true, 'txt', '2024-02-29', '2024-02-29 12:30:00', 'x']);
  });

  it('keeps NaN in float columns (Parquet has real nulls) and NULL as null', async () => {
    const { columns } = await read(`SELECT * FROM (VALUES ('NaN'::DOUBLE, 1), (NULL, NULL), ('-inf'::DOUBLE, 3)) t(x, y)`);
    expect(columns).toEqual([[NaN, null, -Infinity], [1, null, 3]]);
  });

  it('reads a BIGINT column beyond 2^53 as exact decimal text', async () => {
    const { src, columns } = await read(`SELECT * FROM (VALUES (9007199254740993::BIGINT), (-3::BIGINT)) t(id)`);
    expect(src.columns[0]!.kind).toBe('string');
    expect(columns).toEqual([['9007199254740993', '-3']]);
  });

  it('puts key-value metadata into meta and takes units and descriptions from an Astropy table_meta_yaml entry', async () => {
    const yaml = 'datatype:\\n- {name: fwhm, unit: km / s, datatype: float64, description: line width}\\nmeta: !!omap\\n- {catalog: invented}\\n';
    const { src } = await read(`SELECT 1.0::DOUBLE fwhm`, `, KV_METADATA {origin: 'invented', table_meta_yaml: E'${yaml}'}`);
    expect(src.columns).toEqual([{ name: 'fwhm', kind: 'float', unit: 'km / s', description: 'line width', fileType: 'DOUBLE' }]);
    expect(src.meta).toEqual({ origin: 'invented', catalog: 'invented' });
  });

  // The YAML below follows what astropy 5.2.1 with pyarrow 25.0.1 writes for a MaskedColumn (see
  // test/fixtures/readers/astropy-catalog.parquet and make_astropy_fixtures.py).
  const masked = (cls: string) =>
    "datatype:\\n- {name: x, datatype: float64}\\n- {name: x.mask, datatype: bool}\\nmeta: !!omap\\n- __serialized_columns__:\\n    x:\\n" +
    `      __class__: ${cls}\\n      data: !astropy.table.SerializedColumn {name: x}\\n      mask: !astropy.table.SerializedColumn {name: x.mask}\\n`;

  it("reads astropy's masked column as missing where its .mask column is true (or null), and drops the .mask column", async () => {
    const { src, columns } = await read(
      `SELECT * FROM (VALUES (1.5, false), (2.5, true), (3.5, NULL)) t(x, "x.mask")`,
      `, KV_METADATA {table_meta_yaml: E'${masked('astropy.table.column.MaskedColumn')}'}`,
    );
    expect(src.columns.map((c) => c.name)).toEqual(['x']);
    expect(columns).toEqual([[1.5, null, null]]);
    expect(src.meta).toEqual({});
  });

  it('leaves columns alone when the serialized entry is not a masked column pair', async () => {
    const { src, columns } = await read(
      `SELECT * FROM (VALUES (1.5, false), (2.5, true)) t(x, "x.mask")`,
      `, KV_METADATA {table_meta_yaml: E'${masked('astropy.time.core.Time')}'}`,
    );
    expect(src.columns.map((c) => c.name)).toEqual(['x', 'x.mask']);
    expect(columns).toEqual([[1.5, 2.5], [false, true]]);
    expect(src.meta).toHaveProperty('__serialized_columns__');
  });

  it('leaves columns alone when the named mask column is not boolean', async () => {
    const { src, columns } = await read(
      `SELECT * FROM (VALUES (1.5, 0), (2.5, 1)) t(x, "x.mask")`,
      `, KV_METADATA {table_meta_yaml: E'${masked('astropy.table.column.MaskedColumn')}'}`,
    );
    expect(src.columns.map((c) => c.name)).toEqual(['x', 'x.mask']);
    expect(columns).toEqual([[1.5, 2.5], [0, 1]]);
  });
});
