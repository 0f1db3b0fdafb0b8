/**
 * Builds the demo site once for all end-to-end tests and serves it on a free local port.
 * The URL reaches the tests through `inject('siteUrl')`.
 */
import type { TestProject } from 'vitest/node';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { serveStatic, type StaticServer } from '../../scripts/lib/staticServer.ts';
import { findChromium } from './browser.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    siteUrl: string;
  }
}

const root = resolve(import.meta.dirname, '../..');
let server: StaticServer | undefined;
let outDir: string | undefined;

export async function setup(project: TestProject): Promise<void> {
  findChromium(); // fail early, with the install hint, when there is no browser
  outDir = mkdtempSync(join(tmpdir(), 'census-e2e-'));
  const dist = join(outDir, 'dist');
  execFileSync(process.execPath, [join(root, 'node_modules/astro/astro.js'), 'build', '--silent'], {
    cwd: root,
    env: { ...process.env, CENSUS_OUT_DIR: dist, CENSUS_BASE: '/' },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  server = await serveStatic(dist, '/');
  project.provide('siteUrl', server.url);
}

export async function teardown(): Promise<void> {
  await server?.close();
  if (outDir) rmSync(outDir, { recursive: true, force: true });
}
