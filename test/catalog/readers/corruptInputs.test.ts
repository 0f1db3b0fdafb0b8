import { writeFileSync, readFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { CatalogError } from '../../../src/catalog/readers/CatalogError.ts';
import { openTable } from '../../../src/catalog/readers/openTable.ts';
import { card, fitsBinTable, q } from './fitsFixture.ts';
import { duckdbRun, makeTmpDir, readAll, refRows, writeRefParquet } from './readerTestKit.ts';

const { dir, cleanup } = makeTmpDir('corrupt');
afterAll(cleanup);

interface Bad {
  what: string;
  file: string;
  /** Writes the bad file at `path`. */
  write: (path: string) => void | Promise<void>;
  /** The exact one-line message, given the path. */
  message: (path: string) => string;
}

const ecsv = (lines: string[]) => lines.join('\n') + '\n';
const ECSV_AB = ['# %ECSV 1.0', '# ---', '# datatype:', '# - {name: a, datatype: float64}', '# - {name: b, datatype: int32}'];
const vot = (fields: string, rows: string) => `<?xml version="1.0"?>
<VOTABLE version="1.4">
<RESOURCE>
<TABLE>
${fields}
<DATA>
<TABLEDATA>
${rows}
</TABLEDATA>
</DATA>
</TABLE>
</RESOURCE>
</VOTABLE>
`;
const FIELDS_XY = '<FIELD name="x" datatype="double"/><FIELD name="y" datatype="int"/>';
const fitsTable = (nRows: number) => fitsBinTable([{ name: 'x', tform: 'D', values: Array.from({ length: nRows }, (_, i) => i) }]);

/** Raw FITS bytes from header card lists (each header padded to whole 2880-byte blocks, END added). */
const rawFits = (...headers: [string, string?][][]) =>
  Buffer.from(headers.map((h) => {
    const t = h.map(([k, v]) => card(k, v)).join('') + card('END');
    return t.padEnd(Math.ceil(t.length / 2880) * 2880, ' ');
  }).join(''), 'latin1');
const PRIMARY: [string, string][] = [['SIMPLE', 'T'], ['BITPIX', '8'], ['NAXIS', '0'], ['EXTEND', 'T']];
const bintable = (over: Record<string, string>): [string, string][] =>
  Object.entries({ XTENSION: "'BINTABLE'", BITPIX: '8', NAXIS: '2', NAXIS1: '8', NAXIS2: '1', PCOUNT: '0', GCOUNT: '1', TFIELDS: '1', TTYPE1: "'x'", TFORM1: "'D'", ...over });

const cases: Bad[] = [
  // Bounds (issue 8, "Never harm"): each stops with one line instead of looping or filling memory or disk.
  {
    what: 'zero-width rows with NAXIS2 = 1e12', file: 'zerowidth.fits',
    write: (p) => writeFileSync(p, rawFits(PRIMARY, bintable({ NAXIS1: '0', NAXIS2: '1000000000000', TFORM1: "'0A'" }))),
    message: (p) => `${p}: HDU 2: NAXIS1 = 0: rows of zero bytes hold no values (NAXIS2 = 1000000000000)`,
  },
  {
    what: 'a negative NAXIS1 in the primary HDU', file: 'negative.fits',
    write: (p) => writeFileSync(p, rawFits([['SIMPLE', 'T'], ['BITPIX', '8'], ['NAXIS', '1'], ['NAXIS1', '-2880']], bintable({}))),
    message: (p) => `${p}: HDU 1: keyword NAXIS1 = -2880 is out of range (0 to 9007199254740991)`,
  },
  {
    what: 'a negative NAXIS2 in the table', file: 'negrows.fits',
    write: (p) => writeFileSync(p, rawFits(PRIMARY, bintable({ NAXIS2: '-5' }))),
    message: (p) => `${p}: HDU 2: keyword NAXIS2 = -5 is out of range (0 to 9007199254740991)`,
  },
  {
    what: 'an absurd NAXIS1', file: 'wide.fits',
    write: (p) => writeFileSync(p, rawFits(PRIMARY, bintable({ NAXIS1: '2000000000', TFORM1: "'2000000000A'" }))),
    message: (p) => `${p}: HDU 2: keyword NAXIS1 = 2000000000 is out of range (0 to 1048576)`,
  },
  {
    what: 'TFIELDS beyond 999', file: 'tfields.fits',
    write: (p) => writeFileSync(p, rawFits(PRIMARY, bintable({ TFIELDS: '5000' }))),
    message: (p) => `${p}: HDU 2: keyword TFIELDS = 5000 is out of range (1 to 999)`,
  },
  {
    what: 'a header with no END card in 1000 blocks', file: 'endless.fits',
    write: (p) => writeFileSync(p, Buffer.from(card('SIMPLE', 'T') + card('COMMENT', undefined).repeat(36 * 1001), 'latin1')),
    message: (p) => `${p}: HDU 1: FITS header has no END card within 1000 blocks (2880000 bytes)`,
  },
  {
    what: 'more than 1000 HDUs before a table', file: 'manyhdus.fits',
    write: (p) => writeFileSync(p, rawFits(PRIMARY, ...Array.from({ length: 1000 }, () => [['XTENSION', "'IMAGE'"], ['BITPIX', '8'], ['NAXIS', '0']] as [string, string][]))),
    message: (p) => `${p}: no binary table among the first 1000 HDUs`,
  },
  {
    what: 'an unquoted field of 5 MB', file: 'field.csv',
    write: (p) => writeFileSync(p, `a,b
1,${'x'.repeat(5 << 20)}
`),
    message: (p) => `${p}: line 2: a field longer than 4194304 characters (the limit for one cell; is a quote left open?)`,
  },
  {
    what: 'a quoted field of 5 MB', file: 'quoted.csv',
    write: (p) => writeFileSync(p, `a,b
1,2
3,"${'x\n'.repeat(5 << 19)}`),
    message: (p) => `${p}: line 3: a field longer than 4194304 characters (the limit for one cell; is a quote left open?)`,
  },
  {
    what: 'a row of 40 MB in 4 MB fields', file: 'longrow.csv',
    write: (p) => writeFileSync(p, `${Array.from({ length: 10 }, (_, i) => `c${i}`).join(',')}\n${Array.from({ length: 10 }, () => 'x'.repeat(4 << 20)).join(',')}\n`),
    message: (p) => `${p}: line 2: a record longer than 33554432 characters (the limit for one row)`,
  },
  {
    what: 'a header of 10001 columns', file: 'manycols.csv',
    write: (p) => writeFileSync(p, `${Array.from({ length: 10001 }, (_, i) => `c${i}`).join(',')}
`),
    message: (p) => `${p}: line 1: more than 10000 fields in one record (the limit for columns)`,
  },
  {
    what: 'a VOTable tag that never closes', file: 'opentag.vot',
    write: (p) => writeFileSync(p, `<?xml version="1.0"?>\n<VOTABLE version="1.4"><RESOURCE><TABLE name="${'a'.repeat(9 << 20)}`),
    message: (p) => `${p}: line 2: markup longer than 8388608 characters without its end (is a tag, comment or quote left open?)`,
  },
  {
    what: 'a 5 MB TD cell', file: 'bigtd.vot',
    write: (p) => writeFileSync(p, vot('<FIELD name="s" datatype="char" arraysize="*"/>', `<TR><TD>${'x'.repeat(5 << 20)}</TD></TR>`)),
    message: (p) => `${p}: line 8: text longer than 4194304 characters in one TD cell`,
  },
  {
    what: 'a BINARY stream that is not base64', file: 'b64.vot',
    write: (p) => writeFileSync(p, vot(FIELDS_XY, '').replace('<TABLEDATA>\n\n</TABLEDATA>', '<BINARY><STREAM encoding="base64">AA!A</STREAM></BINARY>')),
    message: (p) => `${p}: the BINARY stream is not valid base64`,
  },
  {
    what: 'a BINARY stream in another file', file: 'href.vot',
    write: (p) => writeFileSync(p, vot(FIELDS_XY, '').replace('<TABLEDATA>\n\n</TABLEDATA>', '<BINARY><STREAM href="data.bin"/></BINARY>')),
    message: (p) => `${p}: line 7: a BINARY STREAM with href (data in another file) is not supported`,
  },
  {
    what: 'a gzip-compressed Parquet file', file: 'packed.parquet.gz',
    write: (p) => writeFileSync(p, Buffer.from([0x1f, 0x8b, 8, 0, 0, 0, 0, 0, 0, 0, 0, 0])),
    message: (p) => `${p}: gzip-compressed Parquet is not read (Parquet compresses its own pages); decompress it first (gunzip)`,
  },
  // CSV / TSV
  { what: 'a ragged row', file: 'ragged.csv', write: (p) => writeFileSync(p, 'a,b,c\n1,2,3\n4,5\n'), message: (p) => `${p}: line 3: 2 fields, header has 3` },
  { what: 'a row with too many fields', file: 'long.tsv', write: (p) => writeFileSync(p, 'a\tb\n1\t2\t3\n'), message: (p) => `${p}: line 2: 3 fields, header has 2` },
  { what: 'an unterminated quote', file: 'quote.csv', write: (p) => writeFileSync(p, 'a,b\n1,2\n3,"abc\n4,5\n'), message: (p) => `${p}: line 3: unterminated quoted field (the opening quote is never closed)` },
  {
    what: 'an invalid UTF-8 byte', file: 'latin1.csv',
    write: (p) => writeFileSync(p, Buffer.concat([Buffer.from('name,z\na,1\nb,2\n'), Buffer.from([0x63, 0xe9, 0x2c, 0x33, 0x0a])])),
    message: (p) => `${p}: line 4: invalid UTF-8 byte sequence`,
  },
  { what: 'a truncated multi-byte character at the end', file: 'cut.csv', write: (p) => writeFileSync(p, Buffer.concat([Buffer.from('a\nx'), Buffer.from([0xe6, 0x9d])])), message: (p) => `${p}: line 2: invalid UTF-8 byte sequence` },
  { what: 'an empty file', file: 'empty.csv', write: (p) => writeFileSync(p, ''), message: (p) => `${p}: empty file: no header line` },
  { what: 'a file with only comments', file: 'comments.csv', write: (p) => writeFileSync(p, '# nothing\n\n# here\n'), message: (p) => `${p}: empty file: no header line` },
  { what: 'duplicate column names', file: 'dup.csv', write: (p) => writeFileSync(p, '# x\nz,id,z\n1,2,3\n'), message: (p) => `${p}: line 2: duplicate column name "z" (columns 1 and 3)` },
  // ECSV
  { what: 'a missing ECSV signature', file: 'nosig.ecsv', write: (p) => writeFileSync(p, 'a b\n1 2\n'), message: (p) => `${p}: line 1: not an ECSV file: the first line must be "# %ECSV <version>"` },
  { what: 'no YAML start', file: 'noyaml.ecsv', write: (p) => writeFileSync(p, ecsv(['# %ECSV 1.0', '# datatype: []', 'a'])), message: (p) => `${p}: line 2: ECSV header must start its YAML with "# ---"` },
  {
    what: 'malformed YAML', file: 'yaml.ecsv',
    write: (p) => writeFileSync(p, ecsv(['# %ECSV 1.0', '# ---', '# datatype:', '# - {name: a, datatype: float64', '# meta: x', 'a', '1'])),
    // Text after "malformed ECSV YAML header:" is the yaml 2.9.1 parser's message (internal regression).
    message: (p) => `${p}: line 5: malformed ECSV YAML header: Flow map in block collection must be sufficiently indented and end with a }`,
  },
  { what: 'no datatype list', file: 'nodt.ecsv', write: (p) => writeFileSync(p, ecsv(['# %ECSV 1.0', '# ---', '# meta: {a: 1}', 'a', '1'])), message: (p) => `${p}: ECSV header has no "datatype" list of columns` },
  { what: 'an unsupported datatype', file: 'cplx.ecsv', write: (p) => writeFileSync(p, ecsv(['# %ECSV 1.0', '# ---', '# datatype:', '# - {name: c, datatype: complex128}', 'c', '1'])), message: (p) => `${p}: ECSV header: column "c" has unsupported datatype "complex128"` },
  { what: 'an array subtype', file: 'arr.ecsv', write: (p) => writeFileSync(p, ecsv(['# %ECSV 1.0', '# ---', '# datatype:', '# - {name: v, datatype: string, subtype: \'float64[3]\'}', 'v', '"[1,2,3]"'])), message: (p) => `${p}: ECSV header: column "v" has subtype "float64[3]" (array or JSON cells are not supported)` },
  { what: 'a data header that disagrees with the YAML', file: 'mismatch.ecsv', write: (p) => writeFileSync(p, ecsv([...ECSV_AB, 'a c', '1 2'])), message: (p) => `${p}: line 6: data header line lists columns (a, c) but the YAML header declares (a, b)` },
  { what: 'a value of the wrong type', file: 'badval.ecsv', write: (p) => writeFileSync(p, ecsv([...ECSV_AB, 'a b', '1 2', '2.5 x1'])), message: (p) => `${p}: line 8: column "b" (int32): "x1" is not a valid int32 value` },
  { what: 'a ragged ECSV row', file: 'ragged.ecsv', write: (p) => writeFileSync(p, ecsv([...ECSV_AB, 'a b', '1 2 3'])), message: (p) => `${p}: line 7: 3 fields, header has 2` },
  { what: 'a bad delimiter', file: 'delim.ecsv', write: (p) => writeFileSync(p, ecsv([...ECSV_AB, "# delimiter: ';'", 'a;b'])), message: (p) => `${p}: ECSV delimiter must be " " or ",", got ";"` },
  // FITS
  { what: 'a file that is not FITS', file: 'text.fits', write: (p) => writeFileSync(p, 'id,z\n1,2\n'), message: (p) => `${p}: not a FITS file: it does not begin with "SIMPLE  ="` },
  {
    what: 'truncated table data', file: 'trunc.fits',
    // 500 rows × 8 bytes = 4000 bytes of data after two 2880-byte headers; keep 1000 of them.
    write: (p) => writeFileSync(p, fitsTable(500).subarray(0, 2 * 2880 + 1000)),
    message: (p) => `${p}: truncated FITS data: expected 4000 bytes, found 1000`,
  },
  { what: 'a header without END', file: 'noend.fits', write: (p) => writeFileSync(p, fitsBinTable([{ name: 'x', tform: 'D', values: [1] }], { omitTableEnd: true })), message: (p) => `${p}: HDU 2: FITS header has no END card (the file ends inside the header)` },
  { what: 'a FITS file with no binary table', file: 'image.fits', write: (p) => writeFileSync(p, fitsTable(3).subarray(0, 2880)), message: (p) => `${p}: no binary table extension (XTENSION = 'BINTABLE') in this FITS file` },
  { what: 'an array column', file: 'array.fits', write: (p) => writeFileSync(p, fitsBinTable([{ name: 'flux', tform: '3E', values: [0] }])), message: (p) => `${p}: HDU 2: column "flux" (TFORM1 = '3E') is an array of 3 values; only scalar columns are supported (remove the column or split it into scalar columns)` },
  {
    what: 'an unsupported TFORM type', file: 'complex.fits',
    write: (p) => writeFileSync(p, Buffer.from(fitsBinTable([{ name: 'c', tform: 'D', values: [0] }]).toString('latin1').replace("TFORM1  = 'D       '", "TFORM1  = 'C       '"), 'latin1')),
    message: (p) => `${p}: HDU 2: column "c" (TFORM1 = 'C'): FITS type C is not supported (use L, B, I, J, K, E, D or A)`,
  },
  {
    what: 'NAXIS1 that disagrees with the TFORMs', file: 'naxis1.fits',
    write: (p) => writeFileSync(p, fitsBinTable([{ name: 'x', tform: 'D', values: [0] }], { tableCards: [['TFIELDS', '1']] }).toString('latin1').replace('NAXIS1  =                    8', 'NAXIS1  =                   12')),
    message: (p) => `${p}: HDU 2: the columns' TFORMs add up to 8 bytes per row but NAXIS1 = 12`,
  },
  { what: 'a truncated gzip-compressed file', file: 'packed.fits.gz', write: (p) => writeFileSync(p, Buffer.from([0x1f, 0x8b, 8, 0, 0, 0, 0, 0])), message: (p) => `${p}: corrupt gzip data (unexpected end of file)` },
  // VOTable
  { what: 'a BINARY serialization', file: 'binary.vot', write: (p) => writeFileSync(p, vot(FIELDS_XY, '').replace('<TABLEDATA>\n\n</TABLEDATA>', '<BINARY><STREAM encoding="base64">AAAA</STREAM></BINARY>')), message: (p) => `${p}: the BINARY stream ends inside row 1 (truncated or corrupt data)` },
  { what: 'a mismatched closing tag', file: 'nest.vot', write: (p) => writeFileSync(p, vot(FIELDS_XY, '<TR><TD>1</TD><TD>2</TD></TR>\n<TR><TD>1</TR>')), message: (p) => `${p}: line 9: closing tag </TR> does not match <TD>` },
  {
    what: 'a document cut after an element', file: 'cut.vot',
    write: (p) => { const d = vot(FIELDS_XY, '<TR><TD>1</TD><TD>2</TD></TR>'); writeFileSync(p, d.slice(0, d.indexOf('<TR>'))); },
    message: (p) => `${p}: line 8: unexpected end of file: <TABLEDATA> opened on line 7 is not closed`,
  },
  { what: 'a document cut inside a tag', file: 'cut2.vot', write: (p) => writeFileSync(p, vot(FIELDS_XY, '').slice(0, 80)), message: (p) => `${p}: line 5: unexpected end of file inside markup` },
  { what: 'an unknown entity', file: 'entity.vot', write: (p) => writeFileSync(p, vot('<FIELD name="s" datatype="char" arraysize="*"/>', '<TR><TD>a&nbsp;b</TD></TR>')), message: (p) => `${p}: line 8: unknown entity "&nbsp;"` },
  { what: 'a row with a missing cell', file: 'cells.vot', write: (p) => writeFileSync(p, vot(FIELDS_XY, '<TR><TD>1</TD><TD>2</TD></TR>\n<TR><TD>3</TD></TR>')), message: (p) => `${p}: line 9: row 2 has 1 TD cells but the table has 2 FIELDs` },
  { what: 'a value that is not a number', file: 'value.vot', write: (p) => writeFileSync(p, vot(FIELDS_XY, '<TR><TD>abc</TD><TD>2</TD></TR>')), message: (p) => `${p}: line 8: column "x" (double): "abc" is not a valid double value` },
  { what: 'a numeric array FIELD', file: 'arr.vot', write: (p) => writeFileSync(p, vot('<FIELD name="v" datatype="float" arraysize="3"/>', '')), message: (p) => `${p}: FIELD "v" is an array (arraysize="3"); only scalar columns are supported (remove the column or split it into scalar columns)` },
  { what: 'an XML file that is not a VOTable', file: 'page.xml', write: (p) => writeFileSync(p, '<?xml version="1.0"?>\n<html><body/></html>\n'), message: (p) => `${p}: not a VOTable: no <VOTABLE> element at the start of the file` },
  { what: 'a VOTable without a TABLE', file: 'notable.vot', write: (p) => writeFileSync(p, '<VOTABLE><RESOURCE/></VOTABLE>'), message: (p) => `${p}: VOTable has no TABLE element` },
  // Parquet
  { what: 'a file that is not Parquet', file: 'text.parquet', write: (p) => writeFileSync(p, 'id,z\n1,2\n'), message: (p) => `${p}: not a Parquet file: it does not begin with "PAR1"` },
  {
    what: 'a truncated Parquet file', file: 'cut.parquet',
    write: async (p) => { await writeRefParquet(p, refRows(20)); writeFileSync(p, readFileSync(p).subarray(0, 300)); },
    message: (p) => `${p}: truncated Parquet file: it does not end with "PAR1"`,
  },
  {
    what: 'a nested LIST column', file: 'list.parquet',
    write: (p) => duckdbRun(`COPY (SELECT [1.0, 2.0]::DOUBLE[] AS xs) TO '${p}' (FORMAT parquet)`),
    message: (p) => `${p}: column "xs" has type DOUBLE[], which is not supported (only scalar number, boolean, text and date columns are read)`,
  },
];

describe('corrupt and truncated inputs', () => {
  it.each(cases)('reports $what ($file) with one exact line', async ({ file, write, message }) => {
    const path = join(dir, file);
    await write(path);
    const err = await openTable(path).then(async (src) => { try { await readAll(src); } finally { await src.close(); } return null; }, (e: unknown) => e);
    expect(err).toBeInstanceOf(CatalogError);
    expect((err as Error).message).toBe(message(path));
    expect((err as Error).message).not.toMatch(/\n/);
  });

  it('reports a Parquet file with a corrupt footer through DuckDB, in one line naming the file', async () => {
    const path = join(dir, 'garbled.parquet');
    await writeRefParquet(path, refRows(20));
    const bytes = readFileSync(path);
    bytes.writeUInt32LE(0x7fffffff, bytes.length - 8); // footer length far beyond the file size
    writeFileSync(path, bytes);
    const err = await openTable(path).then(async (src) => { await readAll(src); return null; }, (e: unknown) => e);
    expect(err).toBeInstanceOf(CatalogError);
    // The tail comes from DuckDB and may change between its versions: only our prefix is pinned.
    expect((err as Error).message.startsWith(`${path}: cannot read Parquet file: `)).toBe(true);
    expect((err as Error).message).not.toMatch(/\n/);
  });
});

describe('openTable', () => {
  it('refuses an unknown extension with the message that points at input.format', async () => {
    const path = join(dir, 'catalog.dat');
    writeFileSync(path, 'a\n1\n');
    await expect(openTable(path)).rejects.toThrow(new CatalogError(`unknown catalog format for "${path}": expected .csv, .tsv, .ecsv, .fits, .vot or .parquet (or set input.format in the config)`));
  });

  it('reads any extension when the format is given, and ignores the ECSV signature when csv is forced', async () => {
    const path = join(dir, 'catalog.dat');
    writeFileSync(path, '# %ECSV 1.0\na,b\n1,2\n');
    const src = await openTable(path, { format: 'csv' });
    expect(src.format).toBe('csv');
    expect((await readAll(src)).columns).toEqual([[1], [2]]);
  });

  it('picks the reader from upper- or lower-case extensions', async () => {
    const sub = join(dir, 'ext');
    mkdirSync(sub, { recursive: true });
    writeFileSync(join(sub, 'a.TAB'), 'x\ty\n1\t2\n');
    writeFileSync(join(sub, 'a.FIT'), fitsTable(2));
    writeFileSync(join(sub, 'a.xml'), vot(FIELDS_XY, '<TR><TD>1</TD><TD>2</TD></TR>'));
    await writeRefParquet(join(sub, 'a.pq'), refRows(2));
    const formats = [];
    for (const f of ['a.TAB', 'a.FIT', 'a.xml', 'a.pq']) {
      const src = await openTable(join(sub, f));
      formats.push(src.format);
      await src.close();
    }
    expect(formats).toEqual(['tsv', 'fits', 'votable', 'parquet']);
  });

  it('names a missing file and a directory', async () => {
    const missing = join(dir, 'nope.csv');
    await expect(openTable(missing)).rejects.toThrow(new CatalogError(`${missing}: no such file`));
    const folder = join(dir, 'folder.csv');
    mkdirSync(folder, { recursive: true });
    await expect(openTable(folder)).rejects.toThrow(new CatalogError(`${folder}: is a directory, not a catalog file`));
  });
});
