import { describe, expect, it } from 'vitest';
import { deriveObject } from '../../../src/core/derive/deriveObject.ts';
import { DEFAULT_SETTINGS } from '../../../src/core/derive/defaultSettings.ts';
import type { DeriveSettings, ObjectInputs } from '../../../src/core/derive/types.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { seedFor } from '../../../src/core/random/seedFor.ts';
import { createDrawBank } from '../../../src/core/random/drawBank.ts';
import { createBuffers, evaluateChain, sampleInputs, type ChainBuffers } from '../../../src/core/derive/evaluateChain.ts';
import { planObject } from '../../../src/core/derive/objectPlan.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// Tests of the chain's steps that a changed or dropped line would get wrong without any
// earlier test noticing (each of these survived mutation testing before it was written).

const settings = (over: Partial<DeriveSettings> = {}): DeriveSettings => ({ ...DEFAULT_SETTINGS, ...over });
const rngFor = (id: string) => createRng(seedFor(DEFAULT_SETTINGS.seed, id));
const lg = Math.log10;

/** Greene & Ho 2005, ApJ 630, 122, eq. 2: L_Hβ = 1.425e42 (λL5100/1e44)^1.133 erg/s, inverted for λL5100. */
const gh05Eq2LogL5100 = (logLHbeta: number): number => 44 + (logLHbeta - lg(1.425e42)) / 1.133;

describe('evaluateChain: an Hβ mass without a measured continuum', () => {
  // The Vestergaard & Peterson 2006 Hβ calibration takes λL5100. With only L(Hβ) measured the
  // chain estimates λL5100 from Greene & Ho 2005 eq. 2 (coefficients from memory; the same
  // 1.425e42 and 1.133 are used by independent public AGN codes) before applying it.
  // The GH05 eq. 2 route is the option `hbeta_without_continuum: gh05_eq2` (the default takes the Hβ-line calibration).
  const vp06 = settings({ calibrations: { ...DEFAULT_SETTINGS.calibrations, hbeta: 'vp06_hbeta' }, hbetaWithoutContinuum: 'gh05_eq2' });
  const hbetaOnly = (id: string, lum: number, fwhm: number): ObjectInputs => ({
    id,
    z: 7,
    lines: { hbeta: { lumErgS: { value: lum }, fwhmKms: { value: fwhm } } },
    av: { value: 0 },
  });

  it('puts λL5100 from Greene & Ho 2005 eq. 2, not L(Hβ) itself, into the Vestergaard & Peterson 2006 equation', () => {
    const d = deriveObject(hbetaOnly('hb-mass', 1e42, 3000), vp06, rngFor('hb-mass'));
    const logL5100 = gh05Eq2LogL5100(42); // 43.8642 (closed form)
    // Vestergaard & Peterson 2006, ApJ 641, 689, eq. 5: log M = 6.91 + 0.5 log(λL5100/1e44) + 2 log(FWHM/1e3)
    const expected = 6.91 + 0.5 * (logL5100 - 44) + 2 * lg(3);
    expectClose(d.logMbh!, expected, { atol: 1e-9, source: 'VP06 eq. 5 with GH05 eq. 2 inverted (from memory), closed form' });
    // Feeding L(Hβ) = 1e42 straight in would give 6.91 + 0.5·(42 − 44) + 2 log 3 = 6.864, 0.93 dex lower.
    expect(Math.abs(d.logMbh! - (6.91 + 0.5 * (42 - 44) + 2 * lg(3)))).toBeGreaterThan(0.9);
    expect(d.mbhMethod).toBe('vp06_hbeta');
    expect(d.flags).toContain('l5100_from_hbeta');
  });

  it('scales the mass as L(Hβ)^(0.5/1.133): ten times the line luminosity adds 0.4413 dex', () => {
    const lo = deriveObject(hbetaOnly('hb-lo', 1e42, 2500), vp06, rngFor('hb-lo'));
    const hi = deriveObject(hbetaOnly('hb-hi', 1e43, 2500), vp06, rngFor('hb-hi'));
    // VP06 slope 0.5 on λL5100 times 1/1.133 from GH05 eq. 2 (from memory): 0.44131 (closed form)
    expectClose(hi.logMbh! - lo.logMbh!, 0.5 / 1.133, { atol: 1e-12, source: 'VP06 eq. 5 ∘ GH05 eq. 2 inverted, closed form' });
  });

  it('checks the calibration range on the estimated λL5100, not on L(Hβ)', () => {
    // L(Hβ) = 1e42 lies below VP06's λL5100 range [1e42.5, 1e46] (from memory, src/core/virial),
    // but the estimated λL5100 = 1e43.86 lies inside it.
    const d = deriveObject(hbetaOnly('hb-range', 1e42, 3000), vp06, rngFor('hb-range'));
    expect(d.flags).not.toContain('calibration_out_of_range');
    // L(Hβ) = 1e40 gives λL5100 = 1e42.10: outside, flagged.
    const faint = deriveObject(hbetaOnly('hb-faint', 1e40, 3000), vp06, rngFor('hb-faint'));
    expect(faint.flags).toContain('calibration_out_of_range');
  });

  it('draws the mass around the same estimated λL5100: the median of the draws lies on the nominal mass', () => {
    const draws = 20000;
    const d = deriveObject(hbetaOnly('hb-draws', 1e42, 3000), settings({ ...vp06, draws }), rngFor('hb-draws'));
    // Only the calibration's intrinsic scatter (0.43 dex, VP06, from memory) varies, so the draws are
    // normal around the nominal mass; the median's standard error is 1.2533 σ/√N = 0.0038 dex; 4 of them.
    expectClose(d.pct.logMbh!.p50, d.logMbh!, { atol: (4 * 1.2533 * 0.43) / Math.sqrt(draws), source: 'closed form: median of a normal, 4 standard errors' });
  });
});

