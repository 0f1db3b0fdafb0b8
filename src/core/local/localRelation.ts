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
 * `out[k] = logMbh[k] − localLogMbh(rel, x[k])` for every k, bit for bit: the offset of each
 * draw's mass from the relation, with the relation's numbers read once rather than per draw.
 * @param rel - the relation.
 * @param logMbh - log10 M_BH / M_sun per draw.
 * @param x - the relation's input per draw, in the units of `rel.x`.
 * @param out - receives the offsets, dex; as long as `logMbh`.
 */
export function localOffsetInto(rel: LocalRelation, logMbh: Float64Array, x: Float64Array, out: Float64Array): void {
  const a = rel.a;
  const b = rel.b;
  const pivot = rel.pivot;
  const n = out.length;
  const n4 = n - (n % 4);
  // Four draws per step, for the reason given in virialLogMassInto.
  for (let k = 0; k < n4; k += 4) {
    out[k] = (logMbh[k] as number) - (a + b * ((x[k] as number) - pivot));
    out[k + 1] = (logMbh[k + 1] as number) - (a + b * ((x[k + 1] as number) - pivot));
    out[k + 2] = (logMbh[k + 2] as number) - (a + b * ((x[k + 2] as number) - pivot));
    out[k + 3] = (logMbh[k + 3] as number) - (a + b * ((x[k + 3] as number) - pivot));
  }
  for (let k = n4; k < n; k++) out[k] = (logMbh[k] as number) - (a + b * ((x[k] as number) - pivot));
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
