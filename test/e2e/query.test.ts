import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './browser.ts';
import { markCount, nodeQuery, openSite, runSql, setSql } from './sitePage.ts';

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
      // Tab in the editor indents instead of leaving it.
      await setSql(page, 'SELECT');
      await page.keyboard.press('End');
      await page.keyboard.press('Tab');
      // CodeMirror's Tab indents the line (indentMore) rather than inserting at the cursor.
      await expect(page.locator('#sql').inputValue()).resolves.toMatch(/^\s+SELECT\s*$|^SELECT\s+$/);
      await expect(page.evaluate(() => document.activeElement?.hasAttribute('data-sql-input'))).resolves.toBe(true);
      await runSql(page, SQL);
      await expect(page.locator('[data-result-summary]').getAttribute('data-rows')).resolves.toBe(String(rows.length));
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

  it('runs the query in the editor on Ctrl+Enter, without the Run button, even while the page\'s first query runs (it gave "0 rows")', async () => {
    const [expected] = await nodeQuery(inject('demoParquet'), 'SELECT count(*) AS n FROM census WHERE z > 6');
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL('query/', inject('siteUrl')).href);
      // At once, while the page's own first query may still run: that used to end the reader's query with "0 rows".
      await setSql(page, 'SELECT id FROM census WHERE z > 6');
      await page.evaluate(() => document.querySelector('[data-result-summary]')?.removeAttribute('data-rows'));
      // The focus is still in the editor (setSql typed there); Ctrl+Enter is CodeMirror's Mod-Enter on Linux.
      await expect(page.evaluate(() => document.activeElement?.closest('[data-sql-input]') !== null)).resolves.toBe(true);
      await page.keyboard.press('Control+Enter');
      await page.waitForFunction((n) => document.querySelector('[data-result-summary]')?.getAttribute('data-rows') === String(n), expected!.n, { timeout: 60_000 });
      // The key ran the query rather than adding a line to it.
      await expect(page.locator('#sql').inputValue()).resolves.toBe('SELECT id FROM census WHERE z > 6');
      expect(new URL(page.url()).searchParams.get('sql')).toBe('SELECT id FROM census WHERE z > 6');
    } finally {
      await site.close();
    }
  });

  it('shows a SQL error inline beside the editor in plain words', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL('query/', inject('siteUrl')).href);
      await runSql(page, 'SELECT no_such_column FROM census');
      const error = page.locator('#sql-error');
      await expect(error.textContent()).resolves.toMatch(/no_such_column/);
      await runSql(page, 'SELEC id FROM census');
      // The statement gate names the word it does not run, in plain words.
      await expect(error.textContent()).resolves.toMatch(/Only queries that read the catalog run here.*“SELEC”/);
      await runSql(page, 'SELECT * FROM catalog');
      await expect(error.textContent()).resolves.toMatch(/named census/);
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
      // '#' lines first: the query, the catalog's SHA-256, the tool and each column's unit and meaning.
      const all = readFileSync(path, 'utf8').trim().split(/\r?\n/);
      expect(all.some((l) => l.startsWith('# query: '))).toBe(true);
      const lines = all.filter((l) => !l.startsWith('#'));
      expect(lines[0]).toBe('id,z');
      expect(lines.length - 1).toBe(expected!.n);
    } finally {
      await site.close();
    }
  });
});
