/**
 * Structure-aware fuzz inputs for the readers: a small valid catalog in each format, then seeded
 * mutations that know the format's structure (CSV fields and lines, ECSV YAML header lines,
 * FITS header cards and their numbers, VOTable tags, attributes and TDs, Parquet's footer),
 * plus plain byte flips and truncations. Deterministic for a given (format, seed).
 */
import { DuckDBInstance } from '@duckdb/node-api';
import { gzipSync } from 'node:zlib';
import { card, fitsBinTable, q } from '../fitsFixture.ts';

export type FuzzFormat = 'csv' | 'ecsv' | 'fits' | 'votable' | 'parquet';

/** mulberry32 (common practice, no source). */
export function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

type R = () => number;
const int = (r: R, n: number) => Math.floor(r() * n);
const pick = <T>(r: R, xs: readonly T[]): T => xs[int(r, xs.length)]!;

/** Numbers that break naive readers: negative, zero, huge, beyond 2^53, not numbers at all. */
const NASTY_NUMBERS = ['-1', '0', '-2880', '1', '999', '1000', '1000000000000', '9007199254740993', '1e308', 'NaN', '2.5', "'x'", '', '99999999999999999999999'];
const NASTY_CELLS = ['', '"', '""', 'nan', '-inf', '1e999', '0x1F', '#', '#9', '007', '\u0000', '\uFFFD', 'T', '?', '<', '&amp', '9007199254740993', ' ', ',', '\t', 'é'];

const ROWS = [
  ['007', '5.5', '2100', '1.5e-18', 'CW-N'],
  ['A-2', '6.25', '', '2e-18', '0042'],
  ['1e3', 'nan', '3000', '', ' padded '],
  ['x', '7', '1800', '3.25e-18', ''],
];
const NAMES = ['id', 'z', 'fwhm_halpha', 'flux_halpha', 'field'];

function baseCsv(): string {
  return `# invented\n${NAMES.join(',')}\n${ROWS.map((r) => r.map((c) => (c.includes(' ') ? `"${c}"` : c)).join(',')).join('\n')}\n`;
}

function baseEcsv(): string {
  const types = ['string', 'float64', 'float64', 'float64', 'string'];
  return ['# %ECSV 1.0', '# ---', '# datatype:', ...NAMES.map((n, i) => `# - {name: ${n}, ${i === 2 ? 'unit: km / s, ' : ''}datatype: ${types[i]}}`),
    '# meta: !!omap', '# - {survey: invented}', '# schema: astropy-2.0', NAMES.join(' '),
    ...ROWS.map((r) => r.map((c) => (c === '' || c.includes(' ') ? `"${c}"` : c)).join(' ')), ''].join('\n');
}

function baseFits(): Buffer {
  const num = (s: string) => (s === '' || s === 'nan' ? NaN : Number(s));
  return fitsBinTable([
    { name: 'id', tform: '8A', values: ROWS.map((r) => r[0]!) },
    { name: 'z', tform: 'D', values: ROWS.map((r) => num(r[1]!)) },
    { name: 'fwhm_halpha', tform: 'E', unit: 'km s-1', values: ROWS.map((r) => num(r[2]!)) },
    { name: 'flux_halpha', tform: 'D', values: ROWS.map((r) => num(r[3]!)) },
    { name: 'n', tform: 'K', tnull: -1n, values: [1n, -1n, 9007199254740993n, 4n] },
    { name: 'flag', tform: 'L', values: [true, null, false, true] },
  ], { tableCards: [['EXTNAME', q('CAT')]] });
}

