import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

/** Vitest global setup: tests that run bin/dawn-census.js run the compiled lib/, so rebuild it when a source changed. */
export default function setup(): void {
  execFileSync(process.execPath, [fileURLToPath(new URL('../scripts/build-cli.mjs', import.meta.url)), '--if-stale'], { stdio: 'inherit' });
}
