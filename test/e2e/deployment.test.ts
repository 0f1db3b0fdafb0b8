import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './browser.ts';
import { nodeQuery, openSite, runSql, waitForCharts } from './sitePage.ts';

describe('deployment', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('works under a sub-path (/census/): links, charts and DuckDB queries', async () => {
    const sub = inject('subUrl');
    expect(new URL(sub).pathname).toBe('/census/');
    const [expected] = await nodeQuery(inject('demoParquet'), 'SELECT count(*) AS n FROM census WHERE log_edd_ratio > 0');
    const site = await openSite(browser, sub);
    try {
      const { page } = site;
      await page.goto(sub);
      await waitForCharts(page);
      expect(await page.locator('[data-chart] svg').count()).toBeGreaterThanOrEqual(4);
      await Promise.all([
        page.waitForURL((u) => u.pathname === '/census/query/', { waitUntil: 'domcontentloaded' }),
        page.locator('nav a', { hasText: 'Query in SQL' }).click(),
      ]);
      await runSql(page, 'SELECT id FROM census WHERE log_edd_ratio > 0');
      await page.waitForFunction((n) => document.querySelector('[data-result-summary]')?.getAttribute('data-rows') === String(n), expected!.n, { timeout: 30_000 });
      await Promise.all([
        page.waitForURL((u) => u.pathname.startsWith('/census/object/'), { waitUntil: 'domcontentloaded' }),
        page.locator('table[data-results] tbody a').first().click(),
      ]);
      expect(site.requests.every((u) => new URL(u).pathname.startsWith('/census/') || !u.startsWith('http'))).toBe(true);
      expect(site.foreign()).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('says plainly that the catalog file is missing when the site was published without it', async () => {
    const site = await openSite(browser, inject('missingUrl'));
    try {
      const { page } = site;
      await page.goto(inject('missingUrl'));
      // The overview is static (counts and charts drawn at build time): it shows without the file.
      await expect(page.locator('[data-count="objects"]').textContent()).resolves.toMatch(/^\d+$/);
      expect(await page.locator('[data-population] [data-chart] svg').count()).toBeGreaterThanOrEqual(4);
      await page.goto(new URL('query/', inject('missingUrl')).href);
      await page.waitForFunction(() => /was not found/.test(document.querySelector('#sql-error')?.textContent ?? '') || /was not found/.test(document.querySelector('[data-db-status]')?.textContent ?? ''), undefined, { timeout: 30_000 });
    } finally {
      await site.close();
    }
  });

  it('says plainly that the catalog file is damaged when it is not Parquet', async () => {
    const site = await openSite(browser, inject('corruptUrl'));
    try {
      const { page } = site;
      await page.goto(new URL('query/', inject('corruptUrl')).href);
      await page.waitForFunction(() => document.querySelector('[data-db-status]')?.getAttribute('data-kind') === 'error', undefined, { timeout: 30_000 });
      await expect(page.locator('[data-db-status]').textContent()).resolves.toMatch(/catalog file .*data\/catalog\.parquet.* is not a readable Parquet file/);
    } finally {
      await site.close();
    }
  });

  it('links every object to the in-browser viewer when built without one page per object', async () => {
    const url = inject('viewerUrl');
    const [first] = await nodeQuery(inject('demoParquet'), 'SELECT id FROM census ORDER BY id LIMIT 1');
    const { objectSlug } = await import('../../src/site/objectSlug.ts');
    expect((await fetch(new URL(`object/${objectSlug(String(first!.id))}/`, url))).status).toBe(404);
    const site = await openSite(browser, url);
    try {
      const { page } = site;
      await page.goto(new URL('query/', url).href);
      await runSql(page, 'SELECT id, z FROM census ORDER BY id LIMIT 5');
      await page.waitForFunction(() => document.querySelector('[data-result-summary]')?.getAttribute('data-rows') === '5', undefined, { timeout: 30_000 });
      const link = page.locator('table[data-results] tbody tr').first().locator('a');
      await expect(link.getAttribute('href')).resolves.toBe(`/object/?id=${encodeURIComponent(String(first!.id))}`);
      await Promise.all([page.waitForURL((u) => u.pathname === '/object/', { waitUntil: 'domcontentloaded' }), link.click()]);
      await page.waitForSelector('tr[data-column="log_mbh"]', { timeout: 30_000 });
      await expect(page.locator('h1').textContent()).resolves.toBe(first!.id);
      expect(site.foreign()).toEqual([]);
    } finally {
      await site.close();
    }
  });
});
