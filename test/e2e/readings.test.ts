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

  it('fits its summary table, with the reader\'s own row, into a 1280 px wide screen without scrolling it sideways, and keeps the navigation on one line', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    const { page } = site;
    try {
      await page.setViewportSize({ width: 1280, height: 900 });
      await page.goto(new URL('readings/?reading=custom&a=standard&b=custom&deflation=2&l5100=5&dust=none', inject('siteUrl')).href);
      await waitForReading(page, 'custom');
      await expect(page.locator('[data-reading-row="custom"]').count()).resolves.toBe(1);
      const [scroll, client] = await page.evaluate(() => {
        const wrap = document.querySelector('[data-readings-summary]')!.closest('.table-wrap')!;
        return [wrap.scrollWidth, wrap.clientWidth];
      });
      expect(scroll, `the summary table is ${scroll} px wide in a ${client} px frame`).toBeLessThanOrEqual(client);
      // Every entry of the navigation on the first line (Download wrapped to a second line once).
      const tops = await page.locator('header nav a').evaluateAll((as) => as.map((a) => Math.round(a.getBoundingClientRect().top)));
      expect(tops.length).toBeGreaterThan(5);
      expect(new Set(tops).size, `navigation rows at ${tops.join(', ')} px`).toBe(1);
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

  it('lists every reading on an object page', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL('object/CDW-00009/', inject('siteUrl')).href);
      expect(await page.locator('[data-object-readings] [data-reading-value]').evaluateAll((rows) => rows.map((r) => (r as HTMLElement).dataset.readingValue))).toEqual(READINGS);
      // On a phone the table scrolls sideways and each flag code stays on one line (a code broken
      // letter by letter made a row hundreds of pixels tall).
      await page.setViewportSize({ width: 390, height: 844 });
      const codes = await page.locator('[data-object-readings] td code').evaluateAll((els) =>
        els.map((e) => ({ text: e.textContent ?? '', lines: e.getClientRects().length, height: e.getBoundingClientRect().height, row: (e.closest('tr') as HTMLElement).getBoundingClientRect().height })),
      );
      expect(codes.length).toBeGreaterThan(0);
      for (const c of codes) expect(c.lines, c.text).toBe(1);
      const lineHeight = Math.max(...codes.map((c) => c.height));
      const flagsPerRow = await page.locator('[data-object-readings] tbody tr').evaluateAll((rows) => rows.map((r) => r.querySelectorAll('td code').length));
      // A row is no taller than its flags stacked one per line, plus its padding.
      const rows = await page.locator('[data-object-readings] tbody tr').evaluateAll((rs) => rs.map((r) => r.getBoundingClientRect().height));
      rows.forEach((h, i) => expect(h).toBeLessThanOrEqual(Math.max(3, flagsPerRow[i]!) * lineHeight * 1.6 + 24));
    } finally {
      await site.close();
    }
  });

  it('shows a bound under every reading with its sign and no interval, as the main table does', async () => {
    // A referee found an upper-limit mass shown there as a bare number (6.28, with λ and the offset likewise).
    const [lim] = (await nodeQuery(inject('demoParquet'), `SELECT id FROM census WHERE contains(coalesce(flags, ''), 'mbh_upper_limit') AND log_mbh IS NOT NULL ORDER BY id LIMIT 1`)) as [{ id: string }];
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      const { objectSlug } = await import('../../src/site/objectSlug.ts');
      await page.goto(new URL(`object/${objectSlug(lim.id)}/`, inject('siteUrl')).href);
      const standard = await page.locator('[data-object-readings] tr[data-reading-value="standard"] td').evaluateAll((tds) => tds.map((t) => (t.textContent ?? '').trim()));
      expect(standard[0], `log M_BH cell: ${standard[0]}`).toMatch(/^< \d+\.\d\d$/);
      expect(standard[1]).toMatch(/^< /);
      expect(standard[2]).toMatch(/^[<>] /);
      expect(standard[3]).toBe('—');
      expect(standard[4]).toMatch(/^< /);
      // A measured object's cells carry no sign, and its mass its 16–84 % interval.
      const [meas] = (await nodeQuery(inject('demoParquet'), `SELECT id FROM census WHERE NOT contains(coalesce(flags, ''), '_limit') AND log_mbh_p16 IS NOT NULL AND log_edd_ratio IS NOT NULL ORDER BY id LIMIT 1`)) as [{ id: string }];
      await page.goto(new URL(`object/${objectSlug(meas.id)}/`, inject('siteUrl')).href);
      const measured = await page.locator('[data-object-readings] tr[data-reading-value="standard"] td').evaluateAll((tds) => tds.map((t) => (t.textContent ?? '').trim()));
      expect(measured[0]).toMatch(/^\d+\.\d\d \d+\.\d\d – \d+\.\d\d$/);
      expect(measured.slice(1, 3).some((c) => /^[<>]/.test(c))).toBe(false);
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
      // Every column the browser derives, to the last bit: the core's log, exp and pow are its own
      // (src/core/math), not the engine's Math functions, which differ between Node 20 and Chromium.
      const columns = Object.keys(rows[0]!).filter((k) => k !== 'id');
      // Every column of the readings table but id and reading.
      expect(columns.sort()).toEqual(Object.keys(cli[0]!).filter((k) => k !== 'id' && k !== 'reading').sort());
      const differ: string[] = [];
      for (const r of rows) {
        const c = byId.get(r.id);
        if (!c) {
          differ.push(`${String(r.id)}: not in the CLI's readings table`);
          continue;
        }
        for (const k of columns) if (!Object.is(r[k], c[k])) differ.push(`${String(r.id)} ${k}: browser ${String(r[k])}, CLI ${String(c[k])}`);
      }
      expect(differ).toEqual([]);
      expect(site.errors).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('redraws the charts, the comparison and the summary when a custom reading is submitted, and its URL restores the form and the view', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    try {
      const { page } = site;
      await page.goto(new URL('readings/?reading=dense_gas', inject('siteUrl')).href);
      await waitForReading(page, 'dense_gas');
      const before = await page.locator('#reading-charts [data-chart="mbh-z"] svg').innerHTML();
      await page.fill('[data-custom-form] [name="deflation"]', '2.5');
      await page.fill('[data-custom-form] [name="l5100"]', '');
      await page.selectOption('[data-custom-form] [name="dust"]', 'none');
      await page.fill('[data-custom-form] [name="eff"]', '0.2');
      await page.click('[data-custom-form] button[type="submit"]');
      await waitForReading(page, 'custom');
      await page.waitForFunction(() => document.querySelector<HTMLElement>('[data-shift-chart]')?.dataset.pair === 'dense_gas>custom', undefined, { timeout: 60_000 });
      expect(await page.locator('#reading-charts [data-chart="mbh-z"] svg').innerHTML()).not.toBe(before);
      await expect(page.locator('[data-reading-row="custom"]').getAttribute('aria-current')).resolves.toBe('true');
      // The median, then its shift from the standard reading, as in the build's rows.
      await expect(page.locator('[data-reading-row="custom"] [data-summary="medianLogMbh"]').textContent()).resolves.toMatch(/^\d+\.\d\d[+−]\d+\.\d\d dex$/);
      await expect(page.locator('[data-reading-switch]').inputValue()).resolves.toBe('custom');
      const url = new URL(page.url());
      expect(Object.fromEntries(url.searchParams)).toEqual({ reading: 'custom', a: 'dense_gas', b: 'custom', deflation: '2.5', dust: 'none', eff: '0.2' });
      const summary = await page.locator('[data-reading-row="custom"]').textContent();

      const again = await site.page.context().newPage();
      await again.goto(url.href);
      await waitForReading(again, 'custom');
      await again.waitForFunction(() => document.querySelector<HTMLElement>('[data-shift-chart]')?.dataset.pair === 'dense_gas>custom', undefined, { timeout: 60_000 });
      const field = (name: string) => again.locator(`[data-custom-form] [name="${name}"]`).inputValue();
      expect([await field('deflation'), await field('l5100'), await field('dust'), await field('eff')]).toEqual(['2.5', '', 'none', '0.2']);
      await expect(again.locator('[data-reading-row="custom"]').textContent()).resolves.toBe(summary);
      await expect(again.locator('[data-reading-switch]').inputValue()).resolves.toBe('custom');
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
