import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './browser.ts';

describe('landing page', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('loads and shows the title', async () => {
    const page = await browser.newPage();
    await page.goto(inject('siteUrl'));
    await expect(page.locator('h1').textContent()).resolves.toContain('Dawn Census');
  });
});
