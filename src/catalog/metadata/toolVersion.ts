import { readFileSync } from 'node:fs';

let cached: string | undefined;

/** The `version` of the dawn-census package.json (read once). */
export function toolVersion(): string {
  cached ??= (JSON.parse(readFileSync(new URL('../../../package.json', import.meta.url), 'utf8')) as { version: string }).version;
  return cached;
}
