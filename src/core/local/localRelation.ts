import type { LocalRelationId } from '../derive/types.ts';
import type { MassScale } from '../virial/massScale.ts';

/** Which host quantity a local relation takes: log10 of M_star or M_bulge in M_sun, or log10 of σ_star in km s⁻¹. */
export type LocalRelationInput = 'logMstar' | 'logMbulge' | 'logSigma';

/**
 * A local black-hole scaling relation as data: log M_BH = a + b (x − pivot), M_BH in M_sun,
 * x as named by `x` (log10 of M_sun or of km s⁻¹).
 */
export interface LocalRelation {
  readonly id: LocalRelationId;
  readonly label: string;
  readonly x: LocalRelationInput;
  /** log10 M_BH at x = pivot, M_sun. */
  readonly a: number;
  readonly b: number;
  /** Pivot in the units of x (e.g. 11 for M* = 1e11 M_sun, log10 200 for σ = 200 km/s). */
  readonly pivot: number;
  /** Intrinsic scatter in log M_BH at fixed x, dex. */
  readonly scatterDex: number;
  readonly scatterProvenance: 'published' | 'from memory';
  readonly reference: string;
  /** The mass scale of the black-hole masses the relation was fitted to. */
  readonly massScale: MassScale;
  /** Approximate range of x covered by the fitted sample (from memory: not published limits). */
  readonly validity: { readonly x: readonly [number, number] };
  readonly notes?: string;
}

/**
 * log10 M_BH predicted by a local relation, M_sun.
 * @param rel - the relation.
 * @param x - its input, see `rel.x` (log10 M*, log10 M_bulge in M_sun, or log10 σ* in km s⁻¹).
 */
export function localLogMbh(rel: LocalRelation, x: number): number {
  return rel.a + rel.b * (x - rel.pivot);
}

/**
 * Which input a relation needs.
 * @param rel - the relation.
 */
export function localRelationInput(rel: LocalRelation): LocalRelationInput {
  return rel.x;
}

/**
 * Whether x lies in the relation's approximate calibrated range (inclusive).
 * @param rel - the relation.
 * @param x - its input, in the units of `rel.x`.
 */
export function inLocalRelationRange(rel: LocalRelation, x: number): boolean {
  return x >= rel.validity.x[0] && x <= rel.validity.x[1];
}
