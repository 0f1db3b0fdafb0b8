import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './browser.ts';
import { openSite, runSql, setSql } from './sitePage.ts';

const OUTSIDE = 'https://census-test.invalid';

describe('visitor SQL', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('reaches no other host: read_csv, read_parquet and ATTACH on an outside URL make no request and get a plain message', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL('query/', inject('siteUrl')).href);
      await page.waitForFunction(() => document.querySelector('[data-result-summary]')?.getAttribute('data-rows'), undefined, { timeout: 60_000 });
      for (const sql of [
        `SELECT * FROM read_csv('${OUTSIDE}/a.csv')`,
        `SELECT * FROM read_parquet('${OUTSIDE}/b.parquet')`,
        `ATTACH '${OUTSIDE}/c.duckdb' AS other`,
        `SELECT * FROM '${OUTSIDE}/d.csv'`,
        `SELECT * FROM read_parquet('data/catalog.csv')`,
      ]) {
        await runSql(page, sql);
        await expect(page.locator('#sql-error').textContent(), sql).resolves.toMatch(/reads only the census catalog.*nothing was fetched/);
      }
      // The database still answers afterwards.
      await runSql(page, 'SELECT count(*) AS n FROM census');
      await expect(page.locator('#sql-error').isHidden()).resolves.toBe(true);
      expect(site.requests.filter((u) => u.includes('census-test.invalid'))).toEqual([]);
      expect(site.foreign()).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('says the catalog is read-only for DROP and CREATE, marks a failed query’s previous result stale, and places syntax errors', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL('query/', inject('siteUrl')).href);
      await runSql(page, 'SELECT id, z FROM census ORDER BY z LIMIT 3');
      await expect(page.locator('[data-result-summary]').getAttribute('data-rows')).resolves.toBe('3');
      await expect(page.locator('[data-stale-note]').isHidden()).resolves.toBe(true);
      for (const sql of ['DROP TABLE census', 'CREATE TABLE t AS SELECT 1']) {
        await runSql(page, sql);
        await expect(page.locator('#sql-error').textContent(), sql).resolves.toMatch(/^The catalog is read-only/);
      }
      // The earlier result stays, marked as belonging to an earlier query, and cannot be downloaded as if current.
      await expect(page.locator('[data-stale-note]').isVisible()).resolves.toBe(true);
      await expect(page.locator('[data-result]').getAttribute('data-stale')).resolves.not.toBeNull();
      await expect(page.locator('[data-export-csv]').isDisabled()).resolves.toBe(true);
      // The catalog is unchanged.
      await runSql(page, 'SELECT count(*) AS n FROM census');
      await expect(page.locator('table[data-results] tbody td').first().textContent()).resolves.toMatch(/^\d+$/);
      await expect(page.locator('[data-stale-note]').isHidden()).resolves.toBe(true);
      // A syntax error names its line and column and is marked in the editor at that place.
      await runSql(page, 'SELECT id\nFROM census\nWHERE z > 5 AND AND z < 9');
      await expect(page.locator('#sql-error').textContent()).resolves.toMatch(/could not be read: .*"AND".*\(line 3, column 17\)/);
      await page.locator('.cm-lintRange-error').first().waitFor({ timeout: 5_000 });
      await expect(page.locator('.cm-lintRange-error').first().textContent()).resolves.toBe('AND');
    } finally {
      await site.close();
    }
  });

  it('keeps the first 100,000 rows of a large result with a message, and a Cancel button stops a long query', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL('query/', inject('siteUrl')).href);
      await runSql(page, 'SELECT range AS k FROM range(100000000)', 60_000);
      await expect(page.locator('[data-result-summary]').getAttribute('data-rows')).resolves.toBe('100000');
      await expect(page.locator('[data-cap-note]').textContent()).resolves.toMatch(/more than 100,000 rows: the first 100,000 are shown/);
      // A query that would run for minutes: Cancel stops it, and the database answers again afterwards.
      await setSql(page, 'SELECT sum(a.range * b.range) FROM range(200000) a, range(200000) b');
      await page.locator('[data-run]').click();
      await page.locator('[data-cancel]').waitFor({ state: 'visible', timeout: 10_000 });
      await page.waitForTimeout(500);
      await page.locator('[data-cancel]').click();
      await page.waitForFunction(() => /was stopped/.test(document.querySelector('#sql-error')?.textContent ?? ''), undefined, { timeout: 10_000 });
      await runSql(page, 'SELECT count(*) AS n FROM census', 60_000);
      await expect(page.locator('#sql-error').isHidden()).resolves.toBe(true);
      await expect(page.locator('[data-result-summary]').getAttribute('data-rows')).resolves.toBe('1');
    } finally {
      await site.close();
    }
  });

  it('completes census column names with their units and meanings', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL('query/', inject('siteUrl')).href);
      await setSql(page, 'SELECT log_mb');
      await page.keyboard.press('Control+Space');
      const option = page.locator('.cm-tooltip-autocomplete li', { hasText: 'log_mbh' }).first();
      await option.waitFor({ timeout: 5_000 });
      await expect(option.locator('.cm-completionDetail').textContent()).resolves.toMatch(/M☉|Msun|solMass|dex/);
      // CodeMirror ignores Enter for its interactionDelay (75 ms) after the list opens, so that a
      // list popping up under a fast typist does not take the Enter; a reader waits that long anyway.
      await page.waitForTimeout(200);
      await page.keyboard.press('Enter');
      await expect(page.locator('#sql').inputValue()).resolves.toMatch(/^SELECT log_mbh/);
    } finally {
      await site.close();
    }
  });

  it('on a phone shows a column\'s meaning below the completion list, covering none of its options', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.setViewportSize({ width: 390, height: 844 });
      await page.goto(new URL('query/', inject('siteUrl')).href);
      await setSql(page, 'SELECT log_');
      await page.keyboard.press('Control+Space');
      const info = page.locator('.cm-completionInfo');
      await info.waitFor({ timeout: 5_000 });
      await expect(info.textContent()).resolves.toMatch(/\w/);
      const list = await page.locator('.cm-tooltip-autocomplete').boundingBox();
      const box = await info.boundingBox();
      if (!list || !box) throw new Error('the completion list or its meaning panel has no box');
      // Wholly below or wholly above the list, and on the screen.
      expect(box.y >= list.y + list.height || box.y + box.height <= list.y, JSON.stringify({ list, box })).toBe(true);
      expect(box.x).toBeGreaterThanOrEqual(0);
      expect(box.x + box.width).toBeLessThanOrEqual(390);
      // Moving through the list keeps it clear of the options.
      await page.keyboard.press('ArrowDown');
      await page.keyboard.press('ArrowDown');
      await page.waitForTimeout(200);
      const moved = await info.boundingBox();
      expect(moved && (moved.y >= list.y + list.height || moved.y + moved.height <= list.y)).toBe(true);
      // The column reference, stacked on a phone (name and unit, the meaning under them), still filters.
      await page.keyboard.press('Escape');
      await page.locator('.columns-details summary').click();
      await page.locator('[data-column-filter]').fill('redshift');
      const shown = await page.locator('[data-column-ref] tbody tr').evaluateAll((rows) =>
        rows.filter((r) => r.getBoundingClientRect().height > 0).map((r) => ({ search: (r as HTMLElement).dataset.search ?? '', top: r.querySelector('code')!.getBoundingClientRect().top, meaning: r.querySelector('td:last-child')!.getBoundingClientRect().top })),
      );
      const total = await page.locator('[data-column-ref] tbody tr').count();
      expect(shown.length).toBeGreaterThan(0);
      expect(shown.length).toBeLessThan(total);
      for (const r of shown) {
        expect(r.search).toContain('redshift');
        expect(r.meaning).toBeGreaterThan(r.top);
      }
      // In the side column of a wider screen the list stacks too (by the width of its box), and never
      // needs sideways scrolling; on a full-width column it is a table again.
      await page.locator('[data-column-filter]').fill('');
      for (const width of [1000, 1280, 800]) {
        await page.setViewportSize({ width, height: 900 });
        const ref = await page.locator('.column-ref').evaluate((e) => ({ scroll: e.scrollWidth, client: e.clientWidth, stacked: getComputedStyle(e.querySelector('tbody tr')!).display === 'flex' }));
        expect(ref.scroll, `${width} px`).toBeLessThanOrEqual(ref.client);
        expect(ref.stacked, `${width} px`).toBe(width !== 800);
      }
    } finally {
      await site.close();
    }
  });
});

