import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from './browser.ts';
import { openSite } from './sitePage.ts';

const READINGS = ['standard', 'scattering_core', 'dense_gas', 'small_bolometric'];

/** Waits until the Readings page's charts show `reading` and the comparison is drawn. */
async function waitForReading(page: Page, reading: string): Promise<void> {
  await page.waitForFunction((r) => document.querySelector<HTMLElement>('#reading-charts')?.dataset.reading === r, reading, { timeout: 60_000 });
  await page.waitForFunction(() => (document.querySelector<HTMLElement>('[data-shift-chart]')?.dataset.pair ?? '') !== '', undefined, { timeout: 60_000 });
}

describe('readings', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('shows every reading side by side, and switching the reading redraws the charts and marks its summary row', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL('readings/', inject('siteUrl')).href);
      expect(await page.locator('[data-reading-row]').evaluateAll((rows) => rows.map((r) => (r as HTMLElement).dataset.readingRow))).toEqual(READINGS);
      await waitForReading(page, 'standard');
      const before = await page.locator('#reading-charts [data-chart="mbh-z"] svg').innerHTML();
      await page.selectOption('[data-reading-switch]', 'scattering_core');
      await waitForReading(page, 'scattering_core');
      const after = await page.locator('#reading-charts [data-chart="mbh-z"] svg').innerHTML();
      expect(after).not.toBe(before);
      await expect(page.locator('[data-reading-row="scattering_core"]').getAttribute('aria-current')).resolves.toBe('true');
      expect(page.url()).toContain('reading=scattering_core');
      expect(await page.locator('[data-shift-chart] svg').count()).toBeGreaterThan(0);
      expect(site.foreign()).toEqual([]);
      expect(site.errors).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('restores the reading and the compared pair from its URL', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL('readings/?reading=dense_gas&a=small_bolometric&b=dense_gas', inject('siteUrl')).href);
      await waitForReading(page, 'dense_gas');
      await expect(page.locator('[data-reading-switch]').inputValue()).resolves.toBe('dense_gas');
      await expect(page.locator('[data-shift-chart]').getAttribute('data-pair')).resolves.toBe('small_bolometric>dense_gas');
    } finally {
      await site.close();
    }
  });

  it('answers SQL on the readings table with the same numbers as the file, and lists every reading on an object page', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL('object/CDW-00009/', inject('siteUrl')).href);
      expect(await page.locator('[data-object-readings] [data-reading-value]').evaluateAll((rows) => rows.map((r) => (r as HTMLElement).dataset.readingValue))).toEqual(READINGS);
    } finally {
      await site.close();
    }
  });
});