function baseVotable(binary: boolean): string {
  const fields = '<FIELD name="id" datatype="char" arraysize="*"/><FIELD name="z" datatype="double"/><FIELD name="fwhm_halpha" datatype="float" unit="km.s-1"/><FIELD name="flux_halpha" datatype="double" unit="10-18erg.s-1.cm-2"/><FIELD name="n" datatype="long"><VALUES null="-1"/></FIELD>';
  let data: string;
  if (binary) {
    const parts: Buffer[] = [];
    for (const r of ROWS) {
      parts.push(Buffer.from([0])); // BINARY2 null bitmap (5 fields: one byte)
      const id = Buffer.from(r[0]!, 'latin1');
      const len = Buffer.alloc(4); len.writeUInt32BE(id.length); parts.push(len, id);
      const d = Buffer.alloc(8 + 4 + 8 + 8);
      d.writeDoubleBE(Number(r[1]) || NaN, 0); d.writeFloatBE(Number(r[2]) || NaN, 8); d.writeDoubleBE(Number(r[3]) * 1e18 || NaN, 12);
      d.writeBigInt64BE(7n, 20);
      parts.push(d);
    }
    data = `<BINARY2><STREAM encoding="base64">${Buffer.concat(parts).toString('base64').replace(/(.{60})/g, '$1\n')}</STREAM></BINARY2>`;
  } else {
    data = `<TABLEDATA>${ROWS.map((r) => `<TR>${r.slice(0, 4).map((c) => `<TD>${c}</TD>`).join('')}<TD>3</TD></TR>`).join('\n')}</TABLEDATA>`;
  }
  return `<?xml version="1.0"?>\n<VOTABLE version="1.4"><RESOURCE><TABLE name="t">\n${fields}\n<DATA>${data}</DATA>\n</TABLE></RESOURCE></VOTABLE>\n`;
}

let parquetBase: Buffer | null = null;
async function baseParquet(path: string): Promise<Buffer> {
  if (parquetBase) return parquetBase;
  const inst = await DuckDBInstance.create(':memory:');
  const con = await inst.connect();
  try {
    await con.run(`COPY (SELECT * FROM (VALUES ('007', 5.5, 2100.0, 1.5e-18, 12.3400::DECIMAL(18,4)), ('A-2', 6.25, NULL, 2e-18, NULL), ('x', 'nan'::DOUBLE, 3000.0, NULL, 1::DECIMAL(18,4))) t(id, z, fwhm_halpha, flux_halpha, price)) TO '${path.replace(/'/g, "''")}' (FORMAT parquet)`);
  } finally {
    con.closeSync();
    inst.closeSync();
  }
  const { readFileSync } = await import('node:fs');
  parquetBase = readFileSync(path);
  return parquetBase;
}

/** Replaces a random line by a mutated one, duplicates, drops or swaps lines. */
function mutateLines(r: R, text: string, cellSep: string): string {
  const lines = text.split('\n');
  const k = int(r, lines.length);
  switch (int(r, 7)) {
    case 0: lines.splice(k, 1); break;
    case 1: lines.splice(k, 0, lines[int(r, lines.length)]!); break;
    case 2: { // replace one field
      const f = lines[k]!.split(cellSep);
      f[int(r, f.length)] = pick(r, NASTY_CELLS);
      lines[k] = f.join(cellSep);
      break;
    }
    case 3: { const f = lines[k]!.split(cellSep); f.push(pick(r, NASTY_CELLS)); lines[k] = f.join(cellSep); break; }
    case 4: lines[k] = `#${lines[k]}`; break;
    case 5: lines[k] = lines[k]!.slice(0, int(r, lines[k]!.length + 1)); break;
    default: lines.splice(k, 0, pick(r, ['"', '"open', '# %ECSV 1.0', '', 'x'.repeat(int(r, 5000))])); break;
  }
  return lines.join(pick(r, ['\n', '\n', '\r\n', '\r']));
}

/** Sets a random FITS header card to a nasty value, or flips data bytes. */
function mutateFits(r: R, buf: Buffer): Buffer {
  const b = Buffer.from(buf);
  const text = b.toString('latin1');
  const keys = ['NAXIS1', 'NAXIS2', 'NAXIS', 'TFIELDS', 'TFORM1', 'TFORM2', 'TFORM5', 'BITPIX', 'PCOUNT', 'GCOUNT', 'TNULL5', 'TSCAL2', 'TZERO5', 'XTENSION', 'EXTEND'];
  const key = pick(r, keys);
  const hits: number[] = [];
  for (let i = text.indexOf(key.padEnd(8)); i !== -1; i = text.indexOf(key.padEnd(8), i + 1)) if (i % 80 === 0) hits.push(i);
  const what = int(r, 4);
  if (what <= 1 && hits.length > 0) {
    const at = pick(r, hits);
    const v = key.startsWith('TFORM') ? q(pick(r, ['0A', '-1D', '2D', '100000000A', 'X', '1PE(3)', 'Q', 'K', ''])) : pick(r, NASTY_NUMBERS);
    b.write(card(key, v === '' ? undefined : v), at, 'latin1');
  } else if (what === 2) {
    for (let n = 0; n < 1 + int(r, 8); n++) b[int(r, b.length)] = int(r, 256);
  } else {
    return b.subarray(0, int(r, b.length));
  }
  return b;
}

