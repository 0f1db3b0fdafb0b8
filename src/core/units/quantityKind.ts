import { M_SUN_G } from '../constants/index.ts';
import { dim, DIMENSIONLESS, type Dimension } from './dimension.ts';

/** What a catalog column measures; each kind has one canonical unit (see {@link CANONICAL_UNITS}). */
export type QuantityKind =
  | 'velocity'
  | 'flux'
  | 'luminosity'
  | 'wavelength'
  | 'magnitude'
  | 'mass'
  | 'logMass'
  | 'dimensionless'
  | 'logDimensionless'
  | 'angle';

/** A kind's canonical unit: its VOUnits string, dimension, size in cgs, whether it is a log10 unit, and a readable name. */
export interface KindSpec {
  readonly unit: string;
  readonly dimension: Dimension;
  readonly cgs: number;
  readonly log: boolean;
  readonly name: string;
}

/** Canonical unit of each kind (what {@link unitConverter} converts to). */
export const KIND_SPECS: Readonly<Record<QuantityKind, KindSpec>> = {
  velocity: { unit: 'km s-1', dimension: dim({ length: 1, time: -1 }), cgs: 1e5, log: false, name: 'velocity' },
  flux: { unit: 'erg s-1 cm-2', dimension: dim({ mass: 1, time: -3 }), cgs: 1, log: false, name: 'flux' },
  luminosity: { unit: 'erg s-1', dimension: dim({ mass: 1, length: 2, time: -3 }), cgs: 1, log: false, name: 'luminosity' },
  wavelength: { unit: 'Angstrom', dimension: dim({ length: 1 }), cgs: 1e-8, log: false, name: 'wavelength' },
  magnitude: { unit: 'mag', dimension: dim({ mag: 1 }), cgs: 1, log: false, name: 'magnitude' },
  mass: { unit: 'solMass', dimension: dim({ mass: 1 }), cgs: M_SUN_G, log: false, name: 'mass' },
  logMass: { unit: 'log(solMass)', dimension: dim({ mass: 1 }), cgs: M_SUN_G, log: true, name: 'log mass' },
  dimensionless: { unit: '', dimension: DIMENSIONLESS, cgs: 1, log: false, name: 'dimensionless number' },
  logDimensionless: { unit: 'dex', dimension: DIMENSIONLESS, cgs: 1, log: true, name: 'dimensionless logarithm' },
  angle: { unit: 'deg', dimension: dim({ angle: 1 }), cgs: 1, log: false, name: 'angle' },
};

/** Canonical unit string of each kind, e.g. `CANONICAL_UNITS.flux === 'erg s-1 cm-2'`. */
export const CANONICAL_UNITS: Readonly<Record<QuantityKind, string>> = Object.fromEntries(
  Object.entries(KIND_SPECS).map(([k, s]) => [k, s.unit]),
) as Record<QuantityKind, string>;
