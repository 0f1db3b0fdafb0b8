/**
 * Launches the system Chromium for the end-to-end tests. Test tools cannot download
 * browsers on these machines, so we drive Debian's chromium (or CHROMIUM_PATH) with
 * playwright-core. Without one, the tests fail with the way to install it; they are
 * never skipped silently.
 */
import { existsSync } from 'node:fs';
import { chromium, type Browser } from 'playwright-core';

export const CHROMIUM_FLAGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--disable-quic',
];

/** Path of the Chromium executable: CHROMIUM_PATH, else the first of the usual system paths. */
export function findChromium(): string {
  const candidates = [process.env.CHROMIUM_PATH, '/usr/bin/chromium', '/usr/bin/chromium-browser', '/usr/bin/google-chrome'];
  for (const c of candidates) if (c && existsSync(c)) return c;
  throw new Error(
    'No Chromium found for the end-to-end tests. Install one (Debian: `apt-get update && apt-get install -y chromium`) ' +
      'or set CHROMIUM_PATH to its executable.',
  );
}

export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: findChromium(), headless: true, args: CHROMIUM_FLAGS });
}
