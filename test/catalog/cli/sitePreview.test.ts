import { createServer } from 'node:net';
import { mkdir, mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { sitePreview } from '../../../src/catalog/cli/siteCommand.ts';
import { UsageError } from '../../../src/catalog/cli/UsageError.ts';
import { SITE_MARKER } from '../../../src/catalog/outputs/siteOutput.ts';

let dir: string;
const log = { write: () => true };
beforeEach(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'dc-preview-'));
  await mkdir(path.join(dir, 'site'));
  await writeFile(path.join(dir, 'site', 'index.html'), '<p>built</p>');
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('site preview', () => {
  it('serves a built site at the base it was built for, without the config', async () => {
    // Without -c it served at / a site built for /glimmerfen/, and every link was a 404.
    await writeFile(path.join(dir, 'site', SITE_MARKER), JSON.stringify({ tool: 'dawn-census', base: '/glimmerfen/' }));
    const s = await sitePreview({ action: 'preview', config: '', out: path.join(dir, 'site'), port: 0, help: false }, log);
    try {
      expect(s.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/glimmerfen\/$/);
      const res = await fetch(s.url);
      expect(res.status).toBe(200);
      expect(await res.text()).toBe('<p>built</p>');
    } finally {
      await s.close();
    }
  });

  it('says in one line that a port is taken', async () => {
    const blocker = createServer();
    await new Promise<void>((r) => blocker.listen(0, '127.0.0.1', r));
    const port = (blocker.address() as { port: number }).port;
    try {
      const attempt = sitePreview({ action: 'preview', config: '', out: path.join(dir, 'site'), port, help: false }, log);
      await expect(attempt).rejects.toBeInstanceOf(UsageError);
      await expect(attempt).rejects.toThrow(`port ${port} is in use: choose another with --port (0 takes a free one)`);
    } finally {
      await new Promise<void>((r) => blocker.close(() => r()));
    }
  });
});
