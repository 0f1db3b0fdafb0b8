import { mkdtemp, readdir, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { DuckDBInstance } from '@duckdb/node-api';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { codePoints, openParquetWriter } from '../../../src/catalog/parquet/parquetWriter.ts';
import type { CellValue, ParquetColumn } from '../../../src/catalog/parquet/parquetWriter.ts';

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-parquet-'));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

const COLUMNS: ParquetColumn[] = [
  { name: 'id', kind: 'string' },
  { name: 'row', kind: 'int' },
  { name: 'x', kind: 'float' },
  { name: 'ok', kind: 'bool' },
  { name: 'odd "name", with comma', kind: 'float' },
];

async function writeRows(file: string, rows: CellValue[][], kv: Record<string, string>): Promise<void> {
  const w = await openParquetWriter(file, COLUMNS, { scratchDir: path.join(dir, `scratch-${path.basename(file)}`) });
  const buf: CellValue[] = new Array(COLUMNS.length);
  for (const r of rows) {
    for (let i = 0; i < r.length; i++) buf[i] = r[i];
    w.appendRow(buf);
  }
  expect(w.rowCount).toBe(rows.length);
  await w.finish(kv);
}

async function query(sql: string): Promise<Record<string, unknown>[]> {
  const db = await DuckDBInstance.create(':memory:');
  const con = await db.connect();
  try {
    return (await con.runAndReadAll(sql)).getRowObjectsJS() as Record<string, unknown>[];
  } finally {
    con.closeSync();
    db.closeSync();
  }
}

describe('openParquetWriter', () => {
  it('compresses every column chunk with zstd', async () => {
    const file = path.join(dir, 'z.parquet');
    await writeRows(file, Array.from({ length: 300 }, (_, i) => [`id${i}`, i, i / 7, i % 2 === 0, -i]), {});
    const codecs = await query(`SELECT DISTINCT compression FROM parquet_metadata('${file}')`);
    expect(codecs).toEqual([{ compression: 'ZSTD' }]);
  });

  it('writes the rows in insertion order with their kinds, nulls for null, undefined and NaN', async () => {
    const file = path.join(dir, 'a.parquet');
    await writeRows(
      file,
      [
        ['b', 2, 1.5, true, -1],
        ['a', 1, Number.NaN, null, undefined],
        ['c', 3, null, false, 2.25],
      ],
      {},
    );
    const rows = await query(`SELECT * FROM '${file}'`);
    expect(rows).toEqual([
      { id: 'b', row: 2n, x: 1.5, ok: true, 'odd "name", with comma': -1 },
      { id: 'a', row: 1n, x: null, ok: null, 'odd "name", with comma': null },
      { id: 'c', row: 3n, x: null, ok: false, 'odd "name", with comma': 2.25 },
    ]);
  });

  it('stores key/value metadata, quotes included, readable with parquet_kv_metadata', async () => {
    const file = path.join(dir, 'kv.parquet');
    const json = JSON.stringify({ note: "it's \"quoted\"", n: [1, 2] });
    await writeRows(file, [['a', 1, 1, true, 1]], { dawn_census: json });
    const kv = await query(`SELECT decode(key) AS k, decode(value) AS v FROM parquet_kv_metadata('${file}')`);
    expect(kv).toContainEqual({ k: 'dawn_census', v: json });
  });

  it('gives byte-identical files for the same rows and metadata', async () => {
    const rows: CellValue[][] = Array.from({ length: 5000 }, (_, i) => [`o${i}`, i + 1, i / 7, i % 2 === 0, i % 3 ? i : null]);
    await writeRows(path.join(dir, 'one.parquet'), rows, { k: 'v' });
    await writeRows(path.join(dir, 'two.parquet'), rows, { k: 'v' });
    const [a, b] = await Promise.all([readFile(path.join(dir, 'one.parquet')), readFile(path.join(dir, 'two.parquet'))]);
    expect(a.length).toBeGreaterThan(0);
    expect(a.equals(b)).toBe(true);
  });

  it('converts values as DuckDB\'s node-api does: numbers, text, bigints and booleans across kinds', async () => {
    const file = path.join(dir, 'kinds.parquet');
    await writeRows(
      file,
      [
        [7, 5n, '2.5', 1, -0],
        ['x', true, Infinity, 0, -Infinity],
        ['y', 2.5, 'abc', 'yes', 1e-320],
        ['z', false, 3n, '', Number.MAX_VALUE],
      ],
      {},
    );
    const rows = await query(`SELECT * FROM '${file}'`);
    expect(rows).toEqual([
      { id: '7', row: 5n, x: 2.5, ok: true, 'odd "name", with comma': -0 },
      { id: 'x', row: 1n, x: Infinity, ok: false, 'odd "name", with comma': -Infinity },
      // A non-integer number is no BIGINT (null); text that is no number is NaN, so null.
      { id: 'y', row: null, x: null, ok: true, 'odd "name", with comma': 1e-320 },
      { id: 'z', row: 0n, x: 3, ok: false, 'odd "name", with comma': Number.MAX_VALUE },
    ]);
    expect(Object.is(rows[0]!['odd "name", with comma'], -0)).toBe(true);
  });

  it('keeps each chunk\'s nulls to itself: a chunk without nulls after one with many, and back', async () => {
    // DuckDB takes rows 2048 at a time (one data chunk): rows 0–2047 have nulls in every column,
    // rows 2048–4095 none, rows 4096–5000 nulls in one column only.
    const n = 5001;
    const file = path.join(dir, 'chunks.parquet');
    const w = await openParquetWriter(file, COLUMNS, { scratchDir: path.join(dir, 'scratch-chunks') });
    const isNull = (i: number, col: number): boolean => (i < 2048 ? (i + col) % 3 === 0 : i >= 4096 && col === 2 && i % 7 === 0);
    const buf: CellValue[] = new Array(COLUMNS.length);
    for (let i = 0; i < n; i++) {
      buf[0] = isNull(i, 0) ? null : `o${i}`;
      buf[1] = isNull(i, 1) ? null : i;
      buf[2] = isNull(i, 2) ? Number.NaN : i / 4;
      buf[3] = isNull(i, 3) ? undefined : i % 2 === 1;
      buf[4] = isNull(i, 4) ? null : -i;
      w.appendRow(buf);
    }
    await w.finish({});
    const got = await query(`SELECT * FROM '${file}'`);
    expect(got).toHaveLength(n);
    const want = (i: number): Record<string, unknown> => ({
      id: isNull(i, 0) ? null : `o${i}`,
      row: isNull(i, 1) ? null : BigInt(i),
      x: isNull(i, 2) ? null : i / 4,
      ok: isNull(i, 3) ? null : i % 2 === 1,
      'odd "name", with comma': isNull(i, 4) ? null : -i,
    });
    for (let i = 0; i < n; i++) if (JSON.stringify(got[i], (_, v) => (typeof v === 'bigint' ? `${v}n` : v)) !== JSON.stringify(want(i), (_, v) => (typeof v === 'bigint' ? `${v}n` : v))) expect([i, got[i]]).toEqual([i, want(i)]);
  });

  it('keeps every row, in order, past one row group under a small memory limit', async () => {
    // 130,000 rows: more than one DuckDB row group (122,880 rows), so the transaction writes a
    // complete row group to the scratch file before COMMIT; 16MB is far below the rows' size.
    const n = 130_000;
    const file = path.join(dir, 'big.parquet');
    const w = await openParquetWriter(file, COLUMNS, { scratchDir: path.join(dir, 'scratch-big'), memoryLimit: '16MB' });
    const buf: CellValue[] = new Array(COLUMNS.length);
    for (let i = 0; i < n; i++) {
      buf[0] = `o${i}`;
      buf[1] = i + 1;
      buf[2] = i / 3;
      buf[3] = i % 2 === 0;
      buf[4] = i % 5 ? -i : null;
      w.appendRow(buf);
    }
    await w.finish({});
    const [stats] = await query(
      `SELECT count(*) AS n, count(*) FILTER (WHERE "row" = ordinal AND id = 'o' || (ordinal - 1) AND x = (ordinal - 1) / 3) AS matching,
              count("odd ""name"", with comma") AS non_null
       FROM (SELECT *, row_number() OVER () AS ordinal FROM '${file}')`,
    );
    expect(stats).toEqual({ n: BigInt(n), matching: BigInt(n), non_null: BigInt(n - Math.ceil(n / 5)) });
  });

  it('writes nothing when aborted', async () => {
    const file = path.join(dir, 'aborted.parquet');
    const w = await openParquetWriter(file, COLUMNS, { scratchDir: path.join(dir, 'scratch') });
    w.appendRow(['a', 1, 1, true, 1]);
    await w.abort();
    expect(await readdir(dir)).not.toContain('aborted.parquet');
  });
});

describe('codePoints', () => {
  it('counts Unicode code points as Python’s len does: a surrogate pair once, a lone surrogate once', () => {
    // Python 3: len('a') == 1, len('σ') == 1, len('\U0001F52D') == 1, len('\ud800') == 1 (closed forms).
    expect(codePoints('')).toBe(0);
    expect(codePoints('abc')).toBe(3);
    expect(codePoints('3σ')).toBe(2);
    expect(codePoints('\u{1F52D}x')).toBe(2);
    expect(codePoints('\u{1F52D}\u{1F52D}')).toBe(2);
    expect(codePoints('\ud800')).toBe(1);
    expect(codePoints('\ud800x')).toBe(2);
    expect(codePoints('x\udc00\ud800')).toBe(3);
  });
});

describe('the text lengths a writer records', () => {
  it('keeps the longest value of each text column in code points, ignoring nulls; 0 for a column without values', async () => {
    const cols: ParquetColumn[] = [
      { name: 'id', kind: 'string' },
      { name: 'note', kind: 'string' },
      { name: 'empty', kind: 'string' },
      { name: 'x', kind: 'float' },
    ];
    const w = await openParquetWriter(path.join(dir, 'len.parquet'), cols, { scratchDir: path.join(dir, 'scratch-len') });
    w.appendRow(['a', '\u{1F52D}\u{1F52D}\u{1F52D}', null, 1]);
    w.appendRow(['abcd', 'xy', undefined, 2]);
    w.appendRow(['ab', null, null, 3]);
    expect([...w.textLengths()]).toEqual([['id', 4], ['note', 3], ['empty', 0]]);
    await w.abort();
  });
});
