import type { CensusConfig } from './CensusConfig.ts';
import { ConfigError } from './ConfigError.ts';
import { NUMBER_RULES, describeValue } from './validateConfig.ts';

/**
 * A copy of `cfg` with the command-line `--draws` and `--seed` applied (undefined keeps the
 * config's value). Throws ConfigError (`--draws must be an integer between 1 and 100000, got 0`)
 * for values outside the rules of the config keys.
 */
export function applyOverrides(cfg: CensusConfig, o: { draws?: number; seed?: number }): CensusConfig {
  const settings = { ...cfg.settings, calibrations: { ...cfg.settings.calibrations }, linePriority: [...cfg.settings.linePriority] };
  if (o.draws !== undefined) {
    if (!NUMBER_RULES.draws.ok(o.draws)) throw new ConfigError(`--draws must be ${NUMBER_RULES.draws.what}, got ${describeValue(o.draws)}`);
    settings.draws = o.draws;
  }
  if (o.seed !== undefined) {
    if (!NUMBER_RULES.seed.ok(o.seed)) throw new ConfigError(`--seed must be ${NUMBER_RULES.seed.what}, got ${describeValue(o.seed)}`);
    settings.seed = o.seed;
  }
  return { ...cfg, settings };
}
