/**
 * The list of every object, the chart of any query result, and the newcomer's rough edges
 * that belong to them: an unknown object, numbers printed one way, reader-facing methods,
 * and pages that fit a 390 px phone.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from './browser.ts';
import { nodeQuery, openSite, runSql } from './sitePage.ts';

const summaryTotal = (page: Page) =>
  page.waitForFunction(() => document.querySelector('[data-object-list]')?.getAttribute('aria-busy') === null && document.querySelector('[data-list-summary]')?.getAttribute('data-total'), undefined, { timeout: 60_000 }).then(async () => Number(await page.locator('[data-list-summary]').getAttribute('data-total')));

describe('the list of every object', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('lists every object a page at a time, finds one by id, filters by flag, sorts by a column, and links each row to its page', async () => {
    const url = inject('siteUrl');
    const parquet = inject('demoParquet');
    const [{ n }] = (await nodeQuery(parquet, 'SELECT count(*) AS n FROM census')) as [{ n: number }];
    const [{ id: someId }] = (await nodeQuery(parquet, 'SELECT id FROM census ORDER BY id DESC LIMIT 1')) as [{ id: string }];
    const [{ n: lensed }] = (await nodeQuery(parquet, `SELECT count(*) AS n FROM census WHERE list_contains(list_transform(string_split(flags, ','), f -> trim(f)), 'lensed')`)) as [{ n: number }];
    const [{ id: topMass }] = (await nodeQuery(parquet, 'SELECT id FROM census WHERE log_mbh IS NOT NULL ORDER BY log_mbh DESC, id LIMIT 1')) as [{ id: string }];
    const site = await openSite(browser, url);
    try {
      const { page } = site;
      await page.goto(new URL('objects/', url).href);
      expect(await summaryTotal(page)).toBe(n);
      expect(await page.locator('table[data-object-list] tbody tr').count()).toBe(Math.min(50, n));

      await page.fill('#list-q', someId.toLowerCase());
      await page.waitForFunction((id) => document.querySelector('table[data-object-list] tbody tr td a')?.textContent === id, someId, { timeout: 30_000 });
      expect(await summaryTotal(page)).toBe(1);
      expect(new URL(page.url()).searchParams.get('q')).toBe(someId.toLowerCase());

      await page.fill('#list-q', '');
      await page.selectOption('#list-flag', 'lensed');
      await page.waitForFunction((k) => document.querySelector('[data-list-summary]')?.getAttribute('data-total') === String(k), lensed, { timeout: 30_000 });

      await page.selectOption('#list-flag', '');
      await page.selectOption('#list-sort', 'log_mbh');
      await page.selectOption('#list-desc', '1');
      await page.waitForFunction((id) => document.querySelector('table[data-object-list] tbody tr td a')?.textContent === id, topMass, { timeout: 30_000 });

      // the state is in the link: reopening it gives the same first row
      await page.goto(page.url());
      await page.waitForFunction((id) => document.querySelector('table[data-object-list] tbody tr td a')?.textContent === id, topMass, { timeout: 60_000 });
      await page.locator('table[data-object-list] tbody tr td a').first().click();
      await page.waitForURL(/\/object\//);
      await expect(page.locator('h1').textContent()).resolves.toBe(topMass);
      expect(site.foreign()).toEqual([]);
      expect(site.errors).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('says an unknown or missing object is not in the catalog, links the list, and leaves no chart at "Drawing…"', async () => {
    const url = inject('siteUrl');
    const site = await openSite(browser, url);
    try {
      const { page } = site;
      for (const href of ['object/', 'object/?id=NOT-AN-OBJECT-42']) {
        await page.goto(new URL(href, url).href);
        await page.locator('[data-not-found]').waitFor({ timeout: 60_000 });
        await expect(page.locator('h1').textContent()).resolves.toBe('Not in the catalog');
        await expect(page.locator('[data-not-found] a').getAttribute('href')).resolves.toBe('/objects/');
        expect(await page.locator('.chart-note:visible', { hasText: 'Drawing' }).count()).toBe(0);
      }
      expect(site.errors).toEqual([]);
    } finally {
      await site.close();
    }
  });
});

describe('the chart of a query result', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('draws the chosen columns with bars and limit arrows, keeps the choice in the link, and exports SVG', async () => {
    const url = inject('siteUrl');
    const parquet = inject('demoParquet');
    const [{ limits, placed }] = (await nodeQuery(
      parquet,
      `SELECT count(*) FILTER (WHERE contains(coalesce(flags, ''), 'mbh_upper_limit')) AS limits, count(*) AS placed FROM census WHERE log_mbh IS NOT NULL AND z IS NOT NULL`,
    )) as [{ limits: number; placed: number }];
    expect(limits).toBeGreaterThan(0);
    const site = await openSite(browser, url);
    try {
      const { page } = site;
      const sql = 'SELECT id, z, log_mbh, log_mbh_p16, log_mbh_p84 FROM census';
      await page.goto(new URL(`query/?sql=${encodeURIComponent(sql)}&cx=z&cy=log_mbh`, url).href);
      await page.locator('[data-run]').click();
      const mount = page.locator('[data-result-chart-mount]');
      await mount.locator('svg').first().waitFor({ timeout: 60_000 });
      await expect(page.locator('[data-chart-form] select[name="x"]').inputValue()).resolves.toBe('z');
      // limits come from the catalog's flags even though the SELECT has no flags column
      await page.waitForFunction((n) => document.querySelectorAll('[data-result-chart-mount] g.census-result-limit > *').length === n, limits, { timeout: 30_000 });
      expect(await mount.locator('g.census-result-point > *').count()).toBe(placed - limits);
      expect(await mount.locator('g.census-error-bar-y > *').count()).toBe(placed - limits);

      await page.selectOption('[data-chart-form] select[name="colour"]', 'log_mbh_p84');
      await page.locator('[data-chart-form] input[name="ylog"]').check();
      await page.waitForFunction(() => new URL(location.href).searchParams.get('clog') === 'y');
      const link = new URL(page.url());
      expect(link.searchParams.get('sql')).toBe(sql);
      expect(link.searchParams.get('cc')).toBe('log_mbh_p84');

      const [download] = await Promise.all([page.waitForEvent('download'), mount.locator('button', { hasText: 'Download SVG' }).click()]);
      expect(download.suggestedFilename()).toBe('census-log_mbh-vs-z.svg');
      expect(site.foreign()).toEqual([]);
      expect(site.errors).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('overlays the Eddington lines when x is the black-hole mass and y the bolometric luminosity', async () => {
    const url = inject('siteUrl');
    const site = await openSite(browser, url);
    try {
      const { page } = site;
      const sql = 'SELECT id, log_mbh, log_lbol FROM census';
      await page.goto(new URL(`query/?sql=${encodeURIComponent(sql)}&cx=log_mbh&cy=log_lbol`, url).href);
      await page.locator('[data-run]').click();
      await page.locator('[data-result-chart-mount] g.census-eddington-line').first().waitFor({ timeout: 60_000 });
      await page.locator('[data-chart-form] input[name="overlays"]').uncheck();
      await page.waitForFunction(() => !document.querySelector('[data-result-chart-mount] g.census-eddington-line'));
    } finally {
      await site.close();
    }
  });
});

describe('rough edges a newcomer hit', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('fits every page into a 390 px wide screen without horizontal scrolling', async () => {
    const url = inject('siteUrl');
    const [{ id }] = (await nodeQuery(inject('demoParquet'), `SELECT id FROM census WHERE log_mbh IS NOT NULL ORDER BY id LIMIT 1`)) as [{ id: string }];
    const context = await browser.newContext({ viewport: { width: 390, height: 844 } });
    try {
      const page = await context.newPage();
      const { objectSlug } = await import('../../src/site/objectSlug.ts');
      for (const path of ['', 'objects/', 'query/', 'place/', 'methods/', `object/${objectSlug(id)}/`, 'object/?id=nope']) {
        await page.goto(new URL(path, url).href);
        await page.waitForTimeout(path === '' || path.startsWith('object/') ? 2500 : 500);
        const [scroll, client] = await page.evaluate(() => [document.documentElement.scrollWidth, document.documentElement.clientWidth]);
        expect(scroll, `page /${path} is ${scroll} px wide`).toBeLessThanOrEqual(client);
        // The same with every fold open (the BibTeX block once ran off the screen), and no flag or
        // column name in a table broken over lines (a column squeezed to a few letters a line); the
        // column name under a quantity's name is a label and may wrap.
        await page.evaluate(() => document.querySelectorAll('details').forEach((d) => (d.open = true)));
        await page.waitForTimeout(200);
        const [openScroll] = await page.evaluate(() => [document.documentElement.scrollWidth]);
        expect(openScroll, `page /${path} with its folds open is ${openScroll} px wide`).toBeLessThanOrEqual(client);
        const broken = await page.evaluate(() => [...document.querySelectorAll('td code, th code:not(.col-under)')].filter((c) => c.getClientRects().length > 1).map((c) => c.textContent));
        expect(broken, `page /${path}: codes broken over lines in a table`).toEqual([]);
        // Nothing past the page's right margin either (a form's fieldsets once ran 6 px beyond it): every
        // box ends inside main's content box, unless a scrolling or positioned box holds it.
        const past = await page.evaluate(() => {
          const main = document.querySelector('main')!;
          const limit = main.getBoundingClientRect().right - parseFloat(getComputedStyle(main).paddingRight) + 1;
          const out: string[] = [];
          for (const e of main.querySelectorAll('*')) {
            const r = e.getBoundingClientRect();
            if (r.width === 0 || r.right <= limit || /absolute|fixed/.test(getComputedStyle(e).position)) continue;
            let a = e.parentElement;
            while (a && a !== main && getComputedStyle(a).overflowX === 'visible' && !/absolute|fixed/.test(getComputedStyle(a).position)) a = a.parentElement;
            if (a === main) out.push(`${e.tagName.toLowerCase()} ends at ${Math.round(r.right)} px, the margin at ${Math.round(limit)}`);
          }
          return out.slice(0, 5);
        });
        expect(past, `page /${path}`).toEqual([]);
      }
    } finally {
      await context.close();
    }
  });

  it('keeps a row of the object list and of a query\'s result one line tall on a phone, however many flags it has', async () => {
    // Wrapped in a column a third of the screen wide, five flags made a row 120 px tall, its numbers
    // on the first line and the flags off to the side; now the flags stay on one line and the table scrolls.
    const url = inject('siteUrl');
    const [most] = (await nodeQuery(inject('demoParquet'), `SELECT id, flags FROM census ORDER BY length(flags) DESC, id LIMIT 1`)) as [{ id: string; flags: string }];
    expect(most.flags.split(',').length).toBeGreaterThanOrEqual(4);
    // Lines of text in each row's flags cell, and in its tallest cell.
    const measure = (page: Page, table: string) =>
      page.evaluate((sel) => {
        const lines = (e: Element): number => {
          const r = document.createRange();
          r.selectNodeContents(e);
          return new Set([...r.getClientRects()].map((b) => Math.round(b.top))).size;
        };
        return [...document.querySelectorAll<HTMLTableRowElement>(`${sel} tbody tr`)].map((tr) => ({
          flagLines: [...tr.querySelectorAll('td.flags-cell')].map(lines),
          mostLines: Math.max(...[...tr.cells].map(lines)),
        }));
      }, table);
    const site = await openSite(browser, url);
    try {
      const { page } = site;
      await page.setViewportSize({ width: 390, height: 844 });
      await page.goto(new URL('objects/', url).href);
      await page.locator('#list-q').fill(most.id);
      await page.waitForFunction((id) => [...document.querySelectorAll('[data-object-list] tbody tr')].some((r) => r.textContent?.includes(id)), most.id);
      const list = await measure(page, '[data-object-list] table');
      expect(list.length).toBeGreaterThan(0);
      // Its upper-limit mass is shown as a bound, as on its own page (the list showed a bare number).
      const massCell = await page.evaluate((id) => {
        const table = document.querySelector('[data-object-list] table')!;
        const col = [...table.querySelectorAll('thead th')].findIndex((th) => th.textContent?.includes('log_mbh'));
        const row = [...table.querySelectorAll('tbody tr')].find((r) => r.textContent?.includes(id))!;
        return row.querySelectorAll('td')[col]?.textContent ?? '';
      }, most.id);
      expect(most.flags).toContain('mbh_upper_limit');
      expect(massCell).toMatch(/^< \d+\.\d\d$/);
      for (const r of list) {
        expect(r.flagLines, `object list: ${JSON.stringify(list)}`).toEqual([1]);
        expect(r.mostLines, `object list: ${JSON.stringify(list)}`).toBe(1);
      }

      await page.goto(new URL('query/', url).href);
      await runSql(page, `SELECT id, z, log_mbh, flags FROM census ORDER BY length(flags) DESC, id LIMIT 20`);
      const result = await measure(page, '[data-result-table] table');
      expect(result).toHaveLength(20);
      for (const r of result) {
        expect(r.flagLines, `query result: ${JSON.stringify(result)}`).toEqual([1]);
        expect(r.mostLines, `query result: ${JSON.stringify(result)}`).toBe(1);
      }
      expect(site.errors).toEqual([]);
    } finally {
      await site.close();
    }
  });

  it('fits an object page\'s value tables into their columns from 600 px up, in one column and in two', async () => {
    // In the two-column layout the tables had 520–620 px and their units ran out of sight; the column
    // name now goes under the quantity's name there, as on a phone.
    const url = inject('siteUrl');
    const [{ id }] = (await nodeQuery(inject('demoParquet'), `SELECT id FROM census WHERE log_mbh IS NOT NULL ORDER BY id LIMIT 1`)) as [{ id: string }];
    const { objectSlug } = await import('../../src/site/objectSlug.ts');
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    try {
      const page = await context.newPage();
      await page.goto(new URL(`object/${objectSlug(id)}/`, url).href);
      for (const width of [1600, 1280, 1200, 1199, 1000, 761, 600]) {
        await page.setViewportSize({ width, height: 900 });
        const wraps = await page.locator('table.values').evaluateAll((tables) =>
          tables.map((t) => {
            const wrap = t.closest('.table-wrap') as HTMLElement;
            return { scroll: wrap.scrollWidth, client: wrap.clientWidth, underShown: getComputedStyle(t.querySelector('.col-under')!).display !== 'none' };
          }),
        );
        expect(wraps.length).toBeGreaterThanOrEqual(2);
        for (const w of wraps) expect(w.scroll, `at ${width} px: ${JSON.stringify(wraps)}`).toBeLessThanOrEqual(w.client);
        // Where the name has a column of its own it is not shown twice.
        const twoColumns = await page.evaluate(() => getComputedStyle(document.querySelector('.two-col')!).gridTemplateColumns.split(' ').length === 2);
        expect(twoColumns).toBe(width >= 1200);
        for (const w of wraps) expect(w.underShown).toBe(width >= 1200 || width <= 760);
      }
    } finally {
      await context.close();
    }
  });

  it('shows the methods with reader-facing names and rounded values, and BC5100 once', async () => {
    const res = await fetch(new URL('methods/', inject('siteUrl')));
    const html = await res.text();
    for (const internal of ['tEddGyr', 'scatterDex', 'fwhmKms', 'logL5100FromLogLHbeta', '0.4504904122304202']) expect(html).not.toContain(internal);
    const bolometric = html.slice(html.indexOf('id="bolometric"'), html.indexOf('id="eddington"'));
    expect(bolometric.match(/BC5100<\/th>/g) ?? []).toHaveLength(1);
  });

  it('prints numbers one way: the minus sign, and dl_mpc in whole Mpc on every object page (it was 36980 and 1.03e5)', async () => {
    const url = inject('siteUrl');
    const rows = (await nodeQuery(inject('demoParquet'), `SELECT id, dl_mpc, log_edd_ratio FROM census WHERE log_edd_ratio < 0 AND dl_mpc IS NOT NULL ORDER BY dl_mpc DESC LIMIT 1`)) as { id: string; dl_mpc: number; log_edd_ratio: number }[];
    const { objectSlug } = await import('../../src/site/objectSlug.ts');
    const html = await (await fetch(new URL(`object/${objectSlug(rows[0]!.id)}/`, url))).text();
    expect(html).toContain(`>${Math.round(rows[0]!.dl_mpc)}<`);
    expect(html).toContain(`−${Math.abs(rows[0]!.log_edd_ratio).toFixed(2)}`);
    expect(html).not.toMatch(/>\s*-\d/);
  });
});
