import { CatalogError } from './CatalogError.ts';
import { MAX_FITS_HEADER_BLOCKS } from './limits.ts';

/** Positional reads, as `FileHandle.read` does them (a gzip-compressed file reads forward only). */
export interface ByteSource {
  read(buffer: Buffer, offset: number, length: number, position: number): Promise<{ bytesRead: number }>;
}

/** FITS block size in bytes (FITS Standard 4.0, §3.1). */
export const FITS_BLOCK = 2880;
const CARD = 80;

/** One header keyword record. `raw` keeps the value text (exact for 64-bit integers). */
export interface FitsCard {
  key: string;
  value: string | number | boolean | null;
  raw: string;
  comment?: string;
}

/** A parsed header: the cards in order, a first-occurrence index, and its size on disk. */
export interface FitsHeader {
  cards: FitsCard[];
  byKey: Map<string, FitsCard>;
  /** Header size in bytes, a multiple of 2880. */
  byteLength: number;
}

/**
 * Reads the header starting at `offset` block by block until the END card; a header longer
 * than MAX_FITS_HEADER_BLOCKS blocks is a CatalogError.
 *
 * @param hdu - 0-based HDU index, for messages; HDU 0 must begin with `SIMPLE  =`
 * @returns the header, or null when `offset` is at the end of the file
 */
export async function readFitsHeader(fh: ByteSource, offset: number, hdu: number, file: string): Promise<FitsHeader | null> {
  const cards: FitsCard[] = [];
  const block = Buffer.alloc(FITS_BLOCK);
  let pos = offset;
  for (;;) {
    const { bytesRead } = await fh.read(block, 0, FITS_BLOCK, pos);
    if (bytesRead === 0 && pos === offset && hdu > 0) return null;
    if (hdu === 0 && pos === 0 && block.toString('latin1', 0, 9) !== 'SIMPLE  =') {
      throw new CatalogError(`${file}: not a FITS file: it does not begin with "SIMPLE  ="`);
    }
    if (bytesRead < FITS_BLOCK) {
      throw new CatalogError(`${file}: HDU ${hdu + 1}: FITS header has no END card (the file ends inside the header)`);
    }
    pos += FITS_BLOCK;
    if (pos - offset > MAX_FITS_HEADER_BLOCKS * FITS_BLOCK) {
      throw new CatalogError(`${file}: HDU ${hdu + 1}: FITS header has no END card within ${MAX_FITS_HEADER_BLOCKS} blocks (${MAX_FITS_HEADER_BLOCKS * FITS_BLOCK} bytes)`);
    }
    for (let c = 0; c < FITS_BLOCK; c += CARD) {
      const text = block.toString('latin1', c, c + CARD);
      if (text.startsWith('END') && text.slice(3).trim() === '') {
        return { cards: joinContinue(cards), byKey: index(cards), byteLength: pos - offset };
      }
      cards.push(parseCard(text));
    }
  }
}

/**
 * Parses one 80-character card: `KEYWORD = value / comment`, with quoted strings (`''` is a
 * quote, trailing blanks dropped), logicals T/F, integers and reals (`D` exponents allowed).
 * Commentary cards (COMMENT, HISTORY, blank) keep their text in `value`.
 */
export function parseCard(text: string): FitsCard {
  const key = text.slice(0, 8).trimEnd();
  const hasValue = text.slice(8, 10) === '= ' || key === 'CONTINUE';
  if (!hasValue) return { key, value: text.slice(8).trimEnd(), raw: '' };
  const s = text.slice(10);
  const t = s.trimStart();
  if (t.startsWith("'")) {
    let i = 1;
    let out = '';
    for (;;) {
      const q = t.indexOf("'", i);
      if (q === -1) { out += t.slice(i); i = t.length; break; }
      out += t.slice(i, q);
      if (t[q + 1] === "'") { out += "'"; i = q + 2; continue; }
      i = q + 1;
      break;
    }
    const rest = t.slice(i);
    const slash = rest.indexOf('/');
    const card: FitsCard = { key, value: out.trimEnd(), raw: out };
    if (slash !== -1) card.comment = rest.slice(slash + 1).trim();
    return card;
  }
  const slash = s.indexOf('/');
  const raw = (slash === -1 ? s : s.slice(0, slash)).trim();
  const card: FitsCard = { key, value: parseValue(raw), raw };
  if (slash !== -1) card.comment = s.slice(slash + 1).trim();
  return card;
}

