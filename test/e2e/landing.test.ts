import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './browser.ts';
import { nodeQuery, openSite, waitForCharts } from './sitePage.ts';
import { READING_FLAGS } from '../../src/site/text/readingFlags.ts';

describe('landing page', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('shows the title, the counts computed from the catalog, and draws its charts without leaving the origin', async () => {
    const [expected] = await nodeQuery(
      inject('demoParquet'),
      // the headline counts only flags that change how a number is read (not no_dust_correction, no_host_mass, lbol_fallback …)
      `SELECT count(*) AS objects, count(log_mbh) FILTER (WHERE NOT log_mbh_is_limit) AS derived, count(log_mbh) FILTER (WHERE log_mbh_is_limit) AS limits,
         count(*) FILTER (WHERE list_has_any(list_transform(string_split(coalesce(flags, ''), ','), f -> trim(f)), [${READING_FLAGS.map((f) => `'${f}'`).join(', ')}])) AS caveated,
         count(*) FILTER (WHERE coalesce(flags, '') <> '') AS flagged FROM census`,
    );
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(inject('siteUrl'));
      await expect(page.locator('h1').textContent()).resolves.toContain('Cinderwake');
      for (const key of ['objects', 'derived', 'caveated'] as const) {
        await expect(page.locator(`[data-count="${key}"]`).textContent()).resolves.toBe(String(expected![key]));
      }
      // Upper-limit masses are counted apart from the measured ones (they were counted as masses).
      expect(Number(expected!.limits)).toBeGreaterThan(0);
      await expect(page.locator('[data-count="mass-limits"]').textContent()).resolves.toBe(String(expected!.limits));
      // rough edge: 89 % of demo objects carried "a caveat flag"; the headline now says something
      expect(Number(expected!.caveated)).toBeLessThan(0.5 * Number(expected!.flagged));
      expect(Number(expected!.caveated)).toBeGreaterThan(0);
      await waitForCharts(page);
      expect(await page.locator('[data-chart] svg').count()).toBeGreaterThanOrEqual(4);
      // The charts were drawn at build time: the first view loads no database and no chart code.
      expect(site.requests.filter((u) => /\.wasm$|worker|chart-rows/.test(u))).toEqual([]);
      expect(site.foreign()).toEqual([]);
      expect(site.errors).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('offers the catalog for download as Parquet and CSV with the same rows', async () => {
    const base = inject('siteUrl');
    const parquet = await fetch(new URL('data/catalog.parquet', base));
    expect(parquet.status).toBe(200);
    const bytes = new Uint8Array(await parquet.arrayBuffer());
    expect(new TextDecoder().decode(bytes.slice(0, 4))).toBe('PAR1');
    const csv = await (await fetch(new URL('data/catalog.csv', base))).text();
    const [count] = await nodeQuery(inject('demoParquet'), 'SELECT count(*) AS n FROM census');
    const lines = csv.trim().split('\n');
    const body = lines.filter((l) => !l.startsWith('#'));
    expect(body.length - 1).toBe(count!.n);
    expect(body[0]).toMatch(/^id,/);
    // The commented header gives units: log_mbh in dex(solMass).
    expect(lines.find((l) => l.startsWith('# log_mbh '))).toMatch(/^# log_mbh \[dex\(solMass\)\] \(phys\.mass\): /);
    for (const f of ['catalog.ecsv', 'catalog.vot', 'catalog.fits', 'catalog.rejections.csv', '../CITATION.cff']) {
      expect((await fetch(new URL(`data/${f}`, base))).status, f).toBe(200);
    }
  });
});
