import { existsSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { deriveObject } from '../../../src/core/derive/deriveObject.ts';
import { DEFAULT_SETTINGS } from '../../../src/core/derive/defaultSettings.ts';
import type { ObjectInputs } from '../../../src/core/derive/types.ts';
import { createRng, seedFor } from '../../../src/core/random/index.ts';

// The one-file bundle of the derive worker and the science core, made by scripts/build-cli.mjs
// (the test setup builds lib/ when a source is newer). Workers load it instead of the modules.
const BUNDLE = new URL('../../../lib/catalog/derive/deriveWorker.bundle.js', import.meta.url);

const objects: ObjectInputs[] = [
  { id: 'b-1', z: 6.2, lines: { halpha: { fwhmKms: { value: 2400, errLo: 300, errHi: 300 }, fluxCgs: { value: 3e-18, errLo: 4e-19, errHi: 5e-19 } } }, logMstar: { value: 9.4, errLo: 0.3, errHi: 0.3 }, av: { value: 0.5, errLo: 0.2, errHi: 0.2 } },
  { id: 'b-2', z: 8.9, lines: { hbeta: { fwhmKms: { value: 3100, errLo: 500, errHi: 400 }, lumErgS: { value: 8e41, errLo: 1e41, errHi: 1e41 } } }, av: { value: 0 } },
  { id: 'b-3', z: 5.1, lines: { halpha: { fwhmKms: { value: 1800 }, fluxCgs: { value: 2e-18 }, fluxIsLimit: true } }, lamL5100: { value: 3e43, errLo: 5e42, errHi: 5e42 }, av: { value: 0 } },
];

describe('the derive worker bundle', () => {
  it('exists beside the compiled worker, with no import left to load', async () => {
    expect(existsSync(BUNDLE)).toBe(true);
    const { readFileSync } = await import('node:fs');
    const text = readFileSync(BUNDLE, 'utf8');
    // Node built-ins only (worker_threads, fs): every module of ours is inside.
    const imports = [...text.matchAll(/^import .* from ["']([^"']+)["'];?$/gm)].map((m) => m[1]);
    expect(imports.every((s) => s!.startsWith('node:'))).toBe(true);
  });

  it("exports the worker's loop and a deriveObject that gives the same numbers, to the bit, as the modules'", async () => {
    const bundle = (await import(BUNDLE.href)) as { serveDeriveWorker: unknown; deriveObject: typeof deriveObject };
    expect(typeof bundle.serveDeriveWorker).toBe('function');
    const settings = { ...DEFAULT_SETTINGS, draws: 500 };
    for (const o of objects) {
      const fromBundle = bundle.deriveObject(o, settings, createRng(seedFor(settings.seed, o.id)));
      const fromModules = deriveObject(o, settings, createRng(seedFor(settings.seed, o.id)));
      expect(JSON.stringify(fromBundle)).toBe(JSON.stringify(fromModules));
      expect(fromModules.logMbh).not.toBeNull();
    }
  });
});
