import type { LocalRelationId } from '../../core/derive/types.ts';
import { getLocalRelation, localLogMbh, type LocalRelation } from '../../core/local/index.ts';

/** A local relation drawn on the M_BH–M* plane: the line in and out of its calibrated range and its scatter band. */
export interface RelationCurve {
  relation: LocalRelation;
  chosen: boolean;
  /** Points of the line (x = log M*, y = log M_BH), `inRange` false where extrapolated. */
  line: { x: number; y: number; inRange: boolean }[];
  /** Band ± intrinsic scatter across the x domain. */
  band: { x: number; lo: number; hi: number }[];
}

/** Relations whose input can be read off a stellar-mass axis (M*, or M* taken as the bulge mass). */
export function drawableOnStellarMass(rel: LocalRelation): boolean {
  return rel.x === 'logMstar' || rel.x === 'logMbulge';
}

/**
 * The curves of the chosen relation (when it takes a mass) and of `others` over `xDomain`
 * (log M_sun). Each line is split at the ends of the relation's calibrated range so the
 * extrapolated parts can be drawn differently.
 */
export function relationCurves(chosen: LocalRelationId, others: readonly LocalRelationId[], xDomain: readonly [number, number]): RelationCurve[] {
  const ids = [chosen, ...others.filter((id) => id !== chosen)];
  const curves: RelationCurve[] = [];
  for (const id of ids) {
    const relation = getLocalRelation(id);
    if (!drawableOnStellarMass(relation)) continue;
    const [v0, v1] = relation.validity.x;
    const xs = [xDomain[0], ...[v0, v1].filter((v) => v > xDomain[0] && v < xDomain[1]), xDomain[1]];
    const line: RelationCurve['line'] = [];
    for (let i = 0; i + 1 < xs.length; i++) {
      const a = xs[i]!;
      const b = xs[i + 1]!;
      const inRange = (a + b) / 2 >= v0 && (a + b) / 2 <= v1;
      line.push({ x: a, y: localLogMbh(relation, a), inRange }, { x: b, y: localLogMbh(relation, b), inRange });
    }
    const band = [xDomain[0], xDomain[1]].map((x) => {
      const y = localLogMbh(relation, x);
      return { x, lo: y - relation.scatterDex, hi: y + relation.scatterDex };
    });
    curves.push({ relation, chosen: id === chosen, line, band });
  }
  return curves;
}
