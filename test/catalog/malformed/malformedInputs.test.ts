/**
 * Malformed catalogs and configs run through the real command (`node bin/dawn-census.js derive`),
 * each in its own temporary folder. Catalog-level problems must exit with status 2, print one
 * exact line and write nothing — neither a new output nor a change to an earlier good output.
 * Row-level problems must exit with status 0, print each problem on stderr, list it in the
 * rejection report and keep the row in the Parquet catalog flagged `invalid_input`.
 *
 * Messages of the readers (CSV, ECSV, FITS, VOTable, Parquet) are pinned here as internal
 * regression values of their text; messages of the config and of the column and row checks are
 * the ones this project specifies.
 */
import { execFile } from 'node:child_process';
import { mkdir, mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { DuckDBInstance } from '@duckdb/node-api';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { card, fitsBinTable } from '../readers/fitsFixture.ts';
import { duckdbRun } from '../readers/readerTestKit.ts';

const BIN = fileURLToPath(new URL('../../../bin/dawn-census.js', import.meta.url));
const OUT = ['out.parquet', 'out.meta.json', 'out.rejections.csv'];

interface RunResult {
  status: number;
  stdout: string;
  stderr: string;
}

/** Runs the command in `cwd`; resolves with its exit status and output (never rejects on a non-zero status). */
function runCli(cwd: string, args: string[]): Promise<RunResult> {
  return new Promise((resolve, reject) => {
    execFile(process.execPath, [BIN, 'derive', ...args], { cwd, maxBuffer: 16 << 20, timeout: 120_000 }, (error, stdout, stderr) => {
      if (error && typeof error.code !== 'number') reject(error);
      else resolve({ status: error ? (error.code as number) : 0, stdout, stderr });
    });
  });
}

type FileBody = string | Buffer | ((path: string) => Promise<void>);

interface Case {
  what: string;
  /** Files to create in the case's folder (the catalog, and a config where the case needs one). */
  files: Record<string, FileBody>;
  /** The catalog argument. */
  catalog: string;
  /** Extra arguments (e.g. `-c census.config.yaml`). */
  args?: string[];
}

interface CatalogCase extends Case {
  /** The one line on stderr. */
  message: string;
  /** Set where only the start of the message is ours (the rest comes from a library). */
  prefixOnly?: boolean;
}

interface RowCase extends Case {
  /** Rows in the output catalog. */
  rows: number;
  /** Messages of the rejection report, in order (each is also on stderr, prefixed by the catalog name). */
  problems: string[];
  /** Extra checks on the output catalog. */
  check?: (out: Record<string, unknown>[]) => void;
}

// ---- file builders ------------------------------------------------------------------------------

const csv = (...lines: string[]): string => `${lines.join('\n')}\n`;
const GOOD_HEADER = 'id,z,fwhm_halpha,fwhm_halpha_err,lum_halpha,lum_halpha_err';
const GOOD_ROWS = ['M-1,5.5,2100,200,4.6e42,0.5e42', 'M-2,6.5,1200,150,2.3e42,0.3e42'];

const ecsv = (cols: string[], header: string, ...rows: string[]): string =>
  ['# %ECSV 1.0', '# ---', '# datatype:', ...cols.map((c) => `# - ${c}`), header, ...rows].join('\n') + '\n';

const vot = (rows: string): string => `<?xml version="1.0"?>
<VOTABLE version="1.4">
<RESOURCE>
<TABLE>
<FIELD name="id" datatype="char" arraysize="*"/><FIELD name="z" datatype="double"/>
<DATA>
<TABLEDATA>
${rows}
</TABLEDATA>
</DATA>
</TABLE>
</RESOURCE>
</VOTABLE>
`;

const fits50 = (): Buffer =>
  fitsBinTable([
    { name: 'id', tform: '8A', values: Array.from({ length: 50 }, (_, i) => `F-${i}`) },
    { name: 'z', tform: 'D', values: Array.from({ length: 50 }, () => 6) },
  ]);

/** One FITS header from [keyword, literal value] pairs, with END, padded to 2880-byte blocks. */
const fitsHeader = (cards: [string, string][]): Buffer => {
  const text = cards.map(([k, v]) => card(k, v)).join('') + card('END');
  return Buffer.from(text.padEnd(Math.ceil(text.length / 2880) * 2880, ' '), 'latin1');
};

const sqlText = (s: string): string => `'${s.replace(/'/g, "''")}'`;
const parquet = (select: string) => (path: string) => duckdbRun(`COPY (${select}) TO ${sqlText(path)} (FORMAT parquet)`);
const GOOD_PARQUET = "SELECT 'P-' || i::VARCHAR AS id, 5.0 + i / 10 AS z, 2000.0 AS fwhm_halpha, 1e42 AS lum_halpha FROM range(200) t(i)";

// ---- the table ----------------------------------------------------------------------------------

const catalogCases: CatalogCase[] = [
  // Formats truncated or corrupt (reader messages: internal regression).
  {
    what: 'a CSV with an unterminated quote',
    files: { 'bad.csv': csv(GOOD_HEADER, GOOD_ROWS[0]!, 'M-3,"5.0,2000,100,1e42,1e41', 'M-4,5.1,2000,100,1e42,1e41') },
    catalog: 'bad.csv',
    message: 'bad.csv: line 3: unterminated quoted field (the opening quote is never closed)',
  },
  {
    what: 'a CSV with a ragged (truncated) row',
    files: { 'bad.csv': csv(GOOD_HEADER, ...GOOD_ROWS, 'M-3,5.0,2000') },
    catalog: 'bad.csv',
    message: 'bad.csv: line 4: 3 fields, header has 6',
  },
  {
    what: 'a CSV with non-UTF-8 bytes',
    files: { 'bad.csv': Buffer.concat([Buffer.from(csv(GOOD_HEADER, GOOD_ROWS[0]!)), Buffer.from('M-\xe9,5,2000,100,1e42,1e41\n', 'latin1')]) },
    catalog: 'bad.csv',
    message: 'bad.csv: line 3: invalid UTF-8 byte sequence',
  },
  { what: 'an empty file', files: { 'empty.csv': '' }, catalog: 'empty.csv', message: 'empty.csv: empty file: no header line' },
  {
    what: 'a CSV with a column name given twice',
    files: { 'bad.csv': csv('id,z,z', 'A,5,6') },
    catalog: 'bad.csv',
    message: 'bad.csv: line 1: duplicate column name "z" (columns 2 and 3)',
  },
  {
    what: 'an ECSV with malformed YAML',
    files: { 'bad.ecsv': ['# %ECSV 1.0', '# ---', '# datatype:', '# - {name: id, datatype: string', '# meta: x', 'id', 'A'].join('\n') + '\n' },
    catalog: 'bad.ecsv',
    // The text after "malformed ECSV YAML header:" is the yaml 2.9.1 parser's.
    message: 'bad.ecsv: line 5: malformed ECSV YAML header: Flow map in block collection must be sufficiently indented and end with a }',
  },
  {
    what: 'an ECSV with text in a float64 column',
    files: { 'bad.ecsv': ecsv(['{name: id, datatype: string}', '{name: z, datatype: float64}'], 'id z', 'A 5.5', 'B six') },
    catalog: 'bad.ecsv',
    message: 'bad.ecsv: line 8: column "z" (float64): "six" is not a valid float64 value',
  },
  {
    what: 'an ECSV whose width column has a unit of the wrong dimension',
    files: {
      'bad.ecsv': ecsv(
        ['{name: id, datatype: string}', '{name: z, datatype: float64}', '{name: fwhm_halpha, unit: erg / s, datatype: float64}'],
        'id z fwhm_halpha',
        'A 5.5 2000',
      ),
    },
    catalog: 'bad.ecsv',
    message: 'bad.ecsv: column "fwhm_halpha" (fwhm_halpha): unit "erg / s" is a luminosity, expected a velocity (km s-1)',
  },
  {
    what: 'an ECSV whose width column holds booleans',
    files: { 'bad.ecsv': ecsv(['{name: id, datatype: string}', '{name: z, datatype: float64}', '{name: fwhm_halpha, datatype: bool}'], 'id z fwhm_halpha', 'A 5.5 True') },
    catalog: 'bad.ecsv',
    message: 'bad.ecsv: column "fwhm_halpha" (fwhm_halpha) holds true/false values; fwhm_halpha needs numbers',
  },
  {
    what: 'a truncated FITS file',
    // 50 rows × 16 bytes = 800 bytes of table data after the two 2880-byte headers; keep 300.
    files: { 'cut.fits': fits50().subarray(0, 2 * 2880 + 300) },
    catalog: 'cut.fits',
    message: 'cut.fits: truncated FITS data: expected 800 bytes, found 300',
  },
  {
    // Issue 8: this 5.8 KB file used to write rejections until the disk filled.
    what: 'a FITS table of zero-width rows with NAXIS2 = 1e12',
    files: {
      'zero.fits': Buffer.concat([
        fitsHeader([['SIMPLE', 'T'], ['BITPIX', '8'], ['NAXIS', '0'], ['EXTEND', 'T']]),
        fitsHeader([['XTENSION', "'BINTABLE'"], ['BITPIX', '8'], ['NAXIS', '2'], ['NAXIS1', '0'], ['NAXIS2', '1000000000000'],
          ['PCOUNT', '0'], ['GCOUNT', '1'], ['TFIELDS', '2'], ['TTYPE1', "'id'"], ['TFORM1', "'0A'"], ['TTYPE2', "'z'"], ['TFORM2', "'0D'"]]),
      ]),
    },
    catalog: 'zero.fits',
    message: 'zero.fits: HDU 2: NAXIS1 = 0: rows of zero bytes hold no values (NAXIS2 = 1000000000000)',
  },
  {
    // Issue 8: NAXIS1 = -2880 in an HDU before the table used to make the reader loop forever.
    what: 'a FITS primary HDU with NAXIS1 = -2880',
    files: { 'neg.fits': Buffer.concat([fitsHeader([['SIMPLE', 'T'], ['BITPIX', '8'], ['NAXIS', '1'], ['NAXIS1', '-2880'], ['EXTEND', 'T']]), fits50().subarray(2880)]) },
    catalog: 'neg.fits',
    message: 'neg.fits: HDU 1: keyword NAXIS1 = -2880 is out of range (0 to 9007199254740991)',
  },
  {
    what: 'a text file named .fits',
    files: { 'text.fits': csv(GOOD_HEADER, ...GOOD_ROWS) },
    catalog: 'text.fits',
    message: 'text.fits: not a FITS file: it does not begin with "SIMPLE  ="',
  },
  {
    what: 'a FITS luminosity column with a velocity unit',
    files: {
      'unit.fits': fitsBinTable([
        { name: 'ID', tform: '4A', values: ['A', 'B'] },
        { name: 'Z', tform: 'D', values: [5, 6] },
        { name: 'LUM_HALPHA', tform: 'D', values: [1e42, 2e42], unit: 'km/s' },
      ]),
    },
    catalog: 'unit.fits',
    message: 'unit.fits: column "LUM_HALPHA" (lum_halpha): unit "km/s" is a velocity, expected a luminosity (erg s-1)',
  },
  {
    what: 'a VOTable with a mismatched closing tag',
    files: { 'bad.vot': vot('<TR><TD>A</TD><TD>5</TD></TR>\n<TR><TD>B</TR>') },
    catalog: 'bad.vot',
    message: 'bad.vot: line 9: closing tag </TR> does not match <TD>',
  },
  {
    what: 'a VOTable cut off in the middle',
    files: { 'cut.vot': vot('<TR><TD>A</TD><TD>5</TD></TR>\n<TR><TD>B</TD><TD>6</TD></TR>').split('<TR><TD>B')[0]! },
    catalog: 'cut.vot',
    message: 'cut.vot: line 9: unexpected end of file: <TABLEDATA> opened on line 7 is not closed',
  },
  {
    what: 'a truncated Parquet file',
    files: {
      'cut.parquet': async (p) => {
        await parquet(GOOD_PARQUET)(p);
        await writeFile(p, (await readFile(p)).subarray(0, 400));
      },
    },
    catalog: 'cut.parquet',
    message: 'cut.parquet: truncated Parquet file: it does not end with "PAR1"',
  },
  {
    what: 'a Parquet file with a corrupt footer',
    files: {
      'garbled.parquet': async (p) => {
        await parquet(GOOD_PARQUET)(p);
        const bytes = await readFile(p);
        bytes.writeUInt32LE(0x7fffffff, bytes.length - 8); // footer length far beyond the file
        await writeFile(p, bytes);
      },
    },
    catalog: 'garbled.parquet',
    // The rest of the line comes from DuckDB.
    message: 'garbled.parquet: cannot read Parquet file: ',
    prefixOnly: true,
  },
  // Missing or repeated key columns.
  {
    what: 'a catalog without an id column',
    files: { 'noid.csv': csv('name,z,fwhm_halpha', 'A,5,2000') },
    catalog: 'noid.csv',
    message: 'noid.csv: no id column (looked for "id" in any case; map another column with columns.id.source in a config: dawn-census init noid.csv writes one, with the columns it recognises mapped)',
  },
  {
    what: 'a catalog without a z column',
    files: { 'noz.csv': csv('id,redshift_z,fwhm_halpha', 'A,5,2000') },
    catalog: 'noz.csv',
    message: 'noz.csv: no z column (looked for "z" in any case; map another column with columns.z.source in a config: dawn-census init noz.csv writes one, with the columns it recognises mapped)',
  },
  {
    what: 'duplicate ids',
    files: { 'dup.csv': csv(GOOD_HEADER, ...GOOD_ROWS, 'M-1,7.0,1800,100,1e42,1e41') },
    catalog: 'dup.csv',
    message: 'dup.csv: duplicate id "M-1" at rows 1 and 3',
  },
  // Configs.
  {
    what: 'a config with an unknown key',
    files: { 'good.csv': csv(GOOD_HEADER, ...GOOD_ROWS), 'census.config.yaml': 'title: x\ncosmolgy: planck18\n' },
    catalog: 'good.csv',
    args: ['-c', 'census.config.yaml'],
    message: 'census.config.yaml: unknown key "cosmolgy" (did you mean "cosmology"?)',
  },
  {
    what: 'a config with a YAML syntax error',
    files: { 'good.csv': csv(GOOD_HEADER, ...GOOD_ROWS), 'census.config.yaml': 'title: x\ncalibrations: { halpha: rv15_halpha\ndraws: 10\n' },
    catalog: 'good.csv',
    args: ['-c', 'census.config.yaml'],
    message: 'census.config.yaml: YAML syntax error at line 3, column 1: Flow map in block collection must be sufficiently indented and end with a }',
  },
  {
    what: 'a config with a value of the wrong type',
    files: { 'good.csv': csv(GOOD_HEADER, ...GOOD_ROWS), 'census.config.yaml': 'efficiency: high\n' },
    catalog: 'good.csv',
    args: ['-c', 'census.config.yaml'],
    message: 'census.config.yaml: efficiency must be a number between 0 and 1, got "high"',
  },
  {
    what: 'a config mapping a column that is not in the file',
    files: { 'good.csv': csv(GOOD_HEADER, ...GOOD_ROWS), 'census.config.yaml': 'columns:\n  flux_halpha: { source: F_HA }\n' },
    catalog: 'good.csv',
    args: ['-c', 'census.config.yaml'],
    message: 'good.csv: column "F_HA" (mapped to flux_halpha in census.config.yaml) is not in the file; columns in the file: id, z, fwhm_halpha, fwhm_halpha_err, lum_halpha, lum_halpha_err',
  },
  {
    what: 'a config giving a unit of the wrong dimension',
    files: { 'good.csv': csv(GOOD_HEADER, ...GOOD_ROWS), 'census.config.yaml': 'columns:\n  lum_halpha: { unit: "erg s-1 cm-2" }\n' },
    catalog: 'good.csv',
    args: ['-c', 'census.config.yaml'],
    message: 'census.config.yaml: columns.lum_halpha.unit: unit "erg s-1 cm-2" is a flux, expected a luminosity (erg s-1)',
  },
  { what: 'a catalog that does not exist', files: {}, catalog: 'missing.csv', message: 'missing.csv: no such file' },
];

const BAD_ROWS_HEADER = 'id,z,fwhm_halpha,flux_halpha,lum_halpha,note';

const rowCases: RowCase[] = [
  {
    // NaN in row A is a missing width (issue 8 item 9: NaN means missing in every format), not a problem.
    what: 'Infinity as text and as numbers, beside a NaN that is missing',
    files: { 'nan.csv': csv(BAD_ROWS_HEADER, 'A,5.5,NaN,,1e42,', 'B,6,2000,,inf,', 'C,6.1,2000,,-Infinity,', 'D,6.2,2100,,2e42,') },
    catalog: 'nan.csv',
    rows: 4,
    problems: [
      // The CSV reader reads the column as numbers, so "inf" reaches the checks as Infinity.
      'row 2 (id B): lum_halpha = Infinity: must be a finite number',
      'row 3 (id C): lum_halpha = -Infinity: must be a finite number',
    ],
  },
  {
    what: 'negative or zero widths and fluxes',
    files: { 'neg.csv': csv(BAD_ROWS_HEADER, 'A,5.5,-1200,1e-17,,', 'B,6,0,1e-17,,', 'C,6.1,2000,0,,', 'D,6.2,2000,-3e-18,,', 'E,6.3,2000,1e-17,,') },
    catalog: 'neg.csv',
    rows: 5,
    problems: [
      'row 1 (id A): fwhm_halpha = -1200 km/s: must be positive',
      'row 2 (id B): fwhm_halpha = 0 km/s: must be positive',
      'row 3 (id C): flux_halpha = 0 erg s-1 cm-2: must be positive',
      'row 4 (id D): flux_halpha = -3e-18 erg s-1 cm-2: must be positive',
    ],
  },
  {
    what: 'z zero, negative, absurd or empty',
    files: { 'z.csv': csv(BAD_ROWS_HEADER, 'A,0,2000,,1e42,', 'B,-0.5,2000,,1e42,', 'C,45,2000,,1e42,', 'D,,2000,,1e42,', 'E,30,2000,,1e42,') },
    catalog: 'z.csv',
    rows: 5,
    problems: [
      'row 1 (id A): z = 0: must be between 0 and 30',
      'row 2 (id B): z = -0.5: must be between 0 and 30',
      'row 3 (id C): z = 45: must be between 0 and 30',
      'row 4 (id D): z is empty',
    ],
  },
  {
    what: 'text in numeric columns',
    files: { 'text.csv': csv(BAD_ROWS_HEADER, 'A,5.5,broad,,1e42,', 'B,six,2000,,1e42,', 'C,6,0x7D0,,1e42,', 'D,6,2000,,1e42,') },
    catalog: 'text.csv',
    rows: 4,
    problems: ['row 1 (id A): fwhm_halpha = broad: not a number', 'row 2 (id B): z = six: not a number', 'row 3 (id C): fwhm_halpha = 0x7D0: not a number'],
  },
  {
    what: 'widths beyond 30000 km/s',
    // Two ordinary widths keep the catalog's median plausible (else derive stops: see inputMedians.ts).
    files: { 'wide.csv': csv(BAD_ROWS_HEADER, 'A,5.5,45000,,1e42,', 'B,6,30000,,1e42,', 'C,6,2000,,1e42,', 'D,6,2100,,1e42,') },
    catalog: 'wide.csv',
    rows: 4,
    problems: ['row 1 (id A): fwhm_halpha = 45000 km/s: must be at most 30000 km/s'],
  },
  {
    what: 'a 100 kB field, in a numeric column and in a passthrough column',
    files: { 'big.csv': csv(BAD_ROWS_HEADER, `A,${'9'.repeat(50)}x${'9'.repeat(100_000)},2000,,1e42,`, `B,6,2000,,1e42,${'n'.repeat(100_000)}`) },
    catalog: 'big.csv',
    rows: 2,
    problems: [`row 1 (id A): z = ${'9'.repeat(37)}...: not a number`],
    check: (out) => expect((out[1]!.note as string).length).toBe(100_000),
  },
  {
    what: 'an empty id, a bad limit flag, and attenuation and stellar mass out of range',
    files: {
      'misc.csv': csv(
        'id,z,fwhm_halpha,flux_halpha,flux_halpha_is_limit,av,log_mstar',
        ',5.5,2000,1e-17,no,0.5,9',
        'B,6,2000,1e-17,perhaps,0.5,9',
        'C,6,2000,1e-17,yes,-0.2,9',
        'D,6,2000,1e-17,f,0.5,14.5',
        'E,6,2000,1e-17,T,11,9',
        'F,6,2000,1e-17,0,0.5,9',
      ),
    },
    catalog: 'misc.csv',
    rows: 6,
    problems: [
      'row 1 (no id): id is empty',
      'row 2 (id B): flux_halpha_is_limit = perhaps: must be true or false',
      'row 3 (id C): av = -0.2 mag: must be between 0 and 10',
      'row 4 (id D): log_mstar = 14.5 log10 Msun: must be between 5 and 13',
      'row 5 (id E): av = 11 mag: must be between 0 and 10',
    ],
  },
  {
    what: 'a value printed in the unit the config gives the file',
    files: {
      'cfg.csv': csv('NAME,z,F_HA,fwhm_halpha', 'A,5.5,-12.5,2000', 'B,6,250,2000'),
      'census.config.yaml': 'columns:\n  id: { source: NAME }\n  flux_halpha: { source: F_HA, unit: "1e-18 erg s-1 cm-2" }\n',
    },
    catalog: 'cfg.csv',
    args: ['-c', 'census.config.yaml'],
    rows: 2,
    problems: ['row 1 (id A): flux_halpha (column F_HA) = -12.5 1e-18 erg s-1 cm-2: must be positive'],
    // 250 × 1e-18 erg s-1 cm-2, by definition of the unit.
    check: (out) => expect(out[1]!.flux_halpha as number).toBeCloseTo(2.5e-16, 28),
  },
  {
    what: 'a byte-order mark and CRLF line endings',
    files: { 'bom.csv': Buffer.from(`\uFEFF${GOOD_HEADER}\r\n${GOOD_ROWS.join('\r\n')}\r\n`, 'utf8') },
    catalog: 'bom.csv',
    rows: 2,
    problems: [],
    check: (out) => {
      expect(out.map((r) => [r.id, r.z, r.fwhm_halpha])).toEqual([
        ['M-1', 5.5, 2100],
        ['M-2', 6.5, 1200],
      ]);
      expect(out.every((r) => typeof r.log_mbh === 'number')).toBe(true);
    },
  },
  {
    what: 'a header without data rows',
    files: { 'header.csv': csv(GOOD_HEADER) },
    catalog: 'header.csv',
    rows: 0,
    problems: [],
  },
  {
    what: 'a Parquet file with a text width column',
    files: { 'text.parquet': parquet("SELECT * FROM (VALUES ('A', 5.5, '2000', 1e42), ('B', 6.0, 'wide', 1e42)) t(id, z, fwhm_halpha, lum_halpha)") },
    catalog: 'text.parquet',
    rows: 2,
    problems: ['row 2 (id B): fwhm_halpha = wide: not a number'],
  },
];

// ---- helpers ------------------------------------------------------------------------------------

let root: string;
/** Bytes of a good run's three output files, copied in before each catalog-level run. */
let goodOutput: Map<string, Buffer>;

beforeAll(async () => {
  root = await mkdtemp(join(tmpdir(), 'dawn-malformed-'));
  const dir = join(root, 'good');
  await writeFiles(dir, { 'good.csv': csv(GOOD_HEADER, ...GOOD_ROWS) });
  const r = await runCli(dir, ['good.csv', '-o', 'out.parquet', '--draws', '20', '--threads', '1']);
  expect(r.status, r.stderr).toBe(0);
  goodOutput = new Map(await Promise.all(OUT.map(async (f) => [f, await readFile(join(dir, f))] as const)));
}, 120_000);

afterAll(async () => {
  if (root) await rm(root, { recursive: true, force: true });
});

async function writeFiles(dir: string, files: Record<string, FileBody>): Promise<void> {
  await rm(dir, { recursive: true, force: true });
  await mkdir(dir, { recursive: true });
  for (const [name, body] of Object.entries(files)) {
    const p = join(dir, name);
    if (typeof body === 'function') await body(p);
    else await writeFile(p, body);
  }
}

const baseArgs = (c: Case): string[] => [c.catalog, '-o', 'out.parquet', '--draws', '20', '--threads', '1', ...(c.args ?? [])];
let caseNo = 0;
const caseDir = (): string => join(root, `case-${++caseNo}`);

/** A minimal RFC 4180 reader for the rejection report. */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i]!;
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') (field += '"'), i++;
      else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') row.push(field), (field = '');
    else if (ch === '\n') row.push(field), rows.push(row), (row = []), (field = '');
    else if (ch !== '\r') field += ch;
  }
  if (field !== '' || row.length) row.push(field), rows.push(row);
  return rows;
}

