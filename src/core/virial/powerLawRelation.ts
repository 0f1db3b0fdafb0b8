import type { ValueProvenance } from './virialCalibration.ts';
import { log10 } from '../math/index.ts';

/**
 * An empirical power law y = norm · (x / pivot)^slope as data, evaluated in logs:
 * log y = log10(norm) + slope · (log x − log10(pivot)).
 */
export interface PowerLawRelation {
  readonly id: string;
  /** What x and y are, with units. */
  readonly x: string;
  readonly y: string;
  readonly norm: number;
  readonly pivot: number;
  readonly slope: number;
  readonly reference: string;
  readonly provenance: ValueProvenance;
  readonly notes?: string;
}

/**
 * log10 y of the relation at log10 x.
 * @param rel - the relation.
 * @param logX - log10 of x in the relation's units.
 */
export function powerLawLogY(rel: PowerLawRelation, logX: number): number {
  return log10(rel.norm) + rel.slope * (logX - log10(rel.pivot));
}

/**
 * log10 x that gives log10 y (the relation inverted; the inversion ignores the relation's
 * scatter, i.e. it is not the regression of x on y).
 * @param rel - the relation.
 * @param logY - log10 of y in the relation's units.
 */
export function powerLawLogX(rel: PowerLawRelation, logY: number): number {
  return log10(rel.pivot) + (logY - log10(rel.norm)) / rel.slope;
}
