/**
 * What the population page's charts are drawn from, as one plain object the build writes onto the page (a data
 * attribute, escaped like any text) and the page script reads back. Small: the observed points (capped), the band
 * of the intrinsic relation, the naive fit, the binned functions and the totals.
 */
import type { LocalRelationId } from '../../core/derive/types.ts';
import type { RelationBandPoint } from '../../core/population/relationBand.ts';
import type { DensityBinRow } from '../charts/spaceDensityFunction.ts';
import type { DensityTotalRow } from '../charts/spaceDensityByRedshift.ts';
import type { CatalogRow } from '../charts/types.ts';

export interface SurveyChartData {
  points: CatalogRow[];
  band: RelationBandPoint[];
  naive: { alpha: number; beta: number } | null;
  pivotLogMstar: number;
  localRelation: LocalRelationId;
  mbhFunction: DensityBinRow[];
  lbolFunction: DensityBinRow[];
  totals: DensityTotalRow[];
}

/** Reads the page's chart data back from its data attribute; throws a plain message when it is not there. */
export function parseSurveyChartData(text: string | undefined): SurveyChartData {
  if (!text) throw new Error('The page carries no chart data.');
  const d = JSON.parse(text) as Partial<SurveyChartData>;
  return {
    points: d.points ?? [],
    band: d.band ?? [],
    naive: d.naive ?? null,
    pivotLogMstar: d.pivotLogMstar ?? 10,
    localRelation: (d.localRelation ?? 'rv15_agn') as LocalRelationId,
    mbhFunction: d.mbhFunction ?? [],
    lbolFunction: d.lbolFunction ?? [],
    totals: d.totals ?? [],
  };
}
