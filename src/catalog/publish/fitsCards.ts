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
  const text = fitsAscii(value).replaceAll("'", "''");
  const first = 67; // 80 − "KEYWORD = '" (11) − "&'" (2)
  const next = 67; // 80 − "CONTINUE  '" (11) − "&'" (2)
  if (text.length <= 68) return [pad80(`${key.padEnd(8)}= '${text.padEnd(8)}'`)];
  const pieces: string[] = [];
  let rest = text;
  let size = first;
  while (rest.length > 0) {
    let cut = Math.min(size, rest.length);
    // Never split a doubled quote between two cards.
    if (rest[cut - 1] === "'" && rest[cut] === "'") cut--;
    pieces.push(rest.slice(0, cut));
    rest = rest.slice(cut);
    size = next;
  }
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
