import { unitConverter, UnitError, type QuantityKind } from '../../core/units/index.ts';
import type { CanonicalKind } from '../normalize/canonicalColumns.ts';

/**
 * The converter from `unit` to the canonical unit of a column of kind `kind`, or the reason it
 * cannot be had (the units module's message, which names the unit and what was expected).
 * Text and flag columns take no unit.
 */
export function converterFor(
  unit: string | undefined,
  kind: CanonicalKind,
  column: string,
): { convert: (x: number) => number } | { problem: string } {
  if (kind === 'text' || kind === 'bool') {
    if (unit === undefined || unit.trim() === '') return { convert: identity };
    return { problem: `${column} is ${kind === 'text' ? 'text' : 'a true/false flag'} and takes no unit, got "${unit}"` };
  }
  try {
    return { convert: unitConverter(unit, kind as QuantityKind) };
  } catch (e) {
    if (e instanceof UnitError) return { problem: e.message };
    throw e;
  }
}

/** The problem with `unit` for a column of kind `kind`, or undefined when it converts. */
export function checkUnit(unit: string | undefined, kind: CanonicalKind, column: string): string | undefined {
  const r = converterFor(unit, kind, column);
  return 'problem' in r ? r.problem : undefined;
}

const identity = (x: number): number => x;
