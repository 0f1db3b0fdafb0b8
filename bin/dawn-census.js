#!/usr/bin/env node
// Entry of the `dawn-census` command. The sources are TypeScript; tsx (a runtime dependency)
// compiles them on load, so the command works right after `npm ci` with no build step.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('../src/catalog/cli/main.ts');
process.exitCode = await main(process.argv.slice(2));
