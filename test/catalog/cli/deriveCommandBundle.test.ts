import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

// The derive command bundled into one file by scripts/build-cli.mjs (the test setup builds lib/
// when a source is newer); the compiled main loads it. main tells errors apart with instanceof,
// so the bundle must throw the classes main imports, not copies of them.
const LIB = new URL('../../../lib/catalog/', import.meta.url);
const BUNDLE = new URL('cli/deriveCommand.bundle.js', LIB);

describe('the derive command bundle', () => {
  it('imports nothing of ours but the error classes main tells apart', () => {
    const text = readFileSync(BUNDLE, 'utf8');
    const ours = new Set([...text.matchAll(/from "(\.[^"]+)"/g)].map((m) => m[1]));
    const shared = ['../config/ConfigError.js', '../outputs/OutputRefused.js', '../readers/CatalogError.js', './UsageError.js'];
    for (const p of ours) expect(shared).toContain(p);
    expect(ours.has('../readers/CatalogError.js')).toBe(true);
    expect(ours.has('../config/ConfigError.js')).toBe(true);
  });

  it("throws the very ConfigError and CatalogError classes of lib's own modules", async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'dc-bundle-'));
    const config = path.join(dir, 'bad.yaml');
    writeFileSync(config, 'draws: -3\n');
    const { deriveCommand } = (await import(BUNDLE.href)) as { deriveCommand: (args: object, out: { write(s: string): void }) => Promise<void> };
    const { ConfigError } = (await import(new URL('config/ConfigError.js', LIB).href)) as { ConfigError: new (...a: never[]) => Error };
    const { CatalogError } = (await import(new URL('readers/CatalogError.js', LIB).href)) as { CatalogError: new (...a: never[]) => Error };
    const sink = { write: (): void => undefined };
    const badConfig = await deriveCommand({ catalog: path.join(dir, 'none.csv'), config, quiet: true, help: false, force: false }, sink).catch((e: unknown) => e);
    expect(badConfig).toBeInstanceOf(ConfigError);
    expect((badConfig as Error).message).toMatch(/draws must be an integer/);
    const missing = await deriveCommand({ catalog: path.join(dir, 'none.csv'), quiet: true, help: false, force: false }, sink).catch((e: unknown) => e);
    expect(missing).toBeInstanceOf(CatalogError);
  });
});