function mutateXml(r: R, text: string): string {
  switch (int(r, 8)) {
    case 0: return text.replace(pick(r, ['</TD>', '</TR>', '</TABLE>', '</STREAM>', '</FIELD>', '</DATA>']), '');
    case 1: return text.replace(pick(r, ['datatype="double"', 'datatype="long"', 'datatype="float"', 'arraysize="*"']), pick(r, ['datatype="floatComplex"', 'datatype="bit"', 'arraysize="3"', 'datatype="char"', 'datatype="unicodeChar"', '']));
    case 2: return text.replace(/<TD>[^<]*<\/TD>/, `<TD>${pick(r, NASTY_CELLS.map((c) => c.replace(/&/g, '&amp;').replace(/</g, '&lt;')))}</TD>`);
    case 3: return text.replace('encoding="base64"', pick(r, ['encoding="gzip"', '', 'href="x.bin"']));
    case 4: { const i = text.indexOf('<STREAM'); if (i < 0) return text.slice(0, int(r, text.length)); const j = text.indexOf('>', i) + 1 + int(r, 40); return text.slice(0, j) + pick(r, ['A', '=', '!', 'AAAA', '\n']) + text.slice(j); }
    case 5: return text.replace('<VALUES null="-1"/>', pick(r, ['<VALUES null="x"/>', '<VALUES null=""/>', '<VALUES/>']));
    case 6: return text.slice(0, int(r, text.length));
    default: { const i = int(r, text.length); return text.slice(0, i) + pick(r, ['<', '>', '&', '"', '<!--', ']]>', '<TR>', '</VOTABLE>']) + text.slice(i); }
  }
}

/** The bytes of fuzz case `seed` for `format` (`scratch` is a path the Parquet writer may use). */
export async function fuzzInput(format: FuzzFormat, seed: number, scratch: string): Promise<Buffer> {
  const r = rng(seed * 7919 + format.length);
  const rounds = 1 + int(r, 3);
  let out: Buffer;
  switch (format) {
    case 'csv': { let t = baseCsv(); for (let k = 0; k < rounds; k++) t = mutateLines(r, t, ','); out = Buffer.from(t); break; }
    case 'ecsv': { let t = baseEcsv(); for (let k = 0; k < rounds; k++) t = mutateLines(r, t, r() < 0.5 ? ' ' : ': '); out = Buffer.from(t); break; }
    case 'fits': { let b = baseFits(); for (let k = 0; k < rounds; k++) b = mutateFits(r, b); out = b; break; }
    case 'votable': { let t = baseVotable(r() < 0.5); for (let k = 0; k < rounds; k++) t = mutateXml(r, t); out = Buffer.from(t); break; }
    case 'parquet': {
      const b = Buffer.from(await baseParquet(scratch));
      const what = int(r, 3);
      if (what === 0) out = b.subarray(0, int(r, b.length));
      else {
        // Flip bytes, mostly in the footer (schema and row-group metadata) where readers trust sizes.
        const footerLen = b.readUInt32LE(b.length - 8);
        for (let n = 0; n < 1 + int(r, 6); n++) {
          const at = what === 1 ? b.length - 8 - 1 - int(r, Math.min(footerLen, b.length - 9)) : 4 + int(r, b.length - 8);
          b[at] = int(r, 256);
        }
        out = b;
      }
      break;
    }
  }
  // Sometimes gzip it: the compressed path must hold up as well (not Parquet).
  return format !== 'parquet' && r() < 0.15 ? gzipSync(out) : out;
}
