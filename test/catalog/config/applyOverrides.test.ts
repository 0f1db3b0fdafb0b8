import { describe, expect, it } from 'vitest';
import { applyOverrides, ConfigError, defaultConfig } from '../../../src/catalog/config/index.ts';

describe('applyOverrides', () => {
  it('replaces draws and seed and leaves the original config unchanged', () => {
    const cfg = defaultConfig();
    const out = applyOverrides(cfg, { draws: 50, seed: 0 });
    expect(out.settings.draws).toBe(50);
    expect(out.settings.seed).toBe(0);
    expect(cfg.settings.draws).toBe(2000);
    expect(cfg.settings.seed).toBe(1);
    expect(out.settings.cosmology).toBe('planck18');
  });

  it('keeps the config values when no override is given', () => {
    const out = applyOverrides(defaultConfig(), {});
    expect(out.settings).toEqual(defaultConfig().settings);
  });

  it.each([
    [{ draws: 0 }, '--draws must be an integer between 1 and 100000, got 0'],
    [{ draws: 2.5 }, '--draws must be an integer between 1 and 100000, got 2.5'],
    [{ draws: 1e6 }, '--draws must be an integer between 1 and 100000, got 1000000'],
    [{ draws: NaN }, '--draws must be an integer between 1 and 100000, got NaN'],
    [{ seed: -2 }, '--seed must be an integer of at least 0, got -2'],
  ])('rejects %j with "%s"', (o, message) => {
    expect(() => applyOverrides(defaultConfig(), o)).toThrow(new ConfigError(message));
  });
});