describe('evaluateChain: A_V draws below zero', () => {
  // Calzetti et al. 2000 (ApJ 533, 682) eq. 4, 0.63–2.20 µm: k(λ) = 2.659(−1.857 + 1.040/λ) + R_V with
  // R_V = 4.05, at the vacuum Hα wavelength 0.656461 µm (src/core/dust/lineWavelengths): k(Hα) = 3.3259
  // (computed; shared/reference/published-checks.md gives 3.3259).
  const kHa = 2.659 * (-1.857 + 1.04 / 0.656461) + 4.05;
  const rv = 4.05;
  /** GH05 eq. 1 (L_Hα = 5.25e42 (λL5100/1e44)^1.157) inverted, times BC5100 = 10.33 (Richards et al. 2006). */
  const logLbolFromLogLHa = (logLHa: number): number => 44 + (logLHa - lg(5.25e42)) / 1.157 + lg(10.33);

  it('takes a negative central A_V as no attenuation, never as a brightening', () => {
    const d = deriveObject({ id: 'neg-av', z: 5, lines: { halpha: { lumErgS: { value: 1e43 }, fwhmKms: { value: 2000 } } }, av: { value: -0.3 } }, settings(), rngFor('neg-av'));
    expectClose(d.logLum.halpha!, 43, { atol: 1e-12, source: 'closed form: A_V clipped at 0 leaves L unchanged' });
  });

  it('clips the A_V draws at zero: with A_V = 0 ± 1 the 16th percentile of L_bol is the unattenuated value and the 84th follows A_V = 0.9945', () => {
    const draws = 20000;
    const inputs: ObjectInputs = {
      id: 'av-clip',
      z: 5,
      lines: { halpha: { lumErgS: { value: 1e43 }, fwhmKms: { value: 2000 } } },
      av: { value: 0, errLo: 1, errHi: 1 },
    };
    // BC5100 = 10.33 (Richards et al. 2006) set explicitly, as the closed form above uses it.
    const d = deriveObject(inputs, settings({ draws, bc5100: 10.33 }), rngFor('av-clip'));
    const unattenuated = logLbolFromLogLHa(43);
    expectClose(d.logLbol!, unattenuated, { atol: 1e-9, source: 'GH05 eq. 1 inverted × 10.33, closed form' });
    // Half of the draws of A_V ~ N(0, 1) are below 0 and clip to 0, so the lower 50 % of L_bol sits
    // exactly at the unattenuated value.
    expectClose(d.pct.logLbol!.p16, unattenuated, { atol: 1e-9, source: 'closed form: P(A_V ≤ 0) = 0.5 > 0.16' });
    // The 84th percentile of max(0, A_V) is the normal quantile Φ⁻¹(0.84) = 0.994458 (closed form).
    // Its standard error at N = 2e4 is sqrt(0.16·0.84/N)/φ(0.9945) = 0.0107 mag; 4 of them, times the
    // slope 0.4 k(Hα)/R_V/1.157 = 0.284 dex per mag.
    const dexPerMag = (0.4 * kHa) / rv / 1.157;
    expectClose(d.pct.logLbol!.p84, logLbolFromLogLHa(43 + (0.4 * kHa * 0.994458) / rv), {
      atol: 4 * 0.0107 * dexPerMag,
      source: 'closed form: Calzetti 2000 k(Hα), normal 84th percentile, 4 standard errors',
    });
  });
});

