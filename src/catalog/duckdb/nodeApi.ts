import { createRequire } from 'node:module';

/**
 * @duckdb/node-api, loaded with `require`. The package is CommonJS: imported from an ES module,
 * Node first scans its source for the names it exports (cjs-module-lexer), which took about
 * 0.4 s of every command that writes or reads Parquet. Loaded with `require`, it is not scanned.
 * Types come from `import type` as usual.
 */
const require = createRequire(import.meta.url);
export const duckdb = require('@duckdb/node-api') as typeof import('@duckdb/node-api');
