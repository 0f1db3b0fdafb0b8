/**
 * Opens site pages for the end-to-end tests with every request recorded at the context level
 * (pages and their workers), so a test can fail on any request that leaves the site's origin,
 * and with dialogs and page errors recorded (the hostile catalog must raise neither).
 */
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { DuckDBInstance } from '@duckdb/node-api';

export interface SitePage {
  context: BrowserContext;
  page: Page;
  /** Every URL requested by the page or its workers. */
  requests: string[];
  /** Requests to any other origin than the site's. */
  foreign(): string[];
  dialogs: string[];
  errors: string[];
  close(): Promise<void>;
}

export async function openSite(browser: Browser, siteUrl: string): Promise<SitePage> {
  const origin = new URL(siteUrl).origin;
  const context = await browser.newContext({ viewport: { width: 1366, height: 768 }, acceptDownloads: true });
  const requests: string[] = [];
  const dialogs: string[] = [];
  const errors: string[] = [];
  context.on('request', (r) => requests.push(r.url()));
  context.on('dialog', (d) => {
    dialogs.push(d.message());
    void d.dismiss();
  });
  const page = await context.newPage();
  page.on('dialog', (d) => {
    if (!dialogs.includes(d.message())) dialogs.push(d.message());
  });
  page.on('pageerror', (e) => errors.push(e.message));
  page.on('worker', (w) => w.on('console', () => undefined));
  return {
    context,
    page,
    requests,
    foreign: () => requests.filter((u) => !u.startsWith(origin + '/') && !u.startsWith('blob:' + origin) && !u.startsWith('data:')),
    dialogs,
    errors,
    close: () => context.close(),
  };
}

/** Runs `sql` with @duckdb/node-api on `parquet` exposed as the view `census`; returns the rows. */
export async function nodeQuery(parquet: string, sql: string): Promise<Record<string, unknown>[]> {
  const instance = await DuckDBInstance.create(':memory:');
  const con = await instance.connect();
  try {
    await con.run(`CREATE VIEW census AS SELECT * FROM read_parquet('${parquet.replace(/'/g, "''")}')`);
    const r = await con.runAndReadAll(sql);
    return r.getRowObjectsJS().map((o) => Object.fromEntries(Object.entries(o).map(([k, v]) => [k, typeof v === 'bigint' ? Number(v) : v])));
  } finally {
    con.closeSync();
    instance.closeSync();
  }
}

/** Waits until every population chart on the page is drawn (or failed with a note). */
export async function waitForCharts(page: Page, timeout = 30_000): Promise<void> {
  await page.waitForFunction(
    () => {
      const mounts = Array.from(document.querySelectorAll('[data-population] [data-chart]'));
      return mounts.length > 0 && mounts.every((m) => m.querySelector('svg') || (m.textContent ?? '').includes('could not'));
    },
    undefined,
    { timeout },
  );
}

/** Number of object marks (points and limit symbols) drawn in the chart mount `key`. */
export function markCount(page: Page, key: string): Promise<number> {
  return page.evaluate((k) => {
    const mount = document.querySelector(`[data-population] [data-chart="${k}"]`);
    if (!mount) return -1;
    const groups = mount.querySelectorAll('g.census-catalog-point, g.census-upper-limit, g.census-highlighted-object, g.census-highlighted-upper-limit');
    let n = 0;
    for (const g of groups) n += g.children.length;
    return n;
  }, key);
}

/** Replaces the SQL in the workspace's editor (CodeMirror) with `sql`. */
export async function setSql(page: Page, sql: string): Promise<void> {
  const editor = page.locator('[data-sql-input]');
  await editor.click();
  await page.keyboard.press('ControlOrMeta+a');
  await page.keyboard.press('Delete');
  await page.keyboard.insertText(sql);
  await page.keyboard.press('Escape'); // close any completion list
}

/** Runs `sql` in the workspace and waits until it has a result or an error (after any query already running). */
export async function runSql(page: Page, sql: string, timeout = 30_000): Promise<void> {
  const idle = () => !document.querySelector('[data-workspace]')?.hasAttribute('aria-busy');
  await page.waitForFunction(idle, undefined, { timeout });
  await setSql(page, sql);
  await page.evaluate(() => {
    document.querySelector('[data-result-summary]')?.removeAttribute('data-ms');
    const e = document.querySelector<HTMLElement>('#sql-error');
    if (e) e.hidden = true;
  });
  await page.locator('[data-run]').click();
  await page.waitForFunction(
    () =>
      !document.querySelector('[data-workspace]')?.hasAttribute('aria-busy') &&
      (document.querySelector('[data-result-summary]')?.getAttribute('data-ms') || !document.querySelector('#sql-error')?.hasAttribute('hidden')),
    undefined,
    { timeout },
  );
}

/** Moves the pointer over chart `key` and waits until the static charts were redrawn interactive. */
export async function reachCharts(page: Page, key = 'mbh-z'): Promise<void> {
  await page.locator(`[data-population] [data-chart="${key}"]`).first().hover();
  await page.waitForFunction(() => !document.querySelector('[data-population] [data-chart][data-static]'), undefined, { timeout: 30_000 });
}
