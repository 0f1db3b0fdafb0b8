import { describe, expect, it } from 'vitest';
import { createRng, seedFor } from '../../../src/core/random/index.ts';

describe('seedFor', () => {
  it('is deterministic in (global seed, id)', () => {
    expect(seedFor(42, 'obj-001')).toBe(seedFor(42, 'obj-001'));
  });

  it('differs by id, by global seed, and for ids that differ in one character or the high byte', () => {
    const s = seedFor(42, 'obj-001');
    expect(seedFor(42, 'obj-002')).not.toBe(s);
    expect(seedFor(43, 'obj-001')).not.toBe(s);
    expect(seedFor(42 + 2 ** 33, 'obj-001')).not.toBe(s);
    expect(seedFor(42, 'obj-001\u0000')).not.toBe(s);
    expect(seedFor(42, '\u0101')).not.toBe(seedFor(42, '\u0001'));
  });

  it('returns a non-negative integer below 2^53', () => {
    for (const id of ['', 'a', 'obj-9', 'très-long-identifiant-éà']) {
      const s = seedFor(1, id);
      expect(Number.isSafeInteger(s) && s >= 0).toBe(true);
    }
  });

  it('gives 100000 sequential ids 100000 distinct seeds', () => {
    const seen = new Set<number>();
    for (let i = 0; i < 100_000; i++) seen.add(seedFor(7, `src-${i}`));
    expect(seen.size).toBe(100_000);
  });

  it('makes an object stream independent of processing order', () => {
    const a1 = createRng(seedFor(5, 'A')).next();
    createRng(seedFor(5, 'B')).next();
    const a2 = createRng(seedFor(5, 'A')).next();
    expect(a2).toBe(a1);
  });
});
