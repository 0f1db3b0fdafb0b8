import { describe, expect, it } from 'vitest';
import { packRederived, REDERIVED_NUMBERS, unpackRederived } from '../../../src/site/readings/rederivedColumns.ts';
import type { RederivedRow } from '../../../src/site/readings/rederiveBatch.ts';

function row(i: number): RederivedRow {
  const r = { id: `o${i}`, flags: i % 2 ? 'no_host_mass' : '', mbh_method: i % 3 ? 'Ha_RV15' : null, lbol_method: 'halpha_gh05_bc5100' } as RederivedRow;
  // Values that must survive bit for bit: odd last digits, a negative zero, an infinity, and nulls.
  REDERIVED_NUMBERS.forEach((k, c) => {
    r[k] = (i + c) % 5 === 0 ? null : c === 3 ? -0 : c === 4 && i === 1 ? Infinity : 7.108400147756116 + i * 0.1 + c / 3;
  });
  return r;
}

describe('the custom reading\'s rows packed for a transfer', () => {
  it('come back from their typed arrays exactly as they went in, nulls included', () => {
    const rows = Array.from({ length: 7 }, (_, i) => row(i));
    const packed = packRederived(rows);
    expect(packed.values).toBeInstanceOf(Float64Array);
    expect(packed.values.length).toBe(REDERIVED_NUMBERS.length * 7);
    const back = unpackRederived(packed, rows.map((r) => r.id));
    expect(back).toEqual(rows);
    for (let i = 0; i < 7; i++) expect(Object.is(back[i]!.log_lbol, rows[i]!.log_lbol)).toBe(true);
  });

  it('refuses ids that do not match the packed rows', () => {
    expect(() => unpackRederived(packRederived([row(0), row(1)]), ['o0'])).toThrow(/2 flags .* for 1 ids/);
  });
});
