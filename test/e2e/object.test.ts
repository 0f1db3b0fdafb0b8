import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { objectSlug } from '../../src/site/objectSlug.ts';
import { launchBrowser } from './browser.ts';
import { markCount, nodeQuery, openSite, reachCharts, waitForCharts } from './sitePage.ts';

describe('object pages', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('show inputs, derived values with intervals, flags in words, provenance, and the object highlighted', async () => {
    const [row] = await nodeQuery(
      inject('demoParquet'),
      `SELECT id, log_mbh, log_mbh_p16, log_mbh_p84, flags FROM census WHERE log_mbh IS NOT NULL AND NOT log_mbh_is_limit AND log_mstar IS NOT NULL AND flags <> '' ORDER BY id LIMIT 1`,
    );
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL(`object/${objectSlug(String(row!.id))}/`, inject('siteUrl')).href);
      await expect(page.locator('h1').textContent()).resolves.toBe(row!.id);
      const mbh = page.locator('tr[data-column="log_mbh"]');
      await expect(mbh.locator('td').nth(1).textContent()).resolves.toBe(Number(row!.log_mbh).toFixed(2));
      await expect(mbh.locator('td').nth(2).textContent()).resolves.toBe(`${Number(row!.log_mbh_p16).toFixed(2)} – ${Number(row!.log_mbh_p84).toFixed(2)}`);
      const firstFlag = String(row!.flags).split(',')[0]!;
      await expect(page.locator('.flag-list').textContent()).resolves.toContain(firstFlag);
      await expect(page.locator('#prov-h + dl').textContent()).resolves.toMatch(/Planck/);
      await waitForCharts(page);
      // Drawn at build time: the shared population chart with the object marked and named over it.
      await expect(page.locator('[data-chart="mbh-mstar"][data-static] svg text').textContent()).resolves.toBe(row!.id);
      expect(await page.locator('[data-chart="mbh-mstar"][data-static] svg image').count()).toBe(1);
      // Redrawn by the same chart code when the reader reaches for it.
      await reachCharts(page, 'mbh-mstar');
      expect(await page.locator('[data-chart="mbh-mstar"] g[class*="census-highlighted"]').count()).toBeGreaterThan(0);
      expect(site.foreign()).toEqual([]);

      // A bound: "<" beside the value and no 16–84 % interval.
      const [limit] = await nodeQuery(inject('demoParquet'), `SELECT id, log_mbh FROM census WHERE log_mbh_is_limit ORDER BY id LIMIT 1`);
      await page.goto(new URL(`object/${objectSlug(String(limit!.id))}/`, inject('siteUrl')).href);
      const bound = page.locator('tr[data-column="log_mbh"]');
      await expect(bound.locator('td').nth(1).textContent()).resolves.toBe(`< ${Number(limit!.log_mbh).toFixed(2)} (upper limit)`);
      await expect(bound.locator('td').nth(2).textContent()).resolves.toBe('');
    } finally {
      await site.close();
    }
  });

  it('open from a click on a chart mark', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(inject('siteUrl'));
      await waitForCharts(page);
      expect(await markCount(page, 'mbh-z')).toBeGreaterThan(0);
      await reachCharts(page);
      const dot = page.locator('[data-chart="mbh-z"] g.census-catalog-point > *').first();
      await dot.scrollIntoViewIfNeeded();
      const box = (await dot.boundingBox())!;
      await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
      await page.mouse.click(box.x + box.width / 2, box.y + box.height / 2);
      await page.waitForURL(/\/object\//, { timeout: 10_000 });
      await expect(page.locator('h1').textContent()).resolves.toBeTruthy();
    } finally {
      await site.close();
    }
  });

  it('are also shown by the in-browser viewer (object/?id=…), which large catalogs link to', async () => {
    const [row] = await nodeQuery(inject('demoParquet'), `SELECT id, log_mbh FROM census WHERE log_mbh IS NOT NULL ORDER BY z DESC LIMIT 1`);
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL(`object/?id=${encodeURIComponent(String(row!.id))}`, inject('siteUrl')).href);
      await page.waitForSelector('tr[data-column="log_mbh"]', { timeout: 30_000 });
      await expect(page.locator('h1').textContent()).resolves.toBe(row!.id);
      await expect(page.locator('tr[data-column="log_mbh"] td').nth(1).textContent()).resolves.toBe(Number(row!.log_mbh).toFixed(2));
      await waitForCharts(page);
      expect(await page.locator('[data-chart="mbh-z"] g[class*="census-highlighted"]').count()).toBeGreaterThan(0);

      // A bound reads as on the page built at build time: "<" and the words, no interval.
      const [limit] = await nodeQuery(inject('demoParquet'), `SELECT id, log_mbh FROM census WHERE log_mbh_is_limit ORDER BY id LIMIT 1`);
      await page.goto(new URL(`object/?id=${encodeURIComponent(String(limit!.id))}`, inject('siteUrl')).href);
      await page.waitForSelector('tr[data-column="log_mbh"]', { timeout: 30_000 });
      const bound = page.locator('tr[data-column="log_mbh"]');
      await expect(bound.locator('td').nth(1).textContent()).resolves.toBe(`< ${Number(limit!.log_mbh).toFixed(2)} (upper limit)`);
      await expect(bound.locator('td').nth(2).textContent()).resolves.toBe('');
      // On a phone the column name moves under the quantity's name, and the value keeps its room.
      await page.setViewportSize({ width: 390, height: 844 });
      await expect(bound.locator('td.col-name').isVisible()).resolves.toBe(false);
      await expect(bound.locator('th .col-under').isVisible()).resolves.toBe(true);
      const valueBox = (await bound.locator('td').nth(1).boundingBox())!;
      const tableBox = (await bound.locator('xpath=ancestor::div[contains(@class,"table-wrap")]').boundingBox())!;
      expect(valueBox.x + valueBox.width).toBeLessThanOrEqual(tableBox.x + tableBox.width + 0.5);
      await page.setViewportSize({ width: 1280, height: 900 });

      await page.goto(new URL('object/?id=no-such-object', inject('siteUrl')).href);
      await page.waitForFunction(() => /is not in the catalog/.test(document.querySelector('[data-not-found]')?.textContent ?? ''), undefined, { timeout: 30_000 });
      expect(site.foreign()).toEqual([]);
    } finally {
      await site.close();
    }
  });
});
