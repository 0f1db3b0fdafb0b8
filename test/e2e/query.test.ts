import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './browser.ts';
import { markCount, nodeQuery, openSite } from './sitePage.ts';

const SQL = 'SELECT id, z, log_mbh, log_edd_ratio FROM census WHERE z > 6 AND log_edd_ratio > -0.5';

describe('SQL workspace', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('returns as many rows as DuckDB in Node finds, draws that many marks, and links ids to object pages', async () => {
    const rows = await nodeQuery(inject('demoParquet'), SQL);
    const plotted = rows.filter((r) => r.z !== null && r.log_mbh !== null).length;
    expect(rows.length).toBeGreaterThan(0);
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL('query/', inject('siteUrl')).href);
      // Tab in the editor inserts two spaces instead of leaving it.
      await page.locator('#sql').fill('SELECT');
      await page.locator('#sql').press('End');
      await page.locator('#sql').press('Tab');
      await expect(page.locator('#sql').inputValue()).resolves.toBe('SELECT  ');
      await expect(page.evaluate(() => document.activeElement?.id)).resolves.toBe('sql');
      await page.locator('#sql').fill(SQL);
      await page.locator('#sql').press('Control+Enter');
      await page.waitForFunction((n) => document.querySelector('[data-result-summary]')?.getAttribute('data-rows') === String(n), rows.length, { timeout: 30_000 });
      // One page of rows at most in the DOM.
      const domRows = await page.locator('table[data-results] tbody tr').count();
      expect(domRows).toBe(Math.min(50, rows.length));
      await page.waitForFunction(() => document.querySelector('[data-population="manual"] [data-chart="mbh-z"] svg'), undefined, { timeout: 30_000 });
      expect(await markCount(page, 'mbh-z')).toBe(plotted);
      // The query is in the URL.
      expect(new URL(page.url()).searchParams.get('sql')).toBe(SQL);
      // Sorting by z descending puts the largest redshift first.
      const zHeader = page.locator('table[data-results] thead th', { hasText: 'z' }).first().locator('button');
      await zHeader.click();
      await zHeader.click();
      const maxZ = Math.max(...rows.map((r) => Number(r.z)));
      await expect(page.locator('table[data-results] tbody tr').first().locator('td').nth(1).textContent()).resolves.toBe(maxZ.toFixed(3));
      // An id opens its object page.
      const link = page.locator('table[data-results] tbody tr').first().locator('a');
      const id = await link.textContent();
      await link.click();
      await page.waitForURL(/\/object\//);
      await expect(page.locator('h1').textContent()).resolves.toBe(id);
      expect(site.foreign()).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('shows a SQL error inline beside the editor in plain words', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL('query/', inject('siteUrl')).href);
      await page.locator('#sql').fill('SELECT no_such_column FROM census');
      await page.locator('[data-run]').click();
      const error = page.locator('#sql-error');
      await error.waitFor({ state: 'visible', timeout: 30_000 });
      await expect(error.textContent()).resolves.toMatch(/no_such_column/);
      await page.locator('#sql').fill('SELEC id FROM census');
      await page.locator('[data-run]').click();
      await page.waitForFunction(() => /could not be read/.test(document.querySelector('#sql-error')?.textContent ?? ''), undefined, { timeout: 30_000 });
      await page.locator('#sql').fill('SELECT * FROM catalog');
      await page.locator('[data-run]').click();
      await page.waitForFunction(() => /named census/.test(document.querySelector('#sql-error')?.textContent ?? ''), undefined, { timeout: 30_000 });
    } finally {
      await site.close();
    }
  });

  it('shows a query that came with a link and runs it only when asked', async () => {
    const [expected] = await nodeQuery(inject('demoParquet'), 'SELECT count(*) AS n FROM census WHERE z > 7');
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      const url = new URL('query/', inject('siteUrl'));
      url.searchParams.set('sql', 'SELECT id, z FROM census WHERE z > 7');
      await page.goto(url.href);
      await expect(page.locator('#sql').inputValue()).resolves.toBe('SELECT id, z FROM census WHERE z > 7');
      await expect(page.locator('[data-shared-note]').isVisible()).resolves.toBe(true);
      await page.waitForTimeout(1500);
      await expect(page.locator('[data-result-summary]').getAttribute('data-rows')).resolves.toBeNull();
      await page.locator('[data-run]').click();
      await page.waitForFunction((n) => document.querySelector('[data-result-summary]')?.getAttribute('data-rows') === String(n), expected!.n, { timeout: 30_000 });
      // The result exports as CSV with a header and one line per row.
      const [download] = await Promise.all([page.waitForEvent('download'), page.locator('[data-export-csv]').click()]);
      const path = await download.path();
      const { readFileSync } = await import('node:fs');
      const lines = readFileSync(path, 'utf8').trim().split(/\r?\n/);
      expect(lines[0]).toBe('id,z');
      expect(lines.length - 1).toBe(expected!.n);
    } finally {
      await site.close();
    }
  });
});
