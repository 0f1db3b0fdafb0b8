import { combine, DIMENSIONLESS, type Dimension } from './dimension.ts';
import { UnitError } from './unitError.ts';
import { lookupSymbol } from './unitSymbols.ts';

/** A parsed unit string: value × `cgs` is the quantity in cgs (or, when `log`, 10^value × `cgs`). */
export interface ParsedUnit {
  /** Size of one unit in cgs (for a log unit: of the unit inside the log). */
  readonly cgs: number;
  readonly dimension: Dimension;
  /** True for log10 units: `log(solMass)`, `dex(solMass)`, `[solMass]`, `dex`. */
  readonly log: boolean;
}

/** Scale prefixes: `10**-20`, `10^-20`, `10^(-20)`, CDS `10-20` / `10+3`, then plain numbers `1e-18`, `1E-17`, `1000`. */
const POWER_OF_TEN = /^10(?:\*\*|\^)(?:\(([+-]?\d+)\)|([+-]?\d+))/;
const CDS_POWER_OF_TEN = /^10([+-]\d+)(?![\d.eE])/;
const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?/;
const SYMBOL = /^[A-Za-zµμÅ_]+/;
/** Exponent after a symbol: `2`, `-1`, `+2`, `**-1`, `^-1`, `^(-1)`, `**(1/2)`, `^0.5`. */
const EXPONENT = /^(?:\*\*|\^)?(?:\(([+-]?\d+(?:\.\d+)?(?:\/\d+)?)\)|([+-]?\d+(?:\.\d+)?))/;
/** log10 of a unit: `log(solMass)`, `log10(Msun)`, `dex(solMass)`, `log10 Msun`, and CDS `[solMass]`. */
const LOG_FORMS = [/^(?:log10|log|dex)\s*\((.*)\)$/i, /^(?:log10|log)\s+([^()]+)$/i, /^\[(.*)\]$/];

/** Cursor over the unit string; `whole` is the string as the user wrote it, for messages. */
class Reader {
  pos = 0;
  readonly text: string;
  readonly whole: string;
  constructor(text: string, whole: string) {
    this.text = text;
    this.whole = whole;
  }
  rest(): string {
    return this.text.slice(this.pos);
  }
  skipSpace(): boolean {
    const m = /^\s+/.exec(this.rest());
    if (m) this.pos += m[0].length;
    return m !== null;
  }
  fail(what: string): never {
    throw new UnitError(`unknown unit "${this.whole}": ${what}`);
  }
}

function exponentValue(s: string): number {
  const [num, den] = s.split('/');
  return Number(num) / (den === undefined ? 1 : Number(den));
}

/** product := factor ((space | '.' | '*' | '/') factor)*; '/' inverts the next factor only (VOUnits 1.0 §2.2). */
function readProduct(r: Reader, closing: string | null): { cgs: number; dimension: Dimension } {
  let cgs = 1;
  let dimension = DIMENSIONLESS;
  let first = true;
  for (;;) {
    r.skipSpace();
    const c = r.text[r.pos];
    if (c === undefined || c === closing) {
      if (first) r.fail('nothing where a unit was expected');
      return { cgs, dimension };
    }
    let sign = 1;
    // A leading '/' is allowed too ("1/s", after a scale factor).
    if (c === '/' || (!first && (c === '.' || c === '*' || c === '·'))) {
      if (c === '/') sign = -1;
      r.pos++;
      r.skipSpace();
    }
    let fCgs: number;
    let fDim: Dimension;
    if (r.text[r.pos] === '(') {
      r.pos++;
      const inner = readProduct(r, ')');
      if (r.text[r.pos] !== ')') r.fail('unbalanced parenthesis');
      r.pos++;
      fCgs = inner.cgs;
      fDim = inner.dimension;
    } else {
      const m = SYMBOL.exec(r.rest());
      if (!m) r.fail(`cannot read "${r.rest()}"`);
      const sym = lookupSymbol(m[0]);
      if (!sym) r.fail(`"${m[0]}" is not a recognised unit symbol`);
      r.pos += m[0].length;
      fCgs = sym.cgs;
      fDim = sym.dimension;
    }
    const e = EXPONENT.exec(r.rest());
    let p = 1;
    if (e && e[0].length > 0) {
      p = exponentValue((e[1] ?? e[2]) as string);
      r.pos += e[0].length;
    }
    cgs *= fCgs ** (sign * p);
    dimension = combine(dimension, 1, fDim, sign * p);
    first = false;
  }
}

function readScale(r: Reader): number {
  const rest = r.rest();
  let m = POWER_OF_TEN.exec(rest) ?? CDS_POWER_OF_TEN.exec(rest);
  let scale: number;
  if (m) scale = 10 ** Number(m[1] ?? m[2]);
  else {
    m = NUMBER.exec(rest);
    if (!m) return 1;
    scale = Number(m[0]);
  }
  r.pos += m[0].length;
  r.skipSpace();
  if (r.text[r.pos] === '*' || r.text[r.pos] === '×' || r.text[r.pos] === '.') r.pos++;
  if (!(scale > 0)) r.fail(`scale factor ${m[0]} must be positive`);
  return scale;
}

/** Parses a linear unit string: optional scale factor, then a product of symbols with exponents. */
function parseLinear(text: string, whole: string): { cgs: number; dimension: Dimension } {
  const t = text.trim();
  if (t === '' || t === '-') return { cgs: 1, dimension: DIMENSIONLESS };
  const r = new Reader(t, whole);
  const scale = readScale(r);
  r.skipSpace();
  if (r.pos >= t.length) return { cgs: scale, dimension: DIMENSIONLESS };
  if (t[r.pos] === '%' && r.pos === t.length - 1) return { cgs: scale / 100, dimension: DIMENSIONLESS };
  const p = readProduct(r, null);
  return { cgs: scale * p.cgs, dimension: p.dimension };
}

const cache = new Map<string, ParsedUnit>();

/**
 * Reads a catalog unit string (IVOA VOUnits 1.0 syntax and common variants: `km/s`, `km s-1`,
 * `km.s**-1`, `erg/s/cm^2`, `1e-18 erg/s/cm2`, CDS `10-20 erg s-1 cm-2`, `log(solMass)`,
 * `log10 Msun`, `[solMass]`, `dex`, `%`; `''` and `'-'` are dimensionless). Throws {@link UnitError} naming
 * the string and the part that could not be read. Results are cached per string.
 */
export function parseUnit(unit: string): ParsedUnit {
  const hit = cache.get(unit);
  if (hit) return hit;
  const t = unit.trim();
  let parsed: ParsedUnit;
  const logForm = LOG_FORMS.map((re) => re.exec(t)).find((m) => m !== null);
  if (logForm) parsed = { ...parseLinear(logForm[1] as string, unit), log: true };
  else if (t === 'dex') parsed = { cgs: 1, dimension: DIMENSIONLESS, log: true };
  else parsed = { ...parseLinear(t, unit), log: false };
  if (!(parsed.cgs > 0 && Number.isFinite(parsed.cgs))) throw new UnitError(`unknown unit "${unit}": its size is not a positive finite number`);
  cache.set(unit, parsed);
  return parsed;
}
