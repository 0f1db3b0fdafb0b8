import { describe, expect, it } from 'vitest';
import { deriveObject } from '../../../src/core/derive/deriveObject.ts';
import { DEFAULT_SETTINGS } from '../../../src/core/derive/defaultSettings.ts';
import type { DeriveSettings } from '../../../src/core/derive/types.ts';
import { createRng, seedFor } from '../../../src/core/random/index.ts';
import { createDrawBank } from '../../../src/core/random/drawBank.ts';
import {
  DENSE_GAS_READING,
  SCATTERING_CORE_READING,
  SMALL_BOLOMETRIC_READING,
  STANDARD_READING,
  deriveUnderReading,
  parseReadingSpec,
  type Reading,
  type ReadingObjectInputs,
} from '../../../src/core/readings/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const settings: DeriveSettings = { ...DEFAULT_SETTINGS, draws: 200, seed: 3 };
const rng = (id: string) => createRng(seedFor(settings.seed, id));
const under = (inputs: ReadingObjectInputs, r: Reading, s: DeriveSettings = settings) => deriveUnderReading(inputs, s, r, deriveObject, rng(inputs.id));
const custom = (spec: Record<string, unknown>): Reading => parseReadingSpec({ id: 'test_reading', premise: 'A test premise.', references: ['none'], ...spec }, 'test');

/** An Hα-only object with a Balmer decrement: standard mass from rv15_halpha (FWHM exponent 2.06), L_bol from Hα. */
const halphaObject: ReadingObjectInputs = {
  id: 'SYN-HA',
  z: 6,
  lines: { halpha: { fwhmKms: { value: 2500, errLo: 200, errHi: 200 }, lumErgS: { value: 3e42, errLo: 3e41, errHi: 3e41 } } },
  balmerDecrement: { value: 5, errLo: 0.5, errHi: 0.5 },
  logMstar: { value: 9, errLo: 0.2, errHi: 0.2 },
};
/** An Hβ object with λL5100: vp06_hbeta (FWHM exponent 2), L_bol from L5100 × BC5100. */
const hbetaObject: ReadingObjectInputs = {
  id: 'SYN-HB',
  z: 5,
  lines: { hbeta: { fwhmKms: { value: 3000, errLo: 300, errHi: 300 }, lumErgS: { value: 1e42 } } },
  lamL5100: { value: 1e44, errLo: 1e43, errHi: 1e43 },
};

