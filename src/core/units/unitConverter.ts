import { DIMENSIONLESS, dimensionName, sameDimension, withArticle } from './dimension.ts';
import { parseUnit } from './parseUnit.ts';
import { KIND_SPECS, type QuantityKind } from './quantityKind.ts';
import { UnitError } from './unitError.ts';

export type { QuantityKind } from './quantityKind.ts';

const identity = (x: number): number => x;

/**
 * A function converting values given in `unit` to the canonical unit of `kind` (velocity → km s-1,
 * flux → erg s-1 cm-2, luminosity → erg s-1, wavelength → Angstrom, magnitude → mag, mass →
 * solMass, logMass → log10 solMass, dimensionless, logDimensionless → dex). An undefined, empty
 * or '-' unit means the canonical one. logMass also takes a linear mass unit (x ↦ log10 of x in
 * solMass), and a bare `dex` as dex of solMass (how catalogs label log M and its errors);
 * log units shift by log10 of their size. Throws {@link UnitError}: `unknown unit "…"`
 * when unreadable, or `unit "…" is a luminosity, expected a flux (erg s-1 cm-2)` when of the wrong
 * dimension.
 */
export function unitConverter(unit: string | undefined, kind: QuantityKind): (x: number) => number {
  const spec = KIND_SPECS[kind];
  if (!spec) throw new UnitError(`unknown quantity kind "${String(kind)}"`);
  if (unit === undefined || unit.trim() === '' || unit.trim() === '-') return identity;
  const p = parseUnit(unit);
  // Catalogs label log-mass columns, and above all their errors, plain "dex": read it as dex of solMass.
  if (kind === 'logMass' && p.log && p.cgs === 1 && sameDimension(p.dimension, DIMENSIONLESS)) return identity;
  const expected = `expected ${withArticle(spec.name)} (${spec.unit || 'dimensionless'})`;
  if (!sameDimension(p.dimension, spec.dimension)) {
    const what = p.log ? `the log of ${withArticle(dimensionName(p.dimension))}` : withArticle(dimensionName(p.dimension));
    throw new UnitError(`unit "${unit}" is ${what}, ${expected}`);
  }
  if (p.log && !spec.log) throw new UnitError(`unit "${unit}" is a logarithmic unit, ${expected}`);
  if (spec.log) {
    if (p.log) {
      const shift = Math.log10(p.cgs / spec.cgs);
      return shift === 0 ? identity : (x) => x + shift;
    }
    // Linear units of the right dimension are accepted for a log kind only where the log of a
    // value makes sense (mass); a plain number in a 'dex' column would be ambiguous.
    if (kind === 'logDimensionless') throw new UnitError(`unit "${unit}" is linear, ${expected}`);
    const f = p.cgs / spec.cgs;
    return (x) => Math.log10(x * f);
  }
  const f = p.cgs / spec.cgs;
  return f === 1 ? identity : (x) => x * f;
}
