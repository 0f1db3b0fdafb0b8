import { describe, expect, it } from 'vitest';
import { placeReport } from '../../../src/site/place/placeReport.ts';
import type { CatalogRow } from '../../../src/site/charts/types.ts';

const pop: CatalogRow[] = [
  { id: 'P1', z: 5.0, log_mbh: 6.0, log_lbol: 44.0, log_edd_ratio: -1.0, flags: '' },
  { id: 'P2', z: 5.2, log_mbh: 7.0, log_lbol: 45.0, log_edd_ratio: -0.5, flags: '' },
  { id: 'P3', z: 5.4, log_mbh: 8.0, log_lbol: 46.0, log_edd_ratio: 0.0, flags: '' },
  { id: 'P4', z: 7.0, log_mbh: 9.0, log_lbol: 47.0, log_edd_ratio: 0.5, flags: '' },
  { id: 'P5', z: 5.1, log_mbh: 5.0, log_lbol: 43.0, log_edd_ratio: -2.0, flags: 'mbh_upper_limit,edd_ratio_upper_limit' },
  { id: 'P6', z: 5.3, log_mbh: null, log_lbol: null, log_edd_ratio: null, flags: 'invalid_input' },
];

describe('placeReport', () => {
  const obj: CatalogRow = { id: 'NEW', z: 5.25, log_mbh: 7.5, log_lbol: 45.5, log_edd_ratio: -0.2, flags: '' };

  it('ranks against every measured catalog value, leaving out limits and missing values', () => {
    const r = placeReport(obj, pop);
    const mbh = r.ranks.find((x) => x.column === 'log_mbh')!;
    // measured masses 6, 7, 8, 9: two below 7.5
    expect(mbh.all).toEqual({ percentile: 50, n: 4 });
    // within z 4.75–5.75: masses 6, 7, 8 (P5 is a limit, P4 at z = 7 is outside)
    expect(mbh.window).toEqual({ percentile: (100 * 2) / 3, n: 3 });
    const lbol = r.ranks.find((x) => x.column === 'log_lbol')!;
    // L_bol of P5 is not flagged as a limit, so it counts: 43, 44, 45 below 45.5 of 5
    expect(lbol.all).toEqual({ percentile: 60, n: 5 });
    expect(r.zWindow).toEqual([4.75, 5.75]);
  });

  it('lists the nearest catalog objects with all three coordinates, nearest first', () => {
    const r = placeReport(obj, pop, 3);
    // sample sds over P1–P5: z 0.8295, log M 1.5811, log λ 0.9618 (computed by hand); distances
    // P3 0.419, P2 0.448, P1 1.30, P5 2.3, P4 2.9
    expect(r.neighbours.map((n) => n.id)).toEqual(['P3', 'P2', 'P1']);
    expect(r.neighbours[0]!.distance).toBeCloseTo(0.4194, 3);
    expect(r.neighbours[0]!.distance).toBeLessThan(r.neighbours[1]!.distance);
  });

  it('gives no ranks or neighbours for a quantity the object lacks', () => {
    const r = placeReport({ id: 'X', z: 5, log_mbh: null, flags: 'invalid_input' }, pop);
    expect(r.ranks[0]!.all.percentile).toBeNull();
    expect(r.neighbours).toEqual([]);
  });
});
