import { CANONICAL_BY_NAME, CANONICAL_COLUMNS } from '../normalize/canonicalColumns.ts';

/*
 * Which of a catalog's columns hold the canonical inputs, guessed for `dawn-census init`'s
 * starter config. First by the IVOA UCD where the file gives one that names a single canonical
 * column (`meta.id;meta.main`, `src.redshift`, `pos.eq.ra`, `pos.eq.dec` as the first word), then
 * by the column's name read as words (`FWHM_Ha_broad_err` → fwhm · halpha · err). The names
 * below are the spellings common in the field's catalogs (common practice, no single source);
 * `e_` before a name marks its error, and `E_`/`e_` the upper and lower errors, as in the CDS
 * standard for astronomical catalogues (byte-by-byte descriptions). A guess is a suggestion
 * only: init writes it with a comment saying so, and derive still checks every unit.
 */

/** A catalog column as the readers give it. */
export interface ColumnName {
  name: string;
  ucd?: string;
}

/** One canonical column and the file column that seems to hold it. */
export interface ColumnGuess {
  canonical: string;
  source: string;
  /** What the guess rests on. */
  by: 'ucd' | 'name';
}

export interface ColumnGuesses {
  /** Canonical columns the file holds under their own name (any case): derive finds them without a mapping. */
  byName: { canonical: string; source: string }[];
  /** Canonical columns one file column seems to hold. */
  guesses: ColumnGuess[];
  /** Canonical columns several file columns seem to hold (or, by name, differ only in case): the user chooses. */
  ambiguous: { canonical: string; candidates: string[] }[];
  /** File columns that are none of these: passed through unchanged. */
  passthrough: string[];
}

/** Words of a line's name, by canonical line. */
const LINE_WORDS: Record<string, readonly string[]> = {
  halpha: ['halpha', 'ha'],
  hbeta: ['hbeta', 'hb'],
  mgii: ['mgii', 'mg2'],
  civ: ['civ', 'c4'],
};
/** Two words that make one line's name (`H_alpha`, `Mg_II`). */
const LINE_PAIRS: Record<string, string> = { 'h alpha': 'halpha', 'h beta': 'hbeta', 'mg ii': 'mgii', 'c iv': 'civ' };
const QUANTITY_WORDS: Record<string, readonly string[]> = {
  fwhm: ['fwhm'],
  flux: ['flux', 'f', 'fl', 'fx', 'lineflux'],
  lum: ['lum', 'l', 'luminosity'],
};
/** Words that say a line measurement is of the broad component, or observed; they add nothing to the guess. */
const NEUTRAL_WORDS = new Set(['broad', 'b', 'bl', 'br', 'blr', 'obs', 'observed']);
const ERROR_WORDS = new Set(['err', 'error', 'e', 'unc', 'uncertainty', 'sig']);
const LOWER_WORDS = new Set(['lo', 'low', 'lower', 'minus', 'neg', 'm', 'l']);
const UPPER_WORDS = new Set(['hi', 'high', 'upper', 'plus', 'pos', 'p', 'u']);
const LIMIT_WORDS = new Set(['lim', 'limit', 'ul', 'uplim', 'upperlimit', 'islimit', 'islim']);

/** Whole names (words run together) that mean one canonical column. */
const WHOLE_NAMES: Record<string, readonly string[]> = {
  id: ['name', 'object', 'objname', 'objectname', 'objid', 'objectid', 'sourceid', 'srcid', 'source', 'target', 'targetid', 'galaxyid', 'ident', 'identifier'],
  z: ['redshift', 'zspec', 'specz', 'zbest', 'zsys', 'zobs', 'zsp', 'zspectroscopic', 'spectroscopicredshift'],
  ra: ['raj2000', 'radeg', 'rightascension', 'raicrs', 'alpha', 'alphaj2000'],
  dec: ['dej2000', 'decj2000', 'decdeg', 'declination', 'deicrs', 'decicrs', 'delta', 'deltaj2000', 'de'],
  log_mstar: ['logmstar', 'lmstar', 'logmstellar', 'logstellarmass', 'logsm', 'logmst', 'mstarlog'],
  sigma_star: ['sigmastar', 'sigstar', 'vdisp', 'veldisp', 'sigmastellar', 'stellarsigma'],
  mu: ['magnification', 'magnif', 'magn', 'mulens', 'lensmu'],
  av: ['av', 'avblr', 'avbroad'],
  balmer_decrement: ['balmerdecrement', 'balmerdec', 'hahb', 'halphahbeta', 'hahbratio', 'halphahbetaratio'],
};
const WHOLE_NAME_OF = new Map<string, string>(Object.entries(WHOLE_NAMES).flatMap(([canonical, names]) => names.map((n) => [n, canonical] as [string, string])));
/** λL_λ of the continuum: `L5100`, `lambda_L_5100`, `Lcont5100`, `lam_l_3000A`. */
const CONTINUUM = /^(?:lam|lambda)?l(?:c|cont)?(5100|3000|1350)(?:a|aa)?$/;

