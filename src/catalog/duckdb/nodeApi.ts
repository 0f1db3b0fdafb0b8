import { createRequire } from 'node:module';

/**
 * @duckdb/node-api, loaded with `require` on first use. The package is CommonJS: imported from an
 * ES module, Node first scans its source for the names it exports (cjs-module-lexer), which took
 * about 0.4 s of every command that writes or reads Parquet; loaded with `require`, it is not
 * scanned. Loading it still takes about 0.2 s of the main thread (the native module), so it waits
 * until a Parquet file is opened: by then `derive` has started its workers, which start meanwhile.
 * Types come from `import type` as usual.
 */
const require = createRequire(import.meta.url);
let loaded: typeof import('@duckdb/node-api') | null = null;

/** The @duckdb/node-api module (loaded at the first call). */
export function duckdb(): typeof import('@duckdb/node-api') {
  loaded ??= require('@duckdb/node-api') as typeof import('@duckdb/node-api');
  return loaded;
}

let bindings: typeof import('@duckdb/node-bindings') | null = null;

/**
 * @duckdb/node-bindings, DuckDB's C API for Node, on which @duckdb/node-api is built (loaded at the
 * first call). Resolved from @duckdb/node-api's own folder, so that it is the exact version that
 * package pins, wherever the package manager put it.
 */
export function duckdbBindings(): typeof import('@duckdb/node-bindings') {
  bindings ??= createRequire(require.resolve('@duckdb/node-api/package.json'))('@duckdb/node-bindings') as typeof import('@duckdb/node-bindings');
  return bindings;
}