describe('every page', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('carries a strict Content-Security-Policy that nothing on the page violates', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.addInitScript(() => {
        (window as unknown as { __violations: string[] }).__violations = [];
        document.addEventListener('securitypolicyviolation', (e) => (window as unknown as { __violations: string[] }).__violations.push(`${e.violatedDirective} ${e.blockedURI}`));
      });
      for (const path of ['', 'query/', 'place/', 'methods/', 'no-such-page/']) {
        const res = await page.goto(new URL(path, inject('siteUrl')).href);
        const csp = await page.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute('content');
        expect(csp, path).toMatch(/default-src 'self'/);
        expect(csp, path).toMatch(/script-src 'self' 'wasm-unsafe-eval'/);
        expect(csp, path).toMatch(/connect-src 'self'/);
        expect(res, path).not.toBeNull();
        if (path === '') await page.locator('[data-population] [data-chart="mbh-z"]').hover();
        if (path === 'query/') await page.waitForFunction(() => document.querySelector('[data-result-summary]')?.getAttribute('data-rows'), undefined, { timeout: 60_000 });
        await page.waitForTimeout(300);
        expect(await page.evaluate(() => (window as unknown as { __violations: string[] }).__violations), path).toEqual([]);
      }
      expect(site.errors).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('shows the overview’s charts with JavaScript switched off', async () => {
    const context = await browser.newContext({ javaScriptEnabled: false });
    try {
      const page = await context.newPage();
      await page.goto(inject('siteUrl'));
      expect(await page.locator('[data-population] [data-chart] svg').count()).toBe(4);
      expect(await page.locator('[data-population] [data-chart="mbh-z"] g.census-catalog-point > *').count()).toBeGreaterThan(100);
    } finally {
      await context.close();
    }
  });
});