/** Lower-case words of a column name: split at anything not a letter or digit and where lower case turns to upper. */
export function nameWords(name: string): string[] {
  const spaced = name
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/([A-Z]+)([A-Z][a-z])/g, '$1 $2')
    .toLowerCase();
  const words = spaced.split(/[^a-z0-9]+/).filter((w) => w !== '');
  // Two words that make one line's name.
  const out: string[] = [];
  for (let i = 0; i < words.length; i++) {
    const pair = LINE_PAIRS[`${words[i]} ${words[i + 1]}`];
    if (pair) {
      out.push(pair);
      i++;
    } else out.push(words[i]!);
  }
  return out;
}

/** The canonical column a UCD names on its own, if any. */
function canonicalOfUcd(ucd: string | undefined): string | null {
  if (!ucd) return null;
  const words = ucd.toLowerCase().split(';').map((w) => w.trim());
  if (words[0] === 'meta.id' && words.includes('meta.main')) return 'id';
  if (words[0] === 'src.redshift') return 'z';
  if (words[0] === 'pos.eq.ra') return 'ra';
  if (words[0] === 'pos.eq.dec') return 'dec';
  return null;
}

/** The measured column a list of words names (errors and limit flags already taken off), if any. */
function baseOfWords(words: readonly string[]): string | null {
  const whole = WHOLE_NAME_OF.get(words.join(''));
  if (whole) return whole;
  // An identifier of some kind (`ID_obj`, `MSA_ID`): several such columns are left to the user.
  if (words.includes('id') && words.length <= 3) return 'id';
  if (words.includes('log')) return null; // a logarithm of a line or continuum luminosity is not what the canonical columns hold
  const continuum = CONTINUUM.exec(words.join(''));
  if (continuum) return `lam_l_${continuum[1]}`;
  const rest = words.filter((w) => !NEUTRAL_WORDS.has(w));
  const lines = Object.keys(LINE_WORDS).filter((line) => rest.some((w) => LINE_WORDS[line]!.includes(w)));
  if (lines.length !== 1) return null;
  const line = lines[0]!;
  const others = rest.filter((w) => !LINE_WORDS[line]!.includes(w));
  const core = others.includes('core');
  const quantityWords = others.filter((w) => w !== 'core');
  if (quantityWords.length !== 1) return null;
  const quantity = Object.keys(QUANTITY_WORDS).find((q) => QUANTITY_WORDS[q]!.includes(quantityWords[0]!));
  if (!quantity || (core && quantity !== 'fwhm')) return null;
  return `${quantity}_${line}${core ? '_core' : ''}`;
}

/**
 * The canonical column a file column's name seems to name: a measurement, its error (`_err`,
 * `_err_lo`, `_err_hi`) or its limit flag. `casePair` says that the file also has the same name
 * with the other case of a leading `E_`/`e_` (the CDS upper and lower errors).
 */