describe('deriveUnderReading', () => {
  it('gives exactly deriveObject\'s result under the standard reading, with the same random stream', () => {
    expect(under(halphaObject, STANDARD_READING)).toEqual(deriveObject(halphaObject, settings, rng(halphaObject.id)));
  });

  it('lowers log M by 2.06·log10(d) for an Hα calibration when widths are deflated by d', () => {
    const base = under(halphaObject, STANDARD_READING);
    const d = 3;
    const r = under(halphaObject, custom({ width: 'deflated', deflation: d }));
    // rv15_halpha: FWHM exponent 2.06 (Reines & Volonteri 2015, ApJ 813, 82, eq. 5); the shift is exact arithmetic.
    expectClose(base.logMbh! - r.logMbh!, 2.06 * Math.log10(d), { atol: 1e-12, source: 'Reines & Volonteri 2015 eq. 5, FWHM exponent 2.06' });
    // Same deviates under both readings: every percentile moves by the same amount, to rounding.
    for (const p of ['p16', 'p50', 'p84'] as const)
      expectClose(base.pct.logMbh![p] - r.pct.logMbh![p], 2.06 * Math.log10(d), { atol: 1e-12, source: 'same deviates, deflated widths' });
    expect(r.flags).toContain('width_deflated');
    expect(r.logLbol).toBe(base.logLbol);
  });

  it('lowers log M by 2·log10(d) for a calibration with FWHM exponent 2', () => {
    const base = under(hbetaObject, STANDARD_READING);
    const r = under(hbetaObject, custom({ width: 'deflated', deflation: 4 }));
    // vp06_hbeta: FWHM exponent 2 (Vestergaard & Peterson 2006, ApJ 641, 689, eq. 5).
    expectClose(base.logMbh! - r.logMbh!, 2 * Math.log10(4), { atol: 1e-12, source: 'Vestergaard & Peterson 2006 eq. 5, FWHM exponent 2' });
  });

  it('takes the core width where the catalog has one, and otherwise deflates by the fallback factor and flags the object', () => {
    const base = under(halphaObject, STANDARD_READING);
    const withCore = under({ ...halphaObject, fwhmCoreKms: { halpha: { value: 1000, errLo: 100, errHi: 100 } } }, SCATTERING_CORE_READING);
    expectClose(base.logMbh! - withCore.logMbh!, 2.06 * Math.log10(2500 / 1000), { atol: 1e-12, source: 'FWHM exponent 2.06, core width 1000 of 2500 km/s' });
    expect(withCore.flags).toContain('width_from_core');
    expect(withCore.flags).not.toContain('core_width_fallback');

    const without = under(halphaObject, SCATTERING_CORE_READING);
    expectClose(base.logMbh! - without.logMbh!, 2.06, { atol: 1e-12, source: 'fallback deflation 10 and FWHM exponent 2.06' });
    expect(without.flags).toContain('core_width_fallback');
  });

  it('multiplies L_bol by 5/BC5100 when L_bol/L5100 = 5 replaces the run\'s BC5100, leaving the mass', () => {
    const base = under(halphaObject, STANDARD_READING);
    const r = under(halphaObject, SMALL_BOLOMETRIC_READING);
    // BC5100: the run's (default 9.26, Shen et al. 2011); 5: Greene et al. 2025 abstract.
    const bc = settings.bc5100;
    expectClose(r.logLbol! - base.logLbol!, Math.log10(5 / bc), { atol: 1e-12, source: 'Greene et al. 2025 abstract (5) over the run\'s BC5100' });
    expect(r.logMbh).toBe(base.logMbh);
    expectClose(r.logEddRatio! - base.logEddRatio!, Math.log10(5 / bc), { atol: 1e-12, source: 'λ_Edd ∝ L_bol' });
  });

  it('divides the Hα route by 40 and switches dust off in the dense gas reading', () => {
    const noDust = under({ ...halphaObject, balmerDecrement: undefined } as ReadingObjectInputs, STANDARD_READING);
    const r = under(halphaObject, DENSE_GAS_READING);
    // Yanagisawa et al. 2026 abstract: ~40 for broad Hα. With dust off the luminosity equals the uncorrected one.
    expectClose(noDust.logLbol! - r.logLbol!, Math.log10(40), { atol: 1e-12, source: 'Yanagisawa et al. 2026 abstract, factor ~40 for Hα' });
    expect(r.logMbh).toBe(noDust.logMbh);
    expect(r.flags).toContain('dust_off_by_reading');
    expect(r.flags).not.toContain('no_dust_correction');
  });

  it('divides the Hβ route by 10 in the dense gas reading', () => {
    const hbOnly: ReadingObjectInputs = { id: 'SYN-HB2', z: 5, lines: { hbeta: { fwhmKms: { value: 3000 }, lumErgS: { value: 1e42 } } } };
    const base = under(hbOnly, STANDARD_READING);
    const r = under(hbOnly, DENSE_GAS_READING);
    expect(base.lbolMethod).toBe('hbeta_gh05_bc5100');
    // Yanagisawa et al. 2026 abstract: ~10 for broad Hβ.
    expectClose(base.logLbol! - r.logLbol!, 1, { atol: 1e-12, source: 'Yanagisawa et al. 2026 abstract, factor ~10 for Hβ' });
  });

  it('leaves a continuum L_bol unchanged under the line factors and flags it', () => {
    const s: DeriveSettings = { ...settings, bolometric: 'bc5100' };
    const base = under(hbetaObject, STANDARD_READING, s);
    const r = under(hbetaObject, DENSE_GAS_READING, s);
    expect(r.logLbol).toBe(base.logLbol);
    expect(r.flags).toContain('lbol_route_unchanged');
  });

  it('changes the growth quantities, not the mass, with the reading\'s efficiency', () => {
    const base = under(halphaObject, STANDARD_READING);
    const r = under(halphaObject, custom({ efficiency: 0.2 }));
    expect(r.logMbh).toBe(base.logMbh);
    expect(r.lambdaReqLight!).toBeGreaterThan(base.lambdaReqLight!);
  });

  it('gives every reading the same deviates for the same measurement: switching dust off leaves the width draws, so only the dust moves the mass', () => {
    // Hβ mass on λL5100 with A_V: without dust the mass moves by b·0.4·A_5100-equivalent per draw, the width draws unchanged.
    const withAv: ReadingObjectInputs = { ...hbetaObject, av: { value: 0.5 } };
    const dusty = under(withAv, STANDARD_READING);
    const clean = under(withAv, custom({ dust: 'none' }));
    const shift = dusty.logMbh! - clean.logMbh!;
    expect(shift).toBeGreaterThan(0);
    // An exact A_V shifts λL5100 by the same amount in every draw: the percentiles move with the nominal value.
    for (const p of ['p16', 'p50', 'p84'] as const) expectClose(dusty.pct.logMbh![p] - clean.pct.logMbh![p], shift, { atol: 1e-12, source: 'same deviates, exact A_V' });
  });

  it('gives the same results from one bank of deviates shared by every reading as from a fresh stream per reading', () => {
    const readings = [STANDARD_READING, SCATTERING_CORE_READING, DENSE_GAS_READING, SMALL_BOLOMETRIC_READING, custom({ width: 'deflated', deflation: 2, dust: 'none' })];
    for (const object of [halphaObject, hbetaObject]) {
      const bank = createDrawBank(rng(object.id), settings.draws);
      for (const r of readings) expect(deriveUnderReading(object, settings, r, deriveObject, bank)).toEqual(under(object, r));
    }
  });

  it('does not change the object it is given', () => {
    const copy = structuredClone(halphaObject);
    under(halphaObject, DENSE_GAS_READING);
    under(halphaObject, SCATTERING_CORE_READING);
    expect(halphaObject).toEqual(copy);
  });
});
