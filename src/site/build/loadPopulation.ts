/**
 * Reads the results of `dawn-census population` beside the catalog at build time (Node): the summary JSON, the
 * per-object table (V_max, field, flag), and the posterior samples (for the band of the intrinsic relation). Absent
 * results (a catalog without a survey block) give null, and the population page says how to make them.
 */
import { existsSync, readFileSync, statSync } from 'node:fs';
import { DuckDBInstance } from '@duckdb/node-api';
import { populationPaths } from '../../catalog/population/populationPaths.ts';
import { poissonInterval } from '../../core/population/poissonInterval.ts';
import { relationBand, type RelationBandPoint } from '../../core/population/relationBand.ts';
import { loadCatalog, type CatalogRow } from './loadCatalog.ts';
import { normalizePopulationSummary, type PopulationSummaryView } from './populationSummary.ts';

/** A population file offered as a download (copied into the site's data folder). */
export interface PopulationDownload {
  /** File name in the site's `data/` folder, e.g. `catalog.population.parquet`. */
  name: string;
  /** Absolute path of the source file. */
  path: string;
  bytes: number;
  what: string;
}

/** The total space density of the sample in one redshift range: Σ 1/V_max with Poisson limits on the count. */
export interface DensityTotal {
  zLo: number;
  zHi: number;
  count: number;
  /** Objects per comoving Mpc³. */
  n: number;
  /** Poisson 1σ limits (Gehrels 1986) scaled by n/count; for an empty range, 0 and undefined above. */
  nLo: number;
  nHi: number | null;
}

export interface SitePopulation {
  summary: PopulationSummaryView;
  /** Catalog rows (chart columns) of the objects with a V_max: the observed points of the relation chart. */
  points: CatalogRow[];
  /** Objects with a V_max left out of `points` by the cap. */
  pointsCapped: number;
  /** 68 % band of the intrinsic relation's mean from the posterior samples; empty without samples. */
  band: RelationBandPoint[];
  totals: DensityTotal[];
  downloads: PopulationDownload[];
  /** True when the summary is older than the catalog: the catalog was derived again after the population step. */
  stale: boolean;
}

/** Most observed points the page embeds (the page carries them as data; beyond this the chart shows a subset). */
export const MAX_POINTS = 5000;

const POINT_COLUMNS = ['id', 'z', 'log_mstar', 'log_mstar_err', 'log_mbh', 'log_mbh_p16', 'log_mbh_p84', 'flags'];
const quote = (s: string) => `'${s.replace(/'/g, "''")}'`;

/** The intrinsic relation's band over [lo, hi] in log M*, 41 points. */
function bandGrid(lo: number, hi: number): number[] {
  return Array.from({ length: 41 }, (_, i) => lo + ((hi - lo) * i) / 40);
}

/** Reads the population results beside `catalogParquet` given the catalog's rows; null when there are none. */
export async function readPopulation(catalogParquet: string, rows: readonly CatalogRow[]): Promise<SitePopulation | null> {
  const paths = populationPaths(catalogParquet);
  if (!existsSync(paths.summary)) return null;
  let raw: unknown;
  try {
    raw = JSON.parse(readFileSync(paths.summary, 'utf8'));
  } catch (err) {
    throw new Error(`The population summary ${paths.summary} is not valid JSON: ${(err as Error).message}`);
  }
  const summary = normalizePopulationSummary(raw);
  const vmax = new Map<string, number>();
  let alpha: number[] = [];
  let beta: number[] = [];
  const instance = await DuckDBInstance.create(':memory:');
  const con = await instance.connect();
  try {
    if (existsSync(paths.objects)) {
      const r = await con.runAndReadAll(`SELECT id, vmax_cmpc3 FROM read_parquet(${quote(paths.objects)}) WHERE vmax_cmpc3 > 0`);
      for (const o of r.getRowObjectsJS()) vmax.set(String(o.id), Number(o.vmax_cmpc3));
    }
    if (existsSync(paths.posterior)) {
      const r = await con.runAndReadAll(`SELECT alpha, beta FROM read_parquet(${quote(paths.posterior)}) WHERE fit = 'selection_aware'`);
      const objs = r.getRowObjectsJS();
      alpha = objs.map((o) => Number(o.alpha));
      beta = objs.map((o) => Number(o.beta));
    }
  } finally {
    con.closeSync();
    instance.closeSync();
  }
  const withVmax = rows.filter((r) => vmax.has(String(r.id)));
  const placed = withVmax.filter((r) => typeof r.log_mstar === 'number' && typeof r.log_mbh === 'number');
  const points = placed.slice(0, MAX_POINTS).map((r) => Object.fromEntries(POINT_COLUMNS.filter((c) => c in r).map((c) => [c, r[c] ?? null])) as CatalogRow);
  const xs = placed.map((r) => r.log_mstar as number);
  const lo = xs.length ? Math.min(...xs) - 0.3 : 8;
  const hi = xs.length ? Math.max(...xs) + 0.3 : 11;
  const band = summary.relation ? relationBand(alpha, beta, bandGrid(lo, hi)) : [];
  const ranges = [...new Map(summary.densities.map((d) => [`${d.zLo}|${d.zHi}`, [d.zLo, d.zHi] as const])).values()];
  const totals = ranges.map(([zLo, zHi]) => {
    let count = 0;
    let n = 0;
    for (const r of withVmax) {
      const z = r.z;
      if (typeof z !== 'number' || z < zLo || z >= zHi) continue;
      count += 1;
      n += 1 / (vmax.get(String(r.id)) as number);
    }
    const lim = poissonInterval(count);
    return { zLo, zHi, count, n, nLo: count > 0 ? (lim.lower * n) / count : 0, nHi: count > 0 ? (lim.upper * n) / count : null };
  });
  // the site names them after its own data/catalog.parquet, whatever the catalog's file is called
  const offered: [string, string, string][] = [
    [paths.summary, 'catalog.population.json', 'summary: relation fits with percentiles, selection bias, detectable fraction, densities (JSON)'],
    [paths.objects, 'catalog.population.parquet', 'per object: survey field, detection line, V_max, V/V_max, below_survey_limit (Parquet)'],
    [paths.densities, 'catalog.densities.parquet', 'binned mass and luminosity functions with Poisson and Monte Carlo intervals (Parquet)'],
    [paths.posterior, 'catalog.posterior.parquet', 'posterior samples of α, β, σ for both fits (Parquet)'],
  ];
  const downloads = offered.filter(([p]) => existsSync(p)).map(([path, name, what]) => ({ name, path, bytes: statSync(path).size, what }));
  const stale = existsSync(catalogParquet) && statSync(paths.summary).mtimeMs < statSync(catalogParquet).mtimeMs;
  return { summary, points, pointsCapped: placed.length - points.length, band, totals, downloads, stale };
}

let cached: Promise<SitePopulation | null> | null = null;

/** The build's population results, read once (null when the catalog has none). */
export function loadPopulation(): Promise<SitePopulation | null> {
  cached ??= loadCatalog().then((c) => readPopulation(c.files.parquet, c.rows));
  return cached;
}
