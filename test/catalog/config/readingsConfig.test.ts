import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ConfigError, parseConfig } from '../../../src/catalog/config/index.ts';

const here = join(process.cwd(), 'census.config.yaml');
const messageOf = (text: string): string => {
  try {
    parseConfig(text, here);
  } catch (e) {
    expect(e).toBeInstanceOf(ConfigError);
    return (e as Error).message;
  }
  throw new Error('expected a ConfigError');
};
const custom = (extra: string) => `readings:\n  custom:\n    - { id: mine, premise: A premise., references: [Someone 2026]${extra} }\n`;

describe('the readings key of a config', () => {
  it('defaults to the four built-in readings with standard as the primary', () => {
    const cfg = parseConfig('draws: 10\n', here);
    expect(cfg.readings).toBeUndefined();
    const withKey = parseConfig(custom(''), here);
    expect(withKey.readings!.primary).toBe('standard');
    expect(withKey.readings!.readings.map((r) => r.id)).toEqual(['standard', 'scattering_core', 'dense_gas', 'small_bolometric', 'mine']);
  });

  it('stops at an unknown key of a custom reading with one line naming the key', () => {
    const m = messageOf(custom(', width_factor: 2'));
    expect(m).toBe(
      'census.config.yaml: readings.custom[0]: unknown key "width_factor"; known: id, label, premise, references, calibrations, width, deflation, bolometric, l5100_ratio, dust, efficiency, duty_cycle',
    );
  });

  it('stops at an out-of-range factor with one line naming the key', () => {
    const m = messageOf(custom(', deflation: 50'));
    expect(m).toMatch(/^census\.config\.yaml: readings\.custom\[0\]\.deflation must be a number between 1 and 10 \(.*\), got 50$/);
    expect(m).not.toContain('\n');
  });

  it('stops at an unknown key under readings, an unknown primary and a taken id', () => {
    expect(messageOf('readings: { primery: standard }\n')).toMatch(/unknown key "readings\.primery"/);
    expect(messageOf('readings: { primary: nothing }\n')).toMatch(/readings\.primary: unknown reading "nothing"; known: standard, /);
    expect(messageOf('readings:\n  custom:\n    - { id: dense_gas, premise: p, references: [r] }\n')).toMatch(/readings\.custom\[0\]\.id "dense_gas" is already taken/);
    expect(messageOf('readings: { use: [standard, nope] }\n')).toMatch(/readings\.use\[1\]: unknown reading "nope"/);
  });
});
