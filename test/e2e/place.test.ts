import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from './browser.ts';
import { openSite, type SitePage } from './sitePage.ts';

const SCATTER_CHARTS = ['mbh-mstar', 'mbh-z', 'lbol-mbh', 'fwhm-lum'];

/** Waits until every chart of the compare page is drawn. */
async function waitForPlaceCharts(page: Page): Promise<void> {
  await page.waitForFunction(() => {
    const mounts = Array.from(document.querySelectorAll('[data-place-chart]'));
    return mounts.length === 5 && mounts.every((m) => m.querySelector('svg'));
  }, undefined, { timeout: 60_000 });
}

const newObjectMarks = (page: Page, key: string) => page.locator(`[data-place-chart="${key}"] g.census-new-object > *`).count();

describe('the compare page (place a new object)', () => {
  let browser: Browser;
  let site: SitePage;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  async function open(): Promise<Page> {
    site = await openSite(browser, inject('siteUrl'));
    await site.page.goto(new URL('place/', inject('siteUrl')).href);
    await waitForPlaceCharts(site.page);
    return site.page;
  }

  it('derives a typed-in object, draws it on every chart and ranks it', async () => {
    const page = await open();
    try {
      await expect(page.locator('h1').textContent()).resolves.toBe('Place a new object');
      for (const key of SCATTER_CHARTS) expect(await newObjectMarks(page, key)).toBe(0);
      // an invented object
      await page.fill('#place-id', 'INVENTED-E2E-1');
      await page.fill('#place-z', '6.3');
      await page.fill('#place-fwhm', '2400');
      await page.fill('#place-fwhm_err', '200');
      await page.selectOption('#place-strength_unit', '1e-18 erg s-1 cm-2');
      await page.fill('#place-strength', '8.5');
      await page.fill('#place-strength_err', '0.6');
      await page.fill('#place-log_mstar', '9.3');
      await page.fill('#place-log_mstar_err', '0.3');
      await page.click('#place-form button[type=submit]');
      await page.waitForSelector('#place-ranks');
      await expect(page.locator('#place-result').getAttribute('data-placed')).resolves.toBe('INVENTED-E2E-1');
      const ranks = await page.locator('#place-ranks tbody tr').allTextContents();
      expect(ranks).toHaveLength(3);
      for (const r of ranks) expect(r).toMatch(/\d+(st|nd|rd|th) percentile of \d+/);
      await expect(page.locator('#place-neighbours li').count()).resolves.toBe(5);
      await expect(page.locator('#place-neighbours li a').first().getAttribute('href')).resolves.toMatch(/^\/object\/CDW-\d{5}\/$/);
      await expect(page.locator('#place-local').textContent()).resolves.toMatch(/dex (above|below) Reines & Volonteri 2015/);
      await expect(page.locator('#place-result .caveats').textContent()).resolves.toContain('0.3–0.5 dex');
      for (const key of SCATTER_CHARTS) expect(await newObjectMarks(page, key)).toBe(1);
      expect(await newObjectMarks(page, 'edd')).toBe(1);
      expect(site.errors).toEqual([]);
      expect(site.foreign()).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('places a CSV row pasted from data-demo/new-objects.csv', async () => {
    const text = readFileSync(resolve(import.meta.dirname, '../../data-demo/new-objects.csv'), 'utf8');
    const lines = text.split('\n');
    const snippet = [...lines.filter((l) => l.startsWith('#')), lines.find((l) => l.startsWith('id,'))!, lines.find((l) => l.startsWith('CDW-90002,'))!].join('\n');
    const page = await open();
    try {
      await page.fill('#place-csv', snippet);
      await page.selectOption('#place-csv-unit', '1e-18 erg s-1 cm-2');
      await page.click('#place-csv-go');
      await page.waitForSelector('#place-ranks');
      await expect(page.locator('#place-result').getAttribute('data-placed')).resolves.toBe('CDW-90002');
      await expect(page.locator('#place-result').textContent()).resolves.toContain('Columns left out (not inputs of the derivation): field, spec_program, notes.');
      expect(await newObjectMarks(page, 'mbh-mstar')).toBe(1);
      expect(site.errors).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('shows a message beside an invalid field and places nothing', async () => {
    const page = await open();
    try {
      await page.fill('#place-id', 'INVENTED-E2E-2');
      await page.fill('#place-z', 'six');
      await page.fill('#place-fwhm', '-300');
      await page.fill('#place-strength', '3');
      await page.click('#place-form button[type=submit]');
      await expect(page.locator('#place-z-msg').textContent()).resolves.toBe('six: not a number');
      await expect(page.locator('#place-z').getAttribute('aria-invalid')).resolves.toBe('true');
      await expect(page.locator('#place-z').getAttribute('aria-describedby')).resolves.toContain('place-z-msg');
      await expect(page.locator('#place-fwhm-msg').textContent()).resolves.toBe('-300 km s-1: must be positive');
      await expect(page.locator('#place-result').isHidden()).resolves.toBe(true);
      // pasted rows are read by default in the unit the catalog's own fluxes came in (the demo's 1e-18)
      await expect(page.locator('#place-csv-unit').inputValue()).resolves.toBe('1e-18 erg s-1 cm-2');
      // a pasted row with a flux in the wrong unit says which unit was probably meant
      await page.selectOption('#place-csv-unit', 'erg s-1 cm-2');
      await page.fill('#place-csv', 'id,z,fwhm_halpha,flux_halpha\nINVENTED-E2E-3,5.5,1800,6.2');
      await page.click('#place-csv-go');
      await expect(page.locator('#place-csv-msg').textContent()).resolves.toMatch(/flux_halpha: 6\.2 erg s-1 cm-2 .*1e-18/);
      expect(site.errors).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('places every row pasted with the catalog own column names, each marked on the charts, and names a bad row', async () => {
    const text = readFileSync(resolve(import.meta.dirname, '../../data-demo/new-objects.csv'), 'utf8');
    const lines = text.split('\n');
    // the demo file's own header and units (fluxes in 1e-18 erg s-1 cm-2, as data-demo/census.config.yaml maps them), two good rows and one bad
    const header = lines.find((l) => l.startsWith('id,'))!;
    const bad = header.split(',').map((h) => (h === 'id' ? 'INVENTED-E2E-BAD' : h === 'z' ? '6' : h === 'fwhm_halpha' ? '-50' : h === 'flux_halpha' ? '3' : '')).join(',');
    const snippet = [header, lines.find((l) => l.startsWith('CDW-90001,'))!, bad, lines.find((l) => l.startsWith('CDW-90003,'))!].join('\n');
    const page = await open();
    try {
      await page.selectOption('#place-csv-unit', '');
      await page.fill('#place-csv', snippet);
      await page.click('#place-csv-go');
      await page.waitForSelector('#place-batch');
      await expect(page.locator('#place-result').getAttribute('data-placed')).resolves.toBe('CDW-90001,CDW-90003');
      await expect(page.locator('#place-batch tbody tr[data-placed="true"]').count()).resolves.toBe(2);
      await expect(page.locator('#place-batch tbody tr[data-row="2"]').textContent()).resolves.toContain('not placed: row 2 (id INVENTED-E2E-BAD): fwhm_halpha: -50 km s-1: must be positive');
      await expect(page.locator('#place-csv-msg').textContent()).resolves.toContain('row 2 (id INVENTED-E2E-BAD): fwhm_halpha: -50 km s-1: must be positive');
      // both placed objects under every reading the page lists
      const readings = await page.locator('#place-batch-readings tbody tr').evaluateAll((trs) => trs.map((tr) => (tr as HTMLElement).dataset.object));
      expect(new Set(readings)).toEqual(new Set(['CDW-90001', 'CDW-90003']));
      expect(readings.filter((id) => id === 'CDW-90001').length).toBe(readings.length / 2);
      // CDW-90001 has a stellar mass (drawn on the M_BH–M* chart); both have z and M_BH
      expect(await newObjectMarks(page, 'mbh-z')).toBe(2);
      expect(site.errors).toEqual([]);
      expect(site.foreign()).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('places an Hβ object from the λL5100 field of the form', async () => {
    const page = await open();
    try {
      await page.fill('#place-id', 'INVENTED-E2E-4');
      await page.fill('#place-z', '9.01');
      await page.selectOption('#place-line', 'hbeta');
      await page.fill('#place-fwhm', '1534');
      await page.fill('#place-fwhm_err', '134');
      await page.fill('#place-lam_l_5100', '1.369e44');
      await page.fill('#place-lam_l_5100_err', '1.95e43');
      await page.click('#place-form button[type=submit]');
      await page.waitForSelector('#place-ranks');
      await expect(page.locator('#place-result').getAttribute('data-placed')).resolves.toBe('INVENTED-E2E-4');
      await expect(page.locator('#place-ranks tbody tr[data-quantity="log_mbh"]').textContent()).resolves.toMatch(/percentile of \d+/);
      expect(await newObjectMarks(page, 'mbh-z')).toBe(1);
      // a log value typed into the linear field is caught beside it
      await page.fill('#place-lam_l_5100', '44.1');
      await page.click('#place-form button[type=submit]');
      await expect(page.locator('#place-lam_l_5100-msg').textContent()).resolves.toMatch(/is it log10/);
      expect(site.errors).toEqual([]);
    } finally {
      await site.close();
    }
  });
});
