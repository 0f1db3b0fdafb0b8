import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from './browser.ts';
import { nodeQuery, openSite } from './sitePage.ts';

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

  it('fits a 390 px wide screen without horizontal scrolling, with its charts, tables and form drawn', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    const { page } = site;
    try {
      await page.setViewportSize({ width: 390, height: 844 });
      await page.goto(new URL('readings/', inject('siteUrl')).href);
      await waitForReading(page, 'standard');
      const [scroll, client] = await page.evaluate(() => [document.documentElement.scrollWidth, document.documentElement.clientWidth]);
      expect(scroll, `the Readings page is ${scroll} px wide in a ${client} px window`).toBeLessThanOrEqual(client);
      // Nothing is cut off instead: every chart fits its cell.
      const widest = await page.evaluate(() => Math.max(...Array.from(document.querySelectorAll('[data-readings-page] svg')).map((s) => s.getBoundingClientRect().right)));
      expect(widest).toBeLessThanOrEqual(client);
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

  it('derives a custom reading live from its URL, with the CLI\'s numbers for the same reading and seed', async () => {
    // L_bol/L5100 = 5 and nothing else is the small_bolometric reading: the browser's rows must be the CLI's.
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL('readings/?reading=custom&a=small_bolometric&b=custom&deflation=1&l5100=5&dust=standard', inject('siteUrl')).href);
      await waitForReading(page, 'custom');
      await expect(page.locator('[data-custom-form] [name="l5100"]').inputValue()).resolves.toBe('5');
      await expect(page.locator('[data-reading-row="custom"]').count()).resolves.toBe(1);
      const rows = await page.evaluate(() => (window as unknown as { censusCustomReading: Record<string, unknown>[] }).censusCustomReading);
      const cli = await nodeQuery(
        inject('demoParquet').replace(/\.parquet$/, '.readings.parquet'),
        `SELECT * FROM census WHERE reading = 'small_bolometric'`,
      );
      const byId = new Map(cli.map((r) => [r.id, r]));
      expect(rows.length).toBeGreaterThan(300);
      for (const r of rows) {
        const c = byId.get(r.id)!;
        // Flags and Monte Carlo fractions: identical. Nominal values: measured to differ by an ulp or two for a few
        // objects (log M_BH 7.108400147756116 against 7.108400147756113), like the percentiles below.
        for (const k of ['p_super_eddington', 'flags']) expect(r[k], `${String(r.id)} ${k}`).toBe(c[k]);
        for (const k of ['log_mbh', 'log_lbol', 'log_edd_ratio', 'delta_log_mbh_local']) {
          if (c[k] === null) expect(r[k]).toBeNull();
          else expect(Math.abs((r[k] as number) - (c[k] as number)), `${String(r.id)} ${k}`).toBeLessThanOrEqual(1e-12);
        }
        // Percentiles and λ required (exp/log of the growth time): measured to differ in the last bits for a few
        // objects between Node's and Chromium's V8 math (see README); known gap, not yet traced.
        for (const k of ['lambda_req_light', 'log_mbh_p16', 'log_mbh_p84', 'log_lbol_p16', 'log_edd_ratio_p84']) {
          if (c[k] === null) expect(r[k]).toBeNull();
          else expect(Math.abs((r[k] as number) - (c[k] as number)), `${String(r.id)} ${k}`).toBeLessThanOrEqual(1e-12);
        }
      }
      expect(site.errors).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('stops an out-of-range custom factor with one line naming it', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL('readings/', inject('siteUrl')).href);
      await waitForReading(page, 'standard');
      await page.evaluate(() => {
        const input = document.querySelector<HTMLInputElement>('[data-custom-form] [name="deflation"]')!;
        input.removeAttribute('max');
        input.value = '40';
      });
      await page.click('[data-custom-form] button[type="submit"]');
      await expect(page.locator('[data-custom-status]').textContent()).resolves.toMatch(/^your reading\.deflation must be a number between 1 and 10/);
    } finally {
      await site.close();
    }
  });

  it('places a new object under every reading', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL('place/', inject('siteUrl')).href);
      await page.fill('#place-id', 'INVENTED-READINGS-1');
      await page.fill('#place-z', '6.3');
      await page.fill('#place-fwhm', '2400');
      await page.fill('#place-fwhm_err', '200');
      await page.selectOption('#place-strength_unit', '1e-18 erg s-1 cm-2');
      await page.fill('#place-strength', '8.5');
      await page.fill('#place-strength_err', '0.6');
      await page.click('#place-form button[type=submit]');
      await page.waitForSelector('[data-place-readings]');
      expect(await page.locator('[data-place-readings] [data-reading-value]').evaluateAll((rows) => rows.map((r) => (r as HTMLElement).dataset.readingValue))).toEqual(READINGS);
      const masses = await page.locator('[data-place-readings] tbody tr td:nth-of-type(1)').allTextContents();
      // The scattering reading (no core width: deflation 10) lowers the Hα mass by 2.06 dex (FWHM exponent 2.06, Reines & Volonteri 2015 eq. 5).
      expect(Number(masses[0]) - Number(masses[1])).toBeCloseTo(2.06, 1);
    } finally {
      await site.close();
    }
  });
});
