// @ts-check
import { defineConfig } from 'astro/config';

// The site is built for one derived catalog. Which one, and under which sub-path it is
// deployed, come from the environment so that `npm start`, the end-to-end tests and a
// group's own deployment can build different catalogs from the same sources:
//   CENSUS_CATALOG  path of the derived Parquet file (its .meta.json sidecar sits beside it)
//   CENSUS_BASE     base path of the deployment, e.g. /census/ (default /)
//   CENSUS_OUT_DIR  output directory (default dist)
const base = process.env.CENSUS_BASE ?? '/';

export default defineConfig({
  base,
  outDir: process.env.CENSUS_OUT_DIR ?? 'dist',
  output: 'static',
  trailingSlash: 'ignore',
  build: { format: 'directory' },
  devToolbar: { enabled: false },
  vite: {
    // DuckDB-WASM ships its own worker and wasm bundles; Vite must not pre-bundle it.
    optimizeDeps: { exclude: ['@duckdb/duckdb-wasm'] },
    build: { chunkSizeWarningLimit: 4000 },
  },
});