export function canonicalOfName(name: string, casePair = false): string | null {
  let words = nameWords(name);
  if (words.length === 0) return null;
  let suffix = '';
  if (words.length > 1 && (words[0] === 'e' || words[0] === 'err' || words[0] === 'error' || words[0] === 'unc')) {
    // The CDS `e_X` (or err_X); with `E_X` beside it, E is the upper error and e the lower.
    suffix = casePair && words[0] === 'e' ? (name.startsWith('E') ? '_err_hi' : '_err_lo') : '_err';
    words = words.slice(1);
  } else {
    const last = words[words.length - 1]!;
    const before = words[words.length - 2];
    if (words.length > 2 && ERROR_WORDS.has(before!) && (LOWER_WORDS.has(last) || UPPER_WORDS.has(last))) {
      suffix = LOWER_WORDS.has(last) ? '_err_lo' : '_err_hi';
      words = words.slice(0, -2);
    } else if (words.length > 2 && ERROR_WORDS.has(last) && (LOWER_WORDS.has(before!) || UPPER_WORDS.has(before!))) {
      suffix = LOWER_WORDS.has(before!) ? '_err_lo' : '_err_hi';
      words = words.slice(0, -2);
    } else if (words.length > 1 && ERROR_WORDS.has(last)) {
      suffix = '_err';
      words = words.slice(0, -1);
    } else if (words.length > 2 && last === 'limit' && (before === 'is' || before === 'upper')) {
      suffix = '_is_limit';
      words = words.slice(0, -2);
    } else if (words.length > 1 && LIMIT_WORDS.has(last)) {
      suffix = '_is_limit';
      words = words.slice(0, -1);
    }
  }
  const base = baseOfWords(words);
  if (!base) return null;
  const canonical = base + suffix;
  return CANONICAL_BY_NAME.has(canonical) ? canonical : null;
}

/**
 * Sorts a catalog's columns into canonical columns found under their own name, guessed ones,
 * ambiguous ones and pass-through columns. A file column is guessed for one canonical column
 * at most, and only where no other file column is guessed for the same one.
 */
export function guessColumns(columns: readonly ColumnName[]): ColumnGuesses {
  const byName: ColumnGuesses['byName'] = [];
  const ambiguous: ColumnGuesses['ambiguous'] = [];
  const claimed = new Set<number>();
  for (const col of CANONICAL_COLUMNS) {
    const hits = columns.flatMap((c, i) => (c.name.toLowerCase() === col.name ? [i] : []));
    if (hits.length === 1) byName.push({ canonical: col.name, source: columns[hits[0]!]!.name });
    else if (hits.length > 1) ambiguous.push({ canonical: col.name, candidates: hits.map((i) => columns[i]!.name) });
    for (const i of hits) claimed.add(i);
  }
  const taken = new Set([...byName.map((b) => b.canonical), ...ambiguous.map((a) => a.canonical)]);
  const names = new Set(columns.map((c) => c.name));
  const candidates = new Map<string, { index: number; by: 'ucd' | 'name' }[]>();
  columns.forEach((c, index) => {
    if (claimed.has(index)) return;
    const fromUcd = canonicalOfUcd(c.ucd);
    const other = /^[eE]_/.test(c.name) ? `${c.name[0] === 'e' ? 'E' : 'e'}${c.name.slice(1)}` : '';
    const canonical = fromUcd ?? canonicalOfName(c.name, other !== '' && names.has(other));
    if (!canonical || taken.has(canonical)) return;
    const list = candidates.get(canonical) ?? [];
    list.push({ index, by: fromUcd ? 'ucd' : 'name' });
    candidates.set(canonical, list);
  });
  const guesses: ColumnGuess[] = [];
  const guessed = new Set<number>();
  for (const col of CANONICAL_COLUMNS) {
    const list = candidates.get(col.name);
    if (!list) continue;
    // A UCD outranks a name: a file that marks its main identifier says which column it is.
    const ucd = list.filter((c) => c.by === 'ucd');
    const best = ucd.length > 0 ? ucd : list;
    if (best.length === 1) {
      guesses.push({ canonical: col.name, source: columns[best[0]!.index]!.name, by: best[0]!.by });
      guessed.add(best[0]!.index);
    } else ambiguous.push({ canonical: col.name, candidates: best.map((c) => columns[c.index]!.name) });
  }
  const inAmbiguous = new Set(ambiguous.flatMap((a) => a.candidates));
  const passthrough = columns.filter((c, i) => !claimed.has(i) && !guessed.has(i) && !inAmbiguous.has(c.name)).map((c) => c.name);
  return { byName, guesses, ambiguous, passthrough };
}