function parseValue(raw: string): string | number | boolean | null {
  if (raw === '') return null;
  if (raw === 'T') return true;
  if (raw === 'F') return false;
  if (/^[+-]?\d+$/.test(raw)) return Number(raw);
  if (/^[+-]?(?:\d+\.?\d*|\.\d+)(?:[EeDd][+-]?\d+)?$/.test(raw)) return Number(raw.replace(/[dD]/, 'e'));
  return raw;
}

/** Applies the CONTINUE long-string convention: a string ending in `&` continues on the next card. */
function joinContinue(cards: FitsCard[]): FitsCard[] {
  const out: FitsCard[] = [];
  for (const c of cards) {
    const prev = out[out.length - 1];
    if (c.key === 'CONTINUE' && prev && typeof prev.value === 'string' && prev.value.endsWith('&') && typeof c.value === 'string') {
      prev.value = prev.value.slice(0, -1) + c.value;
      continue;
    }
    out.push(c);
  }
  return out;
}

function index(cards: FitsCard[]): Map<string, FitsCard> {
  const m = new Map<string, FitsCard>();
  for (const c of cards) if (!m.has(c.key)) m.set(c.key, c);
  return m;
}

/** Integer value of a keyword, or undefined when absent; a non-integer value is a CatalogError. */
export function intKey(h: FitsHeader, key: string, where: string): number | undefined {
  const c = h.byKey.get(key);
  if (c === undefined) return undefined;
  if (typeof c.value !== 'number' || !Number.isInteger(c.value)) {
    throw new CatalogError(`${where}: keyword ${key} must be an integer, got "${c.raw}"`);
  }
  return c.value;
}

/** An integer keyword that must lie in [lo, hi] (default when absent). */
export function boundedIntKey(h: FitsHeader, key: string, where: string, lo: number, hi: number, dflt: number): number {
  const v = intKey(h, key, where) ?? dflt;
  if (v < lo || v > hi) throw new CatalogError(`${where}: keyword ${key} = ${v} is out of range (${lo} to ${hi})`);
  return v;
}

/**
 * Size in bytes of the HDU's data (FITS Standard 4.0, Eq. 1/2), before padding to 2880. Each
 * structural keyword is checked first (BITPIX one of 8, 16, 32, 64, −32, −64; NAXIS 0–999; each
 * NAXISn, PCOUNT and GCOUNT ≥ 0), and a size beyond 2^53 bytes is refused, so that a corrupt
 * header can neither move the reader backwards nor make it skip absurd distances.
 */
export function dataByteLength(h: FitsHeader, where: string): number {
  const bitpix = intKey(h, 'BITPIX', where) ?? 8;
  if (![8, 16, 32, 64, -32, -64].includes(bitpix)) throw new CatalogError(`${where}: keyword BITPIX = ${bitpix} is not one of 8, 16, 32, 64, -32, -64`);
  const naxis = boundedIntKey(h, 'NAXIS', where, 0, 999, 0);
  if (naxis === 0) return 0;
  let prod = 1;
  // Random groups (NAXIS1 = 0 in the primary HDU) leave NAXIS1 out of the product.
  const firstAxis = h.byKey.get('GROUPS')?.value === true && intKey(h, 'NAXIS1', where) === 0 ? 2 : 1;
  for (let k = firstAxis; k <= naxis; k++) prod *= boundedIntKey(h, `NAXIS${k}`, where, 0, Number.MAX_SAFE_INTEGER, 0);
  const pcount = boundedIntKey(h, 'PCOUNT', where, 0, Number.MAX_SAFE_INTEGER, 0);
  const gcount = boundedIntKey(h, 'GCOUNT', where, 0, Number.MAX_SAFE_INTEGER, 1);
  const bytes = (Math.abs(bitpix) / 8) * gcount * (pcount + prod);
  if (!Number.isSafeInteger(bytes)) throw new CatalogError(`${where}: the header declares ${bytes} bytes of data, more than any file can hold`);
  return bytes;
}

/** Rounds a byte count up to whole 2880-byte blocks. */
export function padToBlock(n: number): number {
  return Math.ceil(n / FITS_BLOCK) * FITS_BLOCK;
}
