/**
 * The numbers behind the population page's sentence, as rows of a table: each with what it is, its value in words a
 * reader can quote (median with the 68 % interval), and how it was obtained.
 */
import type { Quantiles, RelationSummaryView } from '../build/populationSummary.ts';

export interface FitNumber {
  key: string;
  label: string;
  value: string;
  note: string;
}

const minus = (s: string) => s.replace(/^-/, '−');

/** "1.38 (+0.19 / −0.38)": the median with the distances to the 84th and 16th percentiles. */
export function formatQuantiles(q: Quantiles, digits = 2): string {
  return `${minus(q.p50.toFixed(digits))} (+${(q.p84 - q.p50).toFixed(digits)} / −${(q.p50 - q.p16).toFixed(digits)})`;
}

/** A fraction as a percentage with two significant digits, or with one decimal below 1 %. */
function percent(f: number): string {
  if (!Number.isFinite(f)) return '—';
  const p = 100 * f;
  return p >= 1 ? `${p.toPrecision(2)} %` : `${p.toFixed(p >= 0.1 ? 2 : 3)} %`;
}

/** The rows of the numbers table for a relation fit. */
export function fitNumbers(rel: RelationSummaryView): FitNumber[] {
  const pivot = rel.pivotLogMstar;
  return [
    { key: 'alpha', label: `Intrinsic α (log M_BH at log M* = ${pivot})`, value: formatQuantiles(rel.intrinsic.alpha), note: 'selection-aware fit, posterior median and 68 % interval' },
    { key: 'beta', label: 'Intrinsic slope β', value: formatQuantiles(rel.intrinsic.beta), note: 'selection-aware fit' },
    { key: 'sigma', label: 'Intrinsic scatter σ (dex)', value: formatQuantiles(rel.intrinsic.sigma), note: 'selection-aware fit' },
    { key: 'naive-alpha', label: 'Naive α', value: formatQuantiles(rel.naive.alpha), note: 'the same points fitted without the selection' },
    { key: 'naive-beta', label: 'Naive slope β', value: formatQuantiles(rel.naive.beta), note: 'without the selection' },
    { key: 'naive-sigma', label: 'Naive scatter σ (dex)', value: formatQuantiles(rel.naive.sigma), note: 'without the selection' },
    { key: 'bias', label: `Selection bias at log M* = ${rel.medianLogMstar.toFixed(2)} (dex)`, value: Number.isFinite(rel.selectionBiasDex) ? minus(rel.selectionBiasDex.toFixed(2)) : '—', note: 'mean excess of detected black holes over the intrinsic relation at the sample’s median host mass' },
    { key: 'detectable', label: 'Detectable fraction', value: percent(rel.detectableFraction), note: 'share of the model population (over the M* range of the fit) the survey would detect' },
    { key: 'offset', label: 'Intrinsic minus local relation (dex)', value: formatQuantiles(rel.offsetFromLocal), note: `at log M* = ${rel.medianLogMstar.toFixed(2)}; ${Number.isFinite(rel.offsetSigmas) ? `${rel.offsetSigmas.toFixed(1)}σ` : '—'} from zero` },
    { key: 'objects', label: 'Objects in the fit', value: String(rel.objects), note: rel.assumedMstarErr > 0 ? `${rel.assumedMstarErr} without an M* error were given 0.3 dex` : 'every object has its own M* error' },
  ];
}
