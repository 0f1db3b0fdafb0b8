#!/usr/bin/env node
// Entry of the `dawn-census` command. It runs the compiled JavaScript in lib/ (built by
// `npm run build:cli`, which `npm ci` and `npm pack` run through `prepare`). In a development
// checkout without lib/, or with DAWN_CENSUS_FROM_SOURCE=1, it runs the TypeScript sources
// through tsx (a development dependency).
import { existsSync } from 'node:fs';

const compiled = new URL('../lib/catalog/cli/main.js', import.meta.url);
let main;
if (process.env.DAWN_CENSUS_FROM_SOURCE !== '1' && existsSync(compiled)) {
  ({ main } = await import(compiled.href));
} else {
  const { register } = await import('tsx/esm/api');
  register();
  ({ main } = await import('../src/catalog/cli/main.ts'));
}
process.exitCode = await main(process.argv.slice(2));
