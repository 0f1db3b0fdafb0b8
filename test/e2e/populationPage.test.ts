import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from './browser.ts';
import { openSite, runSql } from './sitePage.ts';

const CHARTS = ['relation', 'mbh-function', 'lbol-function', 'totals'];

async function waitForSurveyCharts(page: Page): Promise<void> {
  await page.waitForFunction(
    (n) => {
      const mounts = Array.from(document.querySelectorAll('[data-survey-chart]'));
      return mounts.length === n && mounts.every((m) => m.querySelector('svg') || (m.textContent ?? '').includes('could not'));
    },
    CHARTS.length,
    { timeout: 30_000 },
  );
}

describe('population page', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('shows the sentence and its numbers, draws the relation and density charts, and offers the downloads', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    const { page } = site;
    try {
      await page.goto(inject('siteUrl'));
      await page.locator('nav a', { hasText: 'Population' }).click();
      await page.waitForURL('**/population/');
      await expect(page.locator('[data-population-sentence]').textContent()).resolves.toMatch(/^Corrected for selection, (.+ local relation .+\d\.\dσ|.+ \d+\.\d\d dex \(\d+\.\dσ\) (above|below) the local relation ).*; that σ is statistical only: the 0\.3–0\.5 dex systematic uncertainty/);
      await expect(page.locator('[data-fit-numbers] tbody tr').count()).resolves.toBe(10);
      await waitForSurveyCharts(page);
      for (const key of CHARTS) await expect(page.locator(`[data-survey-chart="${key}"] svg`).count(), key).resolves.toBeGreaterThan(0);
      const relation = page.locator('[data-survey-chart="relation"]');
      for (const mark of ['census-catalog-point', 'census-naive-fit', 'census-intrinsic-relation', 'census-intrinsic-relation-band', 'census-local-relation']) {
        await expect(relation.locator(`g.${mark}`).count(), mark).resolves.toBeGreaterThan(0);
      }
      await expect(page.locator('[data-survey-chart="mbh-function"] g.census-density-bin > *').count()).resolves.toBeGreaterThan(3);
      await expect(page.locator('[data-survey-chart="totals"] g.census-published-density-band rect').count()).resolves.toBe(1);
      await expect(page.locator('[data-population-caveats]').textContent()).resolves.toContain('0.3–0.5 dex');

      const links = await page.locator('[data-population-downloads] a').evaluateAll((as) => as.map((a) => (a as HTMLAnchorElement).href));
      expect(links.map((h) => h.split('/').pop())).toEqual(['catalog.population.json', 'catalog.population.parquet', 'catalog.densities.parquet', 'catalog.posterior.parquet']);
      for (const href of links) {
        const res = await page.request.get(href);
        expect(res.status(), href).toBe(200);
        const body = await res.body();
        if (href.endsWith('.json')) expect(JSON.parse(body.toString('utf8')).relation.sentence).toMatch(/^Corrected for selection/);
        // Parquet files begin with the magic "PAR1" (Apache Parquet format specification)
        else expect(body.subarray(0, 4).toString('latin1'), href).toBe('PAR1');
      }
      expect(site.errors).toEqual([]);
      expect(site.foreign()).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('answers a SQL join of the catalog with the per-object table population', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    const { page } = site;
    try {
      const sql = 'SELECT count(*) AS n FROM census JOIN population USING (id) WHERE population.vmax_cmpc3 > 0';
      await page.goto(new URL('query/', inject('siteUrl')).href);
      await runSql(page, sql, 60_000);
      await page.waitForSelector('table[data-results] tbody tr', { timeout: 60_000 });
      const n = Number(await page.locator('table[data-results] tbody tr').first().locator('td').first().textContent());
      expect(n).toBeGreaterThan(100);
    } finally {
      await site.close();
    }
  });

  it('fits a 390 px wide screen without sideways scrolling', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    const { page } = site;
    try {
      await page.setViewportSize({ width: 390, height: 844 });
      await page.goto(new URL('population/', inject('siteUrl')).href);
      await waitForSurveyCharts(page);
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
      expect(overflow).toBeLessThanOrEqual(0);
    } finally {
      await site.close();
    }
  });

  it('says plainly that a catalog without a survey block has no population results, and how to add them', async () => {
    const site = await openSite(browser, inject('hostileUrl'));
    const { page } = site;
    try {
      await page.goto(new URL('population/', inject('hostileUrl')).href);
      const text = await page.locator('[data-population-missing]').textContent();
      expect(text).toContain('without a description of its survey');
      expect(text).toContain('dawn-census population -c census.config.yaml');
      await expect(page.locator('[data-survey-chart]').count()).resolves.toBe(0);
      // Visitors are told there are none; the how-to is folded away for the authors, and no page links here.
      await expect(page.locator('[data-population-missing] details.for-authors').getAttribute('open')).resolves.toBeNull();
      await expect(page.locator('nav[aria-label="Site"] a[href$="population/"]').count()).resolves.toBe(0);
      await page.goto(new URL('', inject('hostileUrl')).href);
      await expect(page.locator('nav[aria-label="Site"] a[href$="population/"]').count()).resolves.toBe(0);
      const res = await page.request.get(new URL('data/catalog.population.json', inject('hostileUrl')).href);
      expect(res.status()).toBe(404);
      expect(site.errors).toEqual([]);
    } finally {
      await site.close();
    }
  });
});
