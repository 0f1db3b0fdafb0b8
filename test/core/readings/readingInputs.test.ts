import { describe, expect, it } from 'vitest';
import { deriveObject } from '../../../src/core/derive/deriveObject.ts';
import { DEFAULT_SETTINGS } from '../../../src/core/derive/defaultSettings.ts';
import type { DeriveSettings } from '../../../src/core/derive/types.ts';
import { createRng, seedFor } from '../../../src/core/random/index.ts';
import {
  BUILT_IN_READINGS,
  STANDARD_READING,
  builtInReading,
  deriveUnderReading,
  isIdentityReading,
  parseReadingSpec,
  readingInputs,
  type Reading,
  type ReadingObjectInputs,
} from '../../../src/core/readings/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const custom = (spec: Record<string, unknown>): Reading => parseReadingSpec({ id: 'test_reading', premise: 'A test premise.', references: ['none'], ...spec }, 'test');
const settings: DeriveSettings = { ...DEFAULT_SETTINGS, draws: 100, seed: 5 };
const under = (inputs: ReadingObjectInputs, r: Reading) => deriveUnderReading(inputs, settings, r, deriveObject, createRng(seedFor(settings.seed, inputs.id)));

/** Hα with a width and asymmetric errors, Hβ with only a core width, a dust measurement. */
const object: ReadingObjectInputs = {
  id: 'SYN-IN',
  z: 6,
  lines: {
    halpha: { fwhmKms: { value: 3000, errLo: 300, errHi: 600 }, lumErgS: { value: 2e42 } },
    mgii: { fwhmKms: { value: 4000 }, lumErgS: { value: 1e42 } },
  },
  fwhmCoreKms: { hbeta: { value: 900, errLo: 90 } },
  av: { value: 0.4 },
  balmerDecrement: { value: 4 },
};

describe('readingInputs', () => {
  it('divides a width and both its errors by the deflation, keeps a missing error missing, and leaves absent lines absent', () => {
    const t = readingInputs(custom({ width: 'deflated', deflation: 4 }), object);
    expect(t.inputs.lines.halpha!.fwhmKms).toEqual({ value: 750, errLo: 75, errHi: 150 });
    expect(t.inputs.lines.mgii!.fwhmKms).toEqual({ value: 1000 });
    expect(Object.keys(t.inputs.lines.mgii!.fwhmKms!)).toEqual(['value']);
    expect(t.inputs.lines.halpha!.lumErgS).toEqual({ value: 2e42 });
    // Hβ has a core width but no measured line: under a deflation it has no width to deflate.
    expect(t.inputs.lines.hbeta).toEqual({});
    expect(Object.keys(t.inputs.lines).sort()).toEqual(['halpha', 'hbeta', 'mgii']);
    expect(t.widths).toEqual({ halpha: 'deflated', mgii: 'deflated' });
    expect(t.flags).toEqual([]);
    expect(t.inputs.av).toEqual({ value: 0.4 });
    expect('fwhmCoreKms' in t.inputs).toBe(false);
  });

  it('takes the core width where there is one and deflates the others by the fallback, naming each source', () => {
    const t = readingInputs(custom({ width: 'core', deflation: 2 }), object);
    expect(t.inputs.lines.hbeta).toEqual({ fwhmKms: { value: 900, errLo: 90 } });
    expect(t.inputs.lines.halpha!.fwhmKms).toEqual({ value: 1500, errLo: 150, errHi: 300 });
    expect(t.widths).toEqual({ halpha: 'core_fallback', hbeta: 'core', mgii: 'core_fallback' });
  });

  it('drops A_V and the Balmer decrement and flags it when the reading applies no dust correction, and never changes its input', () => {
    const copy = structuredClone(object);
    const t = readingInputs(custom({ dust: 'none' }), object);
    expect(t.inputs.av).toBeUndefined();
    expect(t.inputs.balmerDecrement).toBeUndefined();
    expect(t.flags).toEqual(['dust_off_by_reading']);
    expect(t.inputs.lines).toBe(object.lines);
    expect(object).toEqual(copy);
  });
});

describe('deriveUnderReading flags and identity', () => {
  it('flags a deflated mass width, and lowers the Hα mass by 2.06·log10(d) (Reines & Volonteri 2015 eq. 5 width exponent)', () => {
    const a = under(object, STANDARD_READING);
    const r = under(object, custom({ width: 'deflated', deflation: 2 }));
    expect(r.flags).toContain('width_deflated');
    expect(r.flags).not.toContain('width_from_core');
    expect(a.flags).not.toContain('width_deflated');
    expectClose(a.logMbh! - r.logMbh!, 2.06 * Math.log10(2), { atol: 1e-12, source: 'Reines & Volonteri 2015 eq. 5, FWHM exponent 2.06' });
    expect([...r.flags].sort()).toEqual(r.flags);
  });

  it('flags an L_bol/λL5100 reading on an object whose L_bol comes from λL3000 as unchanged, and leaves that L_bol', () => {
    const mg: ReadingObjectInputs = { id: 'SYN-MG', z: 6, lines: { mgii: { fwhmKms: { value: 4000 } } }, lamL3000: { value: 1e45 } };
    const a = under(mg, STANDARD_READING);
    const r = under(mg, custom({ l5100_ratio: 5 }));
    expect(a.lbolMethod).toBe('bc3000');
    expect(r.flags).toContain('lbol_route_unchanged');
    expect(r.logLbol).toBe(a.logLbol);
    // A reading that changes only the efficiency touches no L_bol route: no flag.
    expect(under(mg, custom({ efficiency: 0.2 })).flags).not.toContain('lbol_route_unchanged');
  });

  it('counts a reading with only a calibration or only a duty cycle as a change, and a built-in reading is found by its id', () => {
    expect(isIdentityReading(STANDARD_READING)).toBe(true);
    expect(isIdentityReading(custom({ calibrations: { halpha: 'gh05_halpha' } }))).toBe(false);
    expect(isIdentityReading(custom({ duty_cycle: 0.5 }))).toBe(false);
    expect(isIdentityReading(custom({ efficiency: 0.1 }))).toBe(false);
    const gh = under(object, custom({ calibrations: { halpha: 'gh05_halpha' } }));
    expect(gh.mbhMethod).toBe('gh05_halpha');
    const half = under(object, custom({ duty_cycle: 0.5 }));
    expect(half.logMbh).toBe(under(object, STANDARD_READING).logMbh);
    for (const r of BUILT_IN_READINGS) expect(builtInReading(r.id)).toBe(r);
    expect(builtInReading('nonesuch')).toBeUndefined();
  });
});
