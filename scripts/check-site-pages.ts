/**
 * Opens the main pages of a served site in headless Chromium and fails when any page logs a
 * console error, throws, has a request fail or answered with an HTTP error, or asks any other
 * origin for anything. Run by scripts/check-pack.sh on the site built from the installed tarball.
 * Usage: tsx scripts/check-site-pages.ts <site url, with its base> <built site folder>
 *
 * Pages: the overview, the object list, one object page (the first the build wrote, or the
 * in-browser viewer for large catalogs), methods, the SQL workspace (running its first
 * example), readings (until its charts are drawn), population and place.
 */
import { existsSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { launchBrowser } from '../test/e2e/browser.ts';

const [siteUrl, siteDir] = process.argv.slice(2);
if (!siteUrl || !siteDir) {
  console.error('usage: check-site-pages.ts <site url> <built site folder>');
  process.exit(64);
}
const base = siteUrl.endsWith('/') ? siteUrl : `${siteUrl}/`;
const origin = new URL(base).origin;

/** The first object page the build wrote (`object/<slug>/`), else the viewer. */
function objectPage(): string {
  const dir = join(siteDir!, 'object');
  const slugs = existsSync(dir) ? readdirSync(dir, { withFileTypes: true }).filter((e) => e.isDirectory() && existsSync(join(dir, e.name, 'index.html'))) : [];
  return slugs.length > 0 ? `object/${slugs.map((e) => e.name).sort()[0]}/` : 'object/';
}

/** What a page must show before it counts as loaded, beyond the load event. */
const READY: Record<string, (page: Page) => Promise<unknown>> = {
  'query/': async (page) => {
    await page.locator('[data-run]').click();
    await page.waitForFunction(
      () => document.querySelector('[data-result-summary]')?.getAttribute('data-rows') || !document.querySelector('#sql-error')?.hasAttribute('hidden'),
      undefined,
      { timeout: 90_000 },
    );
    const error = (await page.locator('#sql-error').textContent())?.trim();
    if (error) throw new Error(`the query page's first query failed: ${error}`);
  },
  'readings/': (page) =>
    page.waitForFunction(() => {
      const charts = document.querySelector<HTMLElement>('#reading-charts');
      return !charts || (charts.dataset.reading ?? '') !== '' || document.querySelector('[data-readings-page] .chart-note');
    }, undefined, { timeout: 90_000 }),
};

const pages = ['', 'objects/', objectPage(), 'methods/', 'query/', 'readings/', 'place/', ...(existsSync(join(siteDir, 'population/index.html')) ? ['population/'] : [])];
const problems: string[] = [];
const browser = await launchBrowser();
try {
  for (const path of pages) {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    const at = `/${path}`;
    page.on('console', (m) => {
      if (m.type() === 'error') problems.push(`${at}: console error: ${m.text()}`);
    });
    page.on('pageerror', (e) => problems.push(`${at}: uncaught: ${e.message}`));
    context.on('requestfailed', (r) => {
      const why = r.failure()?.errorText ?? 'no reason';
      // The page itself cancelled it: DuckDB-WASM stops a read of the Parquet file once it has the bytes it wants.
      if (why === 'net::ERR_ABORTED') return;
      problems.push(`${at}: request failed: ${r.url()} (${why})`);
    });
    context.on('response', (r) => {
      if (r.status() >= 400) problems.push(`${at}: HTTP ${r.status()} for ${r.url()}`);
    });
    context.on('request', (r) => {
      const u = r.url();
      if (!u.startsWith(`${origin}/`) && !u.startsWith(`blob:${origin}`) && !u.startsWith('data:')) problems.push(`${at}: request to another origin: ${u}`);
    });
    try {
      const res = await page.goto(new URL(path, base).href, { waitUntil: 'load', timeout: 60_000 });
      if (!res?.ok()) problems.push(`${at}: HTTP ${res?.status()}`);
      await READY[path]?.(page);
      // Scripts that start after the load event (the charts' redraw on reach, the database) get a moment.
      await page.waitForLoadState('networkidle', { timeout: 30_000 }).catch(() => undefined);
      console.log(`pages: ${at} loaded`);
    } catch (err) {
      problems.push(`${at}: ${(err as Error).message.split('\n')[0]}`);
    } finally {
      await context.close();
    }
  }
} finally {
  await browser.close();
}
if (problems.length > 0) {
  console.error(`pages: ${problems.length} problem(s):\n${problems.map((p) => `  ${p}`).join('\n')}`);
  process.exit(1);
}
console.log(`pages: ${pages.length} pages opened in Chromium with no console errors and no failed requests`);
