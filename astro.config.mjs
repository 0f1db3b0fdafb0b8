// @ts-check
import { defineConfig } from 'astro/config';
import { readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { applyPolicy } from './src/site/build/contentSecurityPolicy.ts';
import { fileURLToPath } from 'node:url';
import { writeDownloads } from './src/site/build/writeDownloads.ts';

/** Removes Astro's empty content-collection modules from the published folder (the site has no collections). */
/** @type {import('astro').AstroIntegration} */
const tidyOutput = {
  name: 'census-tidy-output',
  hooks: {
    'astro:build:done': async ({ dir }) => {
      for (const f of ['content-assets.mjs', 'content-modules.mjs']) await rm(fileURLToPath(new URL(f, dir)), { force: true });
    },
  },
};

/** Fills every page's Content-Security-Policy with the hashes of its inline scripts (src/site/build/contentSecurityPolicy.ts). */
/** @type {import('astro').AstroIntegration} */
const scriptPolicy = {
  name: 'census-script-policy',
  hooks: {
    'astro:build:done': async ({ dir }) => {
      const root = fileURLToPath(dir);
      for (const entry of await readdir(root, { recursive: true, withFileTypes: true })) {
        if (!entry.isFile() || !entry.name.endsWith('.html')) continue;
        const file = join(entry.parentPath, entry.name);
        await writeFile(file, applyPolicy(await readFile(file, 'utf8'), file.slice(root.length)));
      }
    },
  },
};

/**
 * Streams the catalog's CSV, ECSV, VOTable and FITS downloads into data/ once the pages are
 * written (src/site/build/writeDownloads.ts): as Astro endpoints each would sit whole in memory.
 */
/** @type {import('astro').AstroIntegration} */
const downloads = {
  name: 'census-downloads',
  hooks: {
    'astro:build:done': async ({ dir }) => {
      await writeDownloads(fileURLToPath(new URL('data/', dir)));
    },
  },
};

// The site is built for one derived catalog. Which one, and under which sub-path it is
// deployed, come from the environment so that `npm start`, the end-to-end tests and a
// group's own deployment can build different catalogs from the same sources:
//   CENSUS_CATALOG  path of the derived Parquet file (its .meta.json sidecar sits beside it)
//   CENSUS_BASE     base path of the deployment, e.g. /census/ (default /)
//   CENSUS_OUT_DIR  output directory (default dist)
//   CENSUS_OBJECT_PAGES  'static' (one page per object) or 'viewer' (one in-browser page for all);
//                   by default static up to 20,000 objects (src/site/objectLink.ts)
let base = (process.env.CENSUS_BASE ?? '/').trim() || '/';
if (!base.startsWith('/')) base = '/' + base;
if (!base.endsWith('/')) base += '/';

export default defineConfig({
  base,
  outDir: process.env.CENSUS_OUT_DIR ?? 'dist',
  output: 'static',
  trailingSlash: 'ignore',
  build: { format: 'directory' },
  devToolbar: { enabled: false },
  integrations: [tidyOutput, scriptPolicy, downloads],
  vite: {
    // DuckDB-WASM ships its own worker and wasm bundles; Vite must not pre-bundle it.
    optimizeDeps: { exclude: ['@duckdb/duckdb-wasm'] },
    build: { chunkSizeWarningLimit: 4000 },
  },
});
