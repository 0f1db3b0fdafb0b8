import { describe, expect, it } from 'vitest';
import { DEFAULT_SETTINGS } from '../../../src/core/derive/defaultSettings.ts';
import type { DeriveSettings } from '../../../src/core/derive/types.ts';
import { isDrawBank } from '../../../src/core/random/drawBank.ts';
import { parseReadingSpec, SMALL_BOLOMETRIC_READING, type ReadingObjectInputs } from '../../../src/core/readings/index.ts';
import { KeptDrawBanks } from '../../../src/site/readings/keptDrawBanks.ts';
import { rederiveBatch } from '../../../src/site/readings/rederiveBatch.ts';

const settings: DeriveSettings = { ...DEFAULT_SETTINGS, draws: 300, seed: 11 };

/** Invented objects: Hα with a Balmer decrement and a host mass, and Hβ with λL5100. */
function objects(n: number): ReadingObjectInputs[] {
  return Array.from({ length: n }, (_, i) =>
    i % 2
      ? { id: `SYN-${i}`, z: 5 + i / 10, lines: { hbeta: { fwhmKms: { value: 2500 + 37 * i, errLo: 300, errHi: 300 }, lumErgS: { value: 1e42 } } }, lamL5100: { value: 1e44, errLo: 1e43, errHi: 1e43 } }
      : {
          id: `SYN-${i}`,
          z: 6 + i / 10,
          lines: { halpha: { fwhmKms: { value: 1800 + 41 * i, errLo: 200, errHi: 200 }, lumErgS: { value: 3e42, errLo: 3e41, errHi: 3e41 } } },
          balmerDecrement: { value: 4.5, errLo: 0.5, errHi: 0.5 },
          logMstar: { value: 9, errLo: 0.2, errHi: 0.2 },
        },
  );
}

const deflated = parseReadingSpec({ id: 'custom', premise: 'A test premise.', references: ['none'], width: 'deflated', deflation: 2.5, dust: 'none' }, 'test');

describe('kept banks of deviates', () => {
  it('give every reading the same rows, to the bit, as a fresh random stream per object, however often they are reused', () => {
    const inputs = objects(12);
    const banks = new KeptDrawBanks();
    for (const reading of [SMALL_BOLOMETRIC_READING, deflated, SMALL_BOLOMETRIC_READING]) {
      const kept = rederiveBatch(inputs, settings, reading, (o) => banks.randomFor(o.id, settings));
      const fresh = rederiveBatch(inputs, settings, reading);
      expect(kept).toEqual(fresh);
      for (let i = 0; i < inputs.length; i++) expect(Object.is(kept[i]!.log_mbh_p84, fresh[i]!.log_mbh_p84)).toBe(true);
    }
    expect(banks.kept).toBe(12);
  });

  it('keep an object\'s bank from one derivation to the next, and count the bytes of its deviates', () => {
    const banks = new KeptDrawBanks();
    const [o] = objects(1);
    const bank = banks.randomFor(o!.id, settings);
    expect(isDrawBank(bank)).toBe(true);
    expect(banks.randomFor(o!.id, settings)).toBe(bank);
    rederiveBatch([o!], settings, SMALL_BOLOMETRIC_READING, (x) => banks.randomFor(x.id, settings));
    // Each role filled holds `draws` doubles.
    expect(banks.heldBytes).toBeGreaterThan(0);
    expect(banks.heldBytes % (settings.draws * 8)).toBe(0);
  });

  it('stop keeping banks once they hold their budget, and give later objects a fresh stream', () => {
    const banks = new KeptDrawBanks(1);
    const inputs = objects(3);
    rederiveBatch(inputs, settings, SMALL_BOLOMETRIC_READING, (o) => banks.randomFor(o.id, settings));
    expect(banks.kept).toBe(1);
    expect(isDrawBank(banks.randomFor(inputs[2]!.id, settings))).toBe(false);
    // The rows are the same either way.
    expect(rederiveBatch(inputs, settings, deflated, (o) => banks.randomFor(o.id, settings))).toEqual(rederiveBatch(inputs, settings, deflated));
  });

  it('drop every kept bank when the seed or the number of draws changes', () => {
    const banks = new KeptDrawBanks();
    const [o] = objects(1);
    const bank = banks.randomFor(o!.id, settings);
    const other = { ...settings, seed: 12 };
    expect(banks.randomFor(o!.id, other)).not.toBe(bank);
    expect(rederiveBatch([o!], other, deflated, (x) => banks.randomFor(x.id, other))).toEqual(rederiveBatch([o!], other, deflated));
    const fewer = { ...other, draws: 100 };
    expect(rederiveBatch([o!], fewer, deflated, (x) => banks.randomFor(x.id, fewer))).toEqual(rederiveBatch([o!], fewer, deflated));
    expect(banks.kept).toBe(1);
  });

  it('count the derived arrays a bank keeps (at most four per role) however many deflation factors the reader tries', () => {
    const banks = new KeptDrawBanks();
    const [o] = objects(1);
    const use = (r: typeof deflated) => rederiveBatch([o!], settings, r, (x) => banks.randomFor(x.id, settings));
    use(SMALL_BOLOMETRIC_READING);
    const first = banks.heldBytes;
    const spec = (d: number) => parseReadingSpec({ id: 'custom', premise: 'A test premise.', references: ['none'], width: 'deflated', deflation: d, dust: 'none' }, 'test');
    for (const d of [1.5, 2, 2.5, 3, 3.5, 4, 4.5, 5]) use(spec(d));
    // Each deflation is a new width measurement, so a new log10 array of the width role; the bank
    // reuses four such arrays per role, so at most three more than the first derivation made.
    const array = settings.draws * 8;
    expect(banks.heldBytes).toBeGreaterThan(first);
    expect(banks.heldBytes).toBeLessThanOrEqual(first + 3 * array);
  });
});