async function readParquet(path: string): Promise<Record<string, unknown>[]> {
  const db = await DuckDBInstance.create(':memory:');
  const con = await db.connect();
  try {
    return (await con.runAndReadAll(`SELECT * FROM read_parquet(${sqlText(path)}) ORDER BY "row"`)).getRowObjectsJS();
  } finally {
    con.closeSync();
    db.closeSync();
  }
}

function expectMessage(c: CatalogCase, r: RunResult): void {
  expect(r.status, r.stderr).toBe(2);
  const lines = r.stderr.split('\n').filter((l) => l !== '');
  expect(lines, r.stderr).toHaveLength(1);
  if (c.prefixOnly) expect(lines[0]!.startsWith(c.message), lines[0]).toBe(true);
  else expect(lines[0]).toBe(c.message);
}

// ---- the tests ----------------------------------------------------------------------------------

describe('catalog-level problems: exit status 2, one exact line, nothing written', () => {
  it('covers every kind of file and config problem the table lists', () => {
    expect(catalogCases.length + rowCases.length).toBeGreaterThanOrEqual(25);
  });

  it.each(catalogCases)('$what', async (c) => {
    // With no earlier output: none appears, and nothing else is left in the folder.
    const fresh = caseDir();
    await writeFiles(fresh, c.files);
    const before = (await readdir(fresh)).sort();
    expectMessage(c, await runCli(fresh, baseArgs(c)));
    expect((await readdir(fresh)).sort()).toEqual(before);

    // With an earlier good output at the same path: it is left byte for byte.
    const kept = caseDir();
    await writeFiles(kept, c.files);
    for (const [f, bytes] of goodOutput) await writeFile(join(kept, f), bytes);
    const keptBefore = (await readdir(kept)).sort();
    expectMessage(c, await runCli(kept, baseArgs(c)));
    expect((await readdir(kept)).sort()).toEqual(keptBefore);
    for (const [f, bytes] of goodOutput) expect((await readFile(join(kept, f))).equals(bytes), `${f} changed`).toBe(true);
  });
});

