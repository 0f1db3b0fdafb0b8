import { UCD_WORDS } from './ucdWords.ts';

/**
 * Checks a UCD against the UCD1+ 1.5 word list and its combination rules (UCD1+ 1.5, "Definition of words"):
 * words separated by ';', each in the list; the first word may not be a secondary-only (S) word
 * and no later word may be a primary-only (P) word. Case is ignored, as the standard allows.
 *
 * @param ucd - e.g. `phys.mass;stat.median`
 * @returns null when valid, else what is wrong in words (e.g. `"phys.mas" is not a UCD1+ word`).
 */
export function checkUcd(ucd: string): string | null {
  if (ucd.trim() === '') return 'is empty';
  const words = ucd.split(';').map((w) => w.trim());
  for (const [i, w] of words.entries()) {
    if (w === '') return `has an empty word in "${ucd}"`;
    const entry = UCD_WORDS.get(w.toLowerCase());
    if (!entry) return `"${w}" is not a UCD1+ word`;
    if (i === 0 && entry.syllable === 'S') return `"${entry.word}" may only follow another word (it is a secondary word), not start a UCD`;
    if (i > 0 && entry.syllable === 'P') return `"${entry.word}" may only start a UCD (it is a primary word)`;
  }
  return null;
}
