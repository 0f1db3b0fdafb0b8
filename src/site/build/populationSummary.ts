/**
 * The summary `dawn-census population` writes (`<name>.population.json`), as the population page reads it.
 * Normalised without trusting its shape: a part that is missing or malformed becomes null, and the page says so.
 */
import type { DensityBin } from '../../core/population/binnedDensity.ts';
import { isRecord, pick } from '../recordPath.ts';

/** 16th, 50th and 84th percentiles. */
export interface Quantiles {
  p16: number;
  p50: number;
  p84: number;
}

/** One bin of a binned space density (per comoving Mpc³ per dex), as the core computes it. */
export type DensityBinView = DensityBin;

/** A mass or luminosity function in one redshift range. */
export interface DensityFunctionView {
  quantity: 'log_mbh' | 'log_lbol';
  zLo: number;
  zHi: number;
  bins: DensityBinView[];
}

/** The relation fits, as recorded. */
export interface RelationSummaryView {
  objects: number;
  assumedMstarErr: number;
  medianLogMstar: number;
  /** log M* where α is read off (10 unless recorded otherwise). */
  pivotLogMstar: number;
  intrinsic: { alpha: Quantiles; beta: Quantiles; sigma: Quantiles };
  naive: { alpha: Quantiles; beta: Quantiles; sigma: Quantiles };
  selectionBiasDex: number;
  detectableFraction: number;
  localRelation: string;
  offsetFromLocal: Quantiles;
  offsetSigmas: number;
  sentence: string;
}

export interface PopulationSummaryView {
  cosmology: string | null;
  seed: number | null;
  fields: { name: string; areaArcmin2: number; sourcePlaneAreaArcmin2: number | null }[];
  wavelengthRangeAngstrom: [number, number] | null;
  minFwhmKms: number | null;
  minSnr: number | null;
  objects: number;
  withVmax: number;
  belowSurveyLimit: number;
  densities: DensityFunctionView[];
  relation: RelationSummaryView | null;
  /** Why there is no relation fit, when there is none. */
  relationNote: string | null;
  eddingtonRatio: { meanLog: number; sigmaLog: number } | null;
  sampler: { walkers: number; steps: number; burn: number } | null;
}

const num = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);
const str = (v: unknown): string | null => (typeof v === 'string' && v.trim() !== '' ? v : null);

function quantiles(v: unknown): Quantiles | null {
  if (!isRecord(v)) return null;
  const p16 = num(v.p16), p50 = num(v.p50), p84 = num(v.p84);
  return p16 === null || p50 === null || p84 === null ? null : { p16, p50, p84 };
}

function triple(v: unknown): { alpha: Quantiles; beta: Quantiles; sigma: Quantiles } | null {
  if (!isRecord(v)) return null;
  const alpha = quantiles(v.alpha), beta = quantiles(v.beta), sigma = quantiles(v.sigma);
  return alpha && beta && sigma ? { alpha, beta, sigma } : null;
}

function relationOf(v: unknown): RelationSummaryView | null {
  if (!isRecord(v)) return null;
  const intrinsic = triple(v.intrinsic), naive = triple(v.naive), offset = quantiles(v.offsetFromLocal);
  const sentence = str(v.sentence), median = num(v.medianLogMstar);
  if (!intrinsic || !naive || !offset || sentence === null || median === null) return null;
  return {
    objects: num(v.objects) ?? 0,
    assumedMstarErr: num(v.assumedMstarErr) ?? 0,
    medianLogMstar: median,
    pivotLogMstar: num(v.pivotLogMstar) ?? 10,
    intrinsic,
    naive,
    selectionBiasDex: num(v.selectionBiasDex) ?? NaN,
    detectableFraction: num(v.detectableFraction) ?? NaN,
    localRelation: str(v.localRelation) ?? '',
    offsetFromLocal: offset,
    offsetSigmas: num(v.offsetSigmas) ?? NaN,
    sentence,
  };
}

function binOf(v: unknown): DensityBinView | null {
  if (!isRecord(v)) return null;
  const lo = num(v.lo), hi = num(v.hi), count = num(v.count), phi = num(v.phi), phiLo = num(v.phiLo), phiHi = num(v.phiHi);
  if (lo === null || hi === null || count === null || phi === null || phiLo === null || phiHi === null) return null;
  return { lo, hi, count, phi, phiLo, phiHi, phiP16: num(v.phiP16), phiP84: num(v.phiP84) };
}

function densityOf(v: unknown): DensityFunctionView | null {
  if (!isRecord(v) || (v.quantity !== 'log_mbh' && v.quantity !== 'log_lbol') || !Array.isArray(v.zRange) || !Array.isArray(v.bins)) return null;
  const zLo = num(v.zRange[0]), zHi = num(v.zRange[1]);
  if (zLo === null || zHi === null) return null;
  return { quantity: v.quantity, zLo, zHi, bins: v.bins.map(binOf).filter((b): b is DensityBinView => b !== null) };
}

/** Normalises a parsed `<name>.population.json`. */
export function normalizePopulationSummary(raw: unknown): PopulationSummaryView {
  const r = isRecord(raw) ? raw : {};
  const survey = isRecord(r.survey) ? r.survey : {};
  const range = Array.isArray(survey.wavelengthRangeAngstrom) ? survey.wavelengthRangeAngstrom.map(num) : [];
  const edd = pick(r, 'assumptions.eddingtonRatio');
  const sampler = pick(r, 'assumptions.sampler');
  return {
    cosmology: str(r.cosmology),
    seed: num(r.seed),
    fields: (Array.isArray(survey.fields) ? survey.fields : []).filter(isRecord).map((f) => ({
      name: str(f.name) ?? '—',
      areaArcmin2: num(f.areaArcmin2) ?? NaN,
      sourcePlaneAreaArcmin2: num(f.sourcePlaneAreaArcmin2),
    })),
    wavelengthRangeAngstrom: range.length === 2 && range[0] !== null && range[1] !== null ? [range[0]!, range[1]!] : null,
    minFwhmKms: num(survey.minFwhmKms),
    minSnr: num(survey.minSnr),
    objects: num(r.objects) ?? 0,
    withVmax: num(r.withVmax) ?? 0,
    belowSurveyLimit: num(r.belowSurveyLimit) ?? 0,
    densities: (Array.isArray(r.densities) ? r.densities : []).map(densityOf).filter((d): d is DensityFunctionView => d !== null),
    relation: relationOf(r.relation),
    relationNote: str(r.relationNote),
    eddingtonRatio: isRecord(edd) && num(edd.meanLog) !== null && num(edd.sigmaLog) !== null ? { meanLog: edd.meanLog as number, sigmaLog: edd.sigmaLog as number } : null,
    sampler: isRecord(sampler) && num(sampler.walkers) !== null && num(sampler.steps) !== null ? { walkers: sampler.walkers as number, steps: sampler.steps as number, burn: num(sampler.burn) ?? 0 } : null,
  };
}
