import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { objectSlug } from '../../src/site/objectSlug.ts';
import { launchBrowser } from './browser.ts';
import { HOSTILE_IDS, HOSTILE_INVALID_FWHM, HOSTILE_INVALID_ID } from './hostileCatalog.ts';
import { openSite, reachCharts, runSql, waitForCharts } from './sitePage.ts';

const pwned = (page: Page) => page.evaluate(() => (window as unknown as { __pwned?: unknown }).__pwned);

describe('a hostile catalog', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('renders as text on the landing page, in query results and on object pages; none of its script runs', async () => {
    const url = inject('hostileUrl');
    const site = await openSite(browser, url);
    try {
      const { page } = site;
      await page.goto(url);
      await expect(page.locator('h1').textContent()).resolves.toBe('Hostile <script>window.__pwned=1;alert(1)</script> 天体');
      await waitForCharts(page);
      await reachCharts(page);
      expect(await pwned(page)).toBeUndefined();

      await page.goto(new URL('query/', url).href);
      await runSql(page, 'SELECT id, field, notes, z, log_mbh FROM census ORDER BY z');
      await page.waitForFunction(() => document.querySelector('[data-result-summary]')?.getAttribute('data-rows') === '6', undefined, { timeout: 30_000 });
      const ids = await page.locator('table[data-results] tbody tr td:first-child').allTextContents();
      expect(ids).toEqual([...HOSTILE_IDS, HOSTILE_INVALID_ID]);
      await expect(page.locator('table[data-results] tbody tr').first().locator('td').nth(2).textContent()).resolves.toContain('<img src=x');
      await page.waitForFunction(() => document.querySelector('[data-population="manual"] [data-chart="mbh-z"] svg'), undefined, { timeout: 30_000 });
      expect(await pwned(page)).toBeUndefined();

      for (const id of HOSTILE_IDS) {
        await page.goto(new URL(`object/${objectSlug(id)}/`, url).href);
        await expect(page.locator('h1').textContent()).resolves.toBe(id);
        await expect(page.locator('tr[data-column="notes"] td').nth(1).textContent()).resolves.toContain('天体 Ελληνικά');
        await waitForCharts(page);
        await reachCharts(page);
        expect(await pwned(page)).toBeUndefined();
      }
      expect(await page.locator('img[src="x"]').count()).toBe(0);
      expect(site.dialogs).toEqual([]);
      expect(site.errors).toEqual([]);
      expect(site.foreign()).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('shows an invalid row’s rejected value and the reason on its object page, static and in the viewer (it pointed to a report the site does not publish)', async () => {
    const url = inject('hostileUrl');
    const site = await openSite(browser, url);
    try {
      const { page } = site;
      for (const href of [`object/${objectSlug(HOSTILE_INVALID_ID)}/`, `object/?id=${encodeURIComponent(HOSTILE_INVALID_ID)}`]) {
        await page.goto(new URL(href, url).href);
        const rejected = page.locator('[data-rejected]');
        await rejected.waitFor({ timeout: 30_000 });
        const row = rejected.locator('tbody tr').first();
        await expect(row.locator('td').nth(0).textContent()).resolves.toBe('fwhm_halpha');
        await expect(row.locator('td').nth(1).textContent()).resolves.toBe(HOSTILE_INVALID_FWHM);
        expect((await row.locator('td').nth(2).textContent())!.length).toBeGreaterThan(5);
        await expect(page.locator('body').textContent()).resolves.not.toContain('rejection report');
      }
      expect(await pwned(page)).toBeUndefined();
      expect(site.errors).toEqual([]);
    } finally {
      await site.close();
    }
  });
});