describe('row-level problems: exit status 0, each problem on stderr and in the rejection report', () => {
  it.each(rowCases)('$what', async (c) => {
    const dir = caseDir();
    await writeFiles(dir, c.files);
    const r = await runCli(dir, baseArgs(c));
    expect(r.status, r.stderr).toBe(0);

    const stderrLines = r.stderr.split('\n');
    for (const p of c.problems) expect(stderrLines, r.stderr).toContain(`${c.catalog}: ${p}`);

    const report = parseCsv(await readFile(join(dir, 'out.rejections.csv'), 'utf8'));
    expect(report[0]).toEqual(['row', 'id', 'column', 'value', 'reason', 'message']);
    expect(report.slice(1).map((row) => row[5])).toEqual(c.problems);

    const out = await readParquet(join(dir, 'out.parquet'));
    expect(out).toHaveLength(c.rows);
    const flaggedRows = new Set(report.slice(1).map((row) => Number(row[0])));
    for (const o of out) {
      const flagged = flaggedRows.has(Number(o.row));
      expect(String(o.flags ?? '').split(',').includes('invalid_input'), `row ${String(o.row)} flags ${String(o.flags)}`).toBe(flagged);
      if (flagged) expect(o.log_mbh ?? null).toBeNull();
    }
    c.check?.(out);
  });
});
