/** FITS header cards (FITS 4.0 §4.1–4.2), 80 ASCII characters each. */

const pad80 = (s: string): string => s.padEnd(80, ' ');

/** A card with a logical or integer value, right-justified to column 30 (fixed format). */
export function valueCard(key: string, value: boolean | number, comment = ''): string {
  const v = typeof value === 'boolean' ? (value ? 'T' : 'F') : String(value);
  return pad80(`${key.padEnd(8)}= ${v.padStart(20)}${comment ? ` / ${comment}` : ''}`.slice(0, 80));
}

/** Spellings of the non-ASCII letters our descriptions use (FITS headers are printable ASCII only). */
const ASCII_SPELLING: Record<string, string> = { α: 'alpha', β: 'beta', γ: 'gamma', λ: 'lambda', σ: 'sigma', μ: 'mu', Å: 'Angstrom', '☉': 'sun', '–': '-', '—': '-', '−': '-', '×': 'x', '≥': '>=', '≤': '<=', '’': "'", '“': '"', '”': '"' };

/** Text as a FITS header may hold it: known letters spelled out, any other non-ASCII or control character as '?'. */
export function fitsAscii(s: string): string {
  return s.replace(/[^\x20-\x7e]/g, (c) => ASCII_SPELLING[c] ?? '?');
}

/**
 * A card with a string value. Strings longer than one card use the long-string convention
 * (value ending in '&', continued on CONTINUE cards; FITS 4.0 §4.2.1.2), which astropy reads.
 */
export function stringCards(key: string, value: string): string[] {
  const plain = fitsAscii(value);
  const quoted = (t: string): string => t.replaceAll("'", "''");
  if (quoted(plain).length <= 68) return [pad80(`${key.padEnd(8)}= '${quoted(plain).padEnd(8)}'`)];
  // 67 characters fit between "KEYWORD = '" or "CONTINUE  '" (11) and "&'" (2); a quote counts twice.
  const pieces: string[] = [];
  let piece = '';
  for (const c of plain) {
    const q = quoted(c);
    if (piece.length + q.length > 67) {
      pieces.push(piece);
      piece = '';
    }
    piece += q;
  }
  pieces.push(piece);
  return pieces.map((p, i) => {
    const more = i < pieces.length - 1 ? '&' : '';
    return pad80(i === 0 ? `${key.padEnd(8)}= '${p}${more}'` : `CONTINUE  '${p}${more}'`);
  });
}

/** Joins cards into a header padded with blanks to a multiple of 2880 bytes, ending with END. */
export function headerBlock(cards: readonly string[]): Buffer {
  const text = [...cards, pad80('END')].join('');
  const size = Math.ceil(text.length / 2880) * 2880;
  return Buffer.from(text.padEnd(size, ' '), 'latin1');
}
