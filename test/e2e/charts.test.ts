import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { objectSlug } from '../../src/site/objectSlug.ts';
import { launchBrowser } from './browser.ts';
import { openSite } from './sitePage.ts';

/** The centre (page coordinates) and id of the catalog point farthest from any other in chart `key`. */
async function loneliestPoint(page: Page, key: string): Promise<{ x: number; y: number; id: string }> {
  return page.evaluate((k) => {
    const dots = Array.from(document.querySelectorAll(`[data-place-chart="${k}"] g.census-catalog-point circle`));
    const pts = dots.map((d) => {
      const r = d.getBoundingClientRect();
      return { x: r.left + r.width / 2 + window.scrollX, y: r.top + r.height / 2 + window.scrollY, id: d.getAttribute('aria-label') ?? '' };
    });
    let best = pts[0]!;
    let bestD = -1;
    for (const p of pts) {
      let d = Infinity;
      for (const q of pts) if (q !== p) d = Math.min(d, Math.hypot(p.x - q.x, p.y - q.y));
      if (d > bestD) {
        bestD = d;
        best = p;
      }
    }
    return best;
  }, key);
}

describe('charts in the browser', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('show the object id on hover, open the object page on click, and download the SVG', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    const { page } = site;
    try {
      await page.goto(new URL('place/', inject('siteUrl')).href);
      await page.waitForSelector('[data-place-chart="mbh-mstar"] g.census-catalog-point circle', { timeout: 60_000 });

      // download first (the click below leaves the page)
      const [download] = await Promise.all([page.waitForEvent('download'), page.locator('[data-place-chart="mbh-mstar"] button', { hasText: 'Download SVG' }).click()]);
      expect(download.suggestedFilename()).toBe('place-mbh-mstar.svg');
      const svg = readFileSync((await download.path())!, 'utf8');
      expect(svg.startsWith('<?xml')).toBe(true);
      expect(svg).toContain('<svg');
      expect(svg).toContain('single-epoch virial');
      expect(svg).toContain('census-catalog-point');
      const [png] = await Promise.all([page.waitForEvent('download'), page.locator('[data-place-chart="mbh-mstar"] button', { hasText: 'Download PNG' }).click()]);
      expect(png.suggestedFilename()).toBe('place-mbh-mstar.png');
      const bytes = readFileSync((await png.path())!);
      // PNG signature (ISO/IEC 15948 §5.2) and a width twice the chart's
      expect([...bytes.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
      const chartWidth = Number(await page.locator('[data-place-chart="mbh-mstar"] svg').first().getAttribute('width'));
      expect(bytes.readUInt32BE(16)).toBe(2 * chartWidth);

      const p = await loneliestPoint(page, 'mbh-mstar');
      expect(p.id).toMatch(/^CDW-\d{5}$/);
      await page.mouse.move(p.x - (await page.evaluate(() => window.scrollX)), p.y - (await page.evaluate(() => window.scrollY)));
      const tip = page.locator('[data-place-chart="mbh-mstar"] g[aria-label="tip"]');
      await expect.poll(() => tip.textContent(), { timeout: 5000 }).toContain(p.id);

      await Promise.all([page.waitForURL(`**/object/${objectSlug(p.id)}/`), page.mouse.down().then(() => page.mouse.up())]);
      await expect(page.locator('h1').textContent()).resolves.toBe(p.id);
      expect(site.errors).toEqual([]);
      expect(site.foreign()).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('can be walked with the keyboard and opened with Enter', async () => {
    const site = await openSite(browser, inject('siteUrl'));
    const { page } = site;
    try {
      await page.goto(new URL('place/', inject('siteUrl')).href);
      await page.waitForSelector('[data-place-chart="lbol-mbh"] g.census-catalog-point circle', { timeout: 60_000 });
      await page.locator('[data-place-chart="lbol-mbh"] svg[tabindex="0"]').focus();
      await page.keyboard.press('Home');
      const status = page.locator('[data-place-chart="lbol-mbh"] .chart-focus-status');
      await expect(status.textContent()).resolves.toMatch(/^CDW-\d{5}; log M_BH/);
      const id = (await status.textContent())!.split(';')[0]!;
      await Promise.all([page.waitForURL(`**/object/${objectSlug(id)}/`), page.keyboard.press('Enter')]);
      await expect(page.locator('h1').textContent()).resolves.toBe(id);
    } finally {
      await site.close();
    }
  });
});