describe('sampleInputs: every measurement draws from its own role', () => {
  it('draws the same widths, fluxes and host masses whether or not the object has a dust measurement', () => {
    const base: ObjectInputs = {
      id: 'ROLE-1',
      z: 6,
      lines: { halpha: { fluxCgs: { value: 2e-18, errLo: 3e-19, errHi: 3e-19 }, fwhmKms: { value: 2200, errLo: 300, errHi: 400 } } },
      logMstar: { value: 9, errLo: 0.3, errHi: 0.3 },
      mu: { value: 2, errLo: 0.2, errHi: 0.2 },
    };
    const s = settings({ draws: 500 });
    const sample = (inputs: ObjectInputs) => {
      const b = createBuffers(500);
      sampleInputs(planObject(inputs, s), s, createDrawBank(rngFor(inputs.id), 500), b);
      return b;
    };
    const without = sample(base);
    const withDust = sample({ ...base, av: { value: 0.4, errLo: 0.2, errHi: 0.2 } });
    expect([...withDust.logFwhm]).toEqual([...without.logFwhm]);
    expect([...(withDust.logL[0] as Float64Array)]).toEqual([...(without.logL[0] as Float64Array)]);
    expect([...withDust.x]).toEqual([...without.x]);
    expect([...withDust.logMu]).toEqual([...without.logMu]);
    expect([...withDust.scatter]).toEqual([...without.scatter]);
    // … while the dust itself is drawn: E(B−V) varies from draw to draw.
    expect(new Set(withDust.ebv).size).toBeGreaterThan(400);
    expect(new Set(without.ebv)).toEqual(new Set([0]));
  });
});

describe('evaluateChain over many draws', () => {
  // Internal check, no external values: the chain works draw by draw, so each draw of a run over n
  // draws must equal the chain run over that draw alone. The loops go four draws at a time, so
  // counts that leave one to three over are the ones to check.
  const object: ObjectInputs = {
    id: 'steps-of-four',
    z: 6.2,
    lines: { halpha: { fluxCgs: { value: 2e-18, errLo: 3e-19, errHi: 3e-19 }, fwhmKms: { value: 1800, errLo: 200, errHi: 260 } } },
    mu: { value: 1.8, errLo: 0.2, errHi: 0.2 },
    av: { value: 0.6, errLo: 0.2, errHi: 0.2 },
    logMstar: { value: 9.2, errLo: 0.3, errHi: 0.3 },
  };
  const s = settings();
  const plan = planObject(object, s);
  const copyDraw = (from: ChainBuffers, k: number, to: ChainBuffers): void => {
    to.logMu[0] = from.logMu[k] as number;
    to.ebv[0] = from.ebv[k] as number;
    from.logL.forEach((a, i) => ((to.logL[i] as Float64Array)[0] = a[k] as number));
    to.logFwhm[0] = from.logFwhm[k] as number;
    to.x[0] = from.x[k] as number;
    to.scatter[0] = from.scatter[k] as number;
    to.localScatter[0] = from.localScatter[k] as number;
  };

  it('gives every draw, the last ones of a count not a multiple of four included, exactly what the chain gives that draw alone', () => {
    for (const n of [1, 2, 3, 5, 6, 7, 1001, 1002, 1003]) {
      const bank = createDrawBank(rngFor(`steps-${n}`), n);
      const b = createBuffers(n);
      sampleInputs(plan, s, bank, b);
      const inputs = createBuffers(n);
      for (let k = 0; k < n; k++) copyDraw(b, k, inputs);
      const before = createBuffers(n);
      (['logMu', 'ebv', 'logFwhm', 'x', 'scatter', 'localScatter'] as const).forEach((key) => before[key].set(b[key]));
      b.logL.forEach((a, i) => (before.logL[i] as Float64Array).set(a));
      evaluateChain(plan, s, b, false);
      const one = createBuffers(1);
      for (let k = 0; k < n; k++) {
        copyDraw(before, k, one);
        evaluateChain(plan, s, one, false);
        b.out.forEach((a, slot) => expect(Object.is(a[k], (one.out[slot] as Float64Array)[0]), `n = ${n}, draw ${k}, output ${slot}`).toBe(true));
        for (const i of plan.used) expect(Object.is((b.logL[i] as Float64Array)[k], (one.logL[i] as Float64Array)[0]), `n = ${n}, draw ${k}, source ${i}`).toBe(true);
      }
    }
  });

  it('scales the calibration\'s and the local relation\'s deviates by their scatter for every draw', () => {
    for (const n of [3, 1003]) {
      const bank = createDrawBank(rngFor(`scatter-${n}`), n);
      const b = createBuffers(n);
      sampleInputs(plan, s, bank, b);
      const zm = bank.normals('mass_scatter');
      const zl = bank.normals('local_scatter');
      for (let k = 0; k < n; k++) {
        expect(b.scatter[k], `n = ${n}, draw ${k}`).toBe(plan.mass!.cal.scatterDex * (zm[k] as number));
        expect(b.localScatter[k], `n = ${n}, draw ${k}`).toBe(plan.local!.rel.scatterDex * (zl[k] as number));
      }
    }
  });
});
