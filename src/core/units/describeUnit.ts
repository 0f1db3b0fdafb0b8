import { dimensionName } from './dimension.ts';
import { parseUnit } from './parseUnit.ts';

/** What a unit string means, for messages and provenance. */
export interface UnitDescription {
  /** The unit string as given. */
  readonly unit: string;
  /** The quantity it measures, e.g. 'flux', 'luminosity', 'mass' (for a log unit, of the unit inside the log). */
  readonly quantity: string;
  /** True for log10 units (`log(solMass)`, `[solMass]`, `dex`). */
  readonly log: boolean;
  /** Size of one unit in cgs (for a log unit: of the unit inside the log). */
  readonly cgs: number;
  /** One line, e.g. `"1e-18 erg/s/cm2" is a flux: 1 unit = 1e-18 in cgs`. */
  readonly text: string;
}

/** Describes a unit string; throws UnitError if it cannot be read. */
export function describeUnit(unit: string): UnitDescription {
  const p = parseUnit(unit);
  const quantity = dimensionName(p.dimension);
  const text = p.log
    ? `"${unit}" is the log10 of a ${quantity} unit of ${p.cgs.toPrecision(6)} in cgs`
    : `"${unit}" is a ${quantity}: 1 unit = ${p.cgs.toPrecision(6)} in cgs`;
  return { unit, quantity, log: p.log, cgs: p.cgs, text };
}
