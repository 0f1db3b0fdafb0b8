/**
 * Seeded fake catalog rows for the chart tests (invented values with realistic ranges; no
 * real objects). Every `limitEvery`-th row is flagged as an upper limit on M_BH, L_bol and
 * λ_Edd, every `missingEvery`-th lacks a stellar mass.
 */
import { parseHTML } from 'linkedom';
import { markClass } from '../../../src/site/charts/markTag.ts';
import type { CatalogRow } from '../../../src/site/charts/types.ts';
import { mulberry32 } from '../../../scripts/lib/demoRandom.ts';

/** Seeded uniform deviates for test data: the demo generator's mulberry32. */
export const seededUniform = (seed: number): (() => number) => mulberry32(seed);

export interface FakeOptions {
  n: number;
  seed?: number;
  limitEvery?: number;
  missingEvery?: number;
}

export function fakeRows({ n, seed = 7, limitEvery = 0, missingEvery = 0 }: FakeOptions): CatalogRow[] {
  const u = seededUniform(seed);
  const rows: CatalogRow[] = [];
  for (let i = 0; i < n; i++) {
    const z = 4 + 6 * u();
    const logMbh = 6 + 2.5 * u();
    const logEdd = -1.5 + 2 * u();
    const logLbol = logMbh + logEdd + Math.log10(1.26e38);
    const isLimit = limitEvery > 0 && i % limitEvery === limitEvery - 1;
    const missing = missingEvery > 0 && i % missingEvery === 0;
    rows.push({
      id: `FAKE-${String(i).padStart(5, '0')}`,
      z,
      log_mstar: missing ? null : 8 + 2 * u(),
      log_mstar_err: missing ? null : 0.2,
      log_mbh: logMbh,
      log_mbh_p16: logMbh - 0.4,
      log_mbh_p50: logMbh,
      log_mbh_p84: logMbh + 0.4,
      log_lbol: logLbol,
      log_lbol_p16: logLbol - 0.2,
      log_lbol_p84: logLbol + 0.2,
      log_edd_ratio: logEdd,
      log_edd_ratio_p16: logEdd - 0.45,
      log_edd_ratio_p84: logEdd + 0.45,
      fwhm_halpha: 1500 + 2500 * u(),
      fwhm_halpha_err: 150,
      log_lum_halpha: 41.5 + 1.5 * u(),
      fwhm_hbeta: i % 3 === 0 ? 1600 + 2000 * u() : null,
      fwhm_hbeta_err: i % 3 === 0 ? 200 : null,
      log_lum_hbeta: i % 3 === 0 ? 41 + 1.2 * u() : null,
      flux_halpha_is_limit: isLimit,
      age_gyr: null,
      flags: isLimit ? 'mbh_upper_limit,lbol_upper_limit,edd_ratio_upper_limit' : '',
    });
  }
  return rows;
}

/** A fresh DOM document for Plot to draw into. */
export function testDocument(): Document {
  return parseHTML('<!doctype html><html><body></body></html>').document as unknown as Document;
}

/** The drawn shapes (circles, paths, lines, rects, texts) of every mark named `name` (see src/site/charts/markTag.ts). */
export function markElements(el: Element, name: string): Element[] {
  return [...el.querySelectorAll(`g.${markClass(name)}`)].flatMap((g) => [...g.querySelectorAll('circle,path,line,rect,text')]);
}

/** The chart's <svg> (the element itself, or the one inside the figure). */
export function svgOf(el: Element): Element {
  const svg = el.tagName.toLowerCase() === 'svg' ? el : el.querySelector('svg');
  if (!svg) throw new Error('no svg in the chart');
  return svg;
}
