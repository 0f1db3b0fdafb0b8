import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { openTable } from '../../../src/catalog/readers/openTable.ts';
import { TEXT_READ_BYTES } from '../../../src/catalog/readers/textChunks.ts';
import { TOKENIZE_SLICE_CHARS } from '../../../src/catalog/readers/csv.ts';
import { makeTmpDir, readAll } from './readerTestKit.ts';

const { dir, cleanup } = makeTmpDir('csv');
afterAll(cleanup);

let n = 0;
async function read(content: string | Buffer, ext = 'csv', chunkRows?: number) {
  const path = join(dir, `t${n++}.${ext}`);
  writeFileSync(path, content);
  const src = await openTable(path);
  return { src, ...(await readAll(src, chunkRows)) };
}

describe('the CSV reader', () => {
  it('follows RFC 4180 quoting: delimiters, doubled quotes and line breaks inside quotes', async () => {
    const { src, columns } = await read('"na,me","x"\n"a,b","say ""hi"""\n"two\r\nlines","3"\nplain,4\n');
    expect(src.columns.map((c) => c.name)).toEqual(['na,me', 'x']);
    expect(columns).toEqual([['a,b', 'two\r\nlines', 'plain'], ['say "hi"', '3', '4']]);
    expect(src.columns[1]!.kind).toBe('string');
  });

  it('skips the comment lines above the header and reads a # line after it as data', async () => {
    const { src, columns } = await read('# produced by hand\n#  second note\nid,b\n1,"x\n# not a comment"\n#9,y\n#last,z');
    expect(src.meta).toEqual({ comments: ['produced by hand', 'second note'] });
    expect(columns).toEqual([['1', '#9', '#last'], ['x\n# not a comment', 'y', 'z']]);
  });

  it('reads a numeric column holding a leading zero as text, so 0042 stays 0042', async () => {
    const { src, columns } = await read('code,n,x\n0042,0,-0.5\n7,10,00.25\n');
    expect(src.columns.map((c) => c.kind)).toEqual(['string', 'int', 'string']);
    expect(columns).toEqual([['0042', '7'], [0, 10], ['-0.5', '00.25']]);
  });

  it('reads a gzip-compressed CSV the same as the plain file', async () => {
    const { gzipSync } = await import('node:zlib');
    const text = 'id,z\nA,5.5\nB,6\n';
    const path = join(dir, 'packed.csv.gz');
    writeFileSync(path, gzipSync(text));
    const src = await openTable(path);
    expect(src.format).toBe('csv');
    expect((await readAll(src, 1)).columns).toEqual([['A', 'B'], [5.5, 6]]);
  });

  it('skips lines starting with the configured comment prefix anywhere, and keeps other # lines as data', async () => {
    const path = join(dir, 'prefix.csv');
    writeFileSync(path, '% note\nid,b\n1,x\n% between rows\n#2,y\n');
    const src = await openTable(path, { commentPrefix: '%' });
    expect((await readAll(src)).columns).toEqual([['1', '#2'], ['x', 'y']]);
  });

  it('reads UTF-8 with a byte-order mark and CRLF line ends', async () => {
    const { src, columns } = await read('\uFEFFname,z\r\nnaïve,1.5\r\n東京,2\r\n');
    expect(src.columns.map((c) => c.name)).toEqual(['name', 'z']);
    expect(columns).toEqual([['naïve', '東京'], [1.5, 2]]);
  });

  it('reads a 100 kB quoted field holding commas, quotes and newlines intact', async () => {
    const big = 'x,y "q" z\n'.repeat(10_000) + 'end';
    expect(big.length).toBeGreaterThan(100_000);
    const quoted = `"${big.replace(/"/g, '""')}"`;
    const { columns } = await read(`id,blob,after\n1,${quoted},ok\n2,short,ok\n`);
    expect(columns[1]![0]).toBe(big);
    expect(columns).toEqual([[1, 2], [big, 'short'], ['ok', 'ok']]);
  });

  it('decodes a multi-byte character that straddles the read-buffer boundary', async () => {
    // Put the 4-byte emoji across the end of the first read (TEXT_READ_BYTES bytes).
    const prefix = 'a\n';
    const fill = 'x'.repeat(TEXT_READ_BYTES - prefix.length - 2);
    const { columns } = await read(`${prefix}${fill}😀tail\n`);
    expect(columns[0]![0]).toBe(`${fill}😀tail`);
  });

  it('reads rows whole where a tokenizing slice ends inside a quoted line break, a CRLF or a surrogate pair', async () => {
    // The reader tokenizes each read TOKENIZE_SLICE_CHARS characters at a time; place one of
    // each awkward cut exactly on the first three slice ends, and read in chunks of 7 rows.
    const L = TOKENIZE_SLICE_CHARS;
    let text = 'id,text\r\n';
    const want: [number, string][] = [];
    let id = 0;
    const row = (t: string, raw = t): void => {
      want.push([++id, t]);
      text += `${id},${raw}\r\n`;
    };
    /** Filler rows until `text` is exactly `length` characters long. */
    const fillTo = (length: number): void => {
      while (length - text.length > 120) row('y'.repeat(90));
      const head = `${id + 1},`.length + 2;
      row('z'.repeat(length - text.length - head));
      expect(text.length).toBe(length);
    };
    // Fill to near the cut first, then with one row to the exact place (the row after it has id + 2).
    // 1. Inside a quoted field, between the CR and the LF of its line break.
    fillTo(L - 100);
    fillTo(L - `${id + 2},"ab\r`.length);
    row('ab\r\ncd', '"ab\r\ncd"');
    // 2. Between the CR and the LF that end a record.
    fillTo(2 * L - 100);
    fillTo(2 * L - `${id + 2},end`.length - 1);
    row('end');
    // 3. Between the two halves of a surrogate pair, in an unquoted field.
    fillTo(3 * L - 100);
    fillTo(3 * L - `${id + 2},x`.length - 1);
    row('x😀y');
    fillTo(3 * L + 500);
    expect(text.slice(L - 1, L + 1)).toBe('\r\n');
    expect(text.slice(2 * L - 1, 2 * L + 1)).toBe('\r\n');
    expect(text.charCodeAt(3 * L - 1)).toBe(0xd83d);
    for (const chunkRows of [7, 100_000]) {
      const { columns } = await read(text, 'csv', chunkRows);
      expect(columns[0]).toEqual(want.map((w) => w[0]));
      expect(columns[1]).toEqual(want.map((w) => w[1]));
    }
  });

  it('treats empty and whitespace-only cells, and quoted empty strings, as null and trims unquoted cells', async () => {
    const { columns } = await read('a, b ,c\n 1 ,  ,""\n2,x,\n');
    expect(columns).toEqual([[1, 2], [null, 'x'], [null, null]]);
  });

  it('skips blank lines and names an unnamed header cell col<N>', async () => {
    const { src, columns } = await read(',z\n\n0,1\n   \n1,2\n\n');
    expect(src.columns.map((c) => c.name)).toEqual(['col1', 'z']);
    expect(columns).toEqual([[0, 1], [1, 2]]);
  });

  it('infers int, float, bool and string kinds from every cell', async () => {
    const { src, columns } = await read([
      'i,f,special,b,s,mixed,none,bigid',
      '1,1,NaN,true,a,1,,9007199254740993',
      '-2,2.5e3,inf,FALSE,2,true,,12',
      '+3,.5,-Infinity,True,,2,,',
    ].join('\n'));
    expect(src.columns.map((c) => c.kind)).toEqual(['int', 'float', 'float', 'bool', 'string', 'string', 'float', 'string']);
    expect(columns).toEqual([
      [1, -2, 3],
      [1, 2500, 0.5],
      [NaN, Infinity, -Infinity],
      [true, false, true],
      ['a', '2', null],
      ['1', 'true', '2'],
      [null, null, null],
      // A 64-bit identifier beyond 2^53 would be rounded as a number: the column stays text.
      ['9007199254740993', '12', null],
    ]);
  });

  it('reads a header-only file as zero rows', async () => {
    const { src, chunkShapes } = await read('a,b\n');
    expect(src.nRows).toBe(0);
    expect(chunkShapes).toEqual([]);
  });

  it('reads TSV with tabs as the only delimiter', async () => {
    const { src, columns } = await read('name\tz\tnote\nobj one\t1.25\t\nobj, two\t\tsee "x"\n', 'tsv');
    expect(src.format).toBe('tsv');
    expect(columns).toEqual([['obj one', 'obj, two'], [1.25, null], [null, 'see "x"']]);
  });

  it('reads a file without a final newline and with lone CR line ends', async () => {
    expect((await read('a,b\r1,2\r3,4')).columns).toEqual([[1, 3], [2, 4]]);
  });
});
