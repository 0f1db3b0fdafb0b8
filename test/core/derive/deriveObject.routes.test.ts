import { describe, expect, it } from 'vitest';
import { deriveObject } from '../../../src/core/derive/deriveObject.ts';
import { DEFAULT_SETTINGS } from '../../../src/core/derive/defaultSettings.ts';
import type { DeriveSettings, ObjectInputs } from '../../../src/core/derive/types.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { createDrawBank } from '../../../src/core/random/drawBank.ts';
import { seedFor } from '../../../src/core/random/seedFor.ts';
import { ebvFromBalmerDecrement } from '../../../src/core/dust/balmerDecrement.ts';
import { kLambda } from '../../../src/core/dust/kLambda.ts';
import { lineWavelengthAngstrom } from '../../../src/core/dust/lineWavelengths.ts';
import { normalCdf } from '../random/normalCdf.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// Routes and flags of the plan (which luminosity gives L_bol, which line the mass, how dust is
// corrected) and the parts of the Monte Carlo the other derive tests leave unchecked.

const settings = (over: Partial<DeriveSettings> = {}): DeriveSettings => ({ ...DEFAULT_SETTINGS, draws: 400, ...over });
const derive = (o: ObjectInputs, s = settings()) => deriveObject(o, s, createRng(seedFor(s.seed, o.id)));
const lg = Math.log10;
/** Greene & Ho 2005, ApJ 630, 122, eq. 1 inverted (L_Hα = 5.25e42 (L5100/1e44)^1.157), then × BC5100 (log). */
const lbolFromHalpha = (logLha: number, bc = 9.26) => 44 + (logLha - lg(5.25e42)) / 1.157 + lg(bc);
/** Φ⁻¹ by bisection on the Abramowitz & Stegun 26.2.17 Φ (|error| < 7.5e-8), closed form. */
const probit = (p: number) => {
  let a = -8;
  let b = 8;
  for (let i = 0; i < 80; i++) {
    const m = (a + b) / 2;
    if (normalCdf(m) < p) a = m;
    else b = m;
  }
  return (a + b) / 2;
};

describe('the order of the bolometric routes', () => {
  const haAnd5100: ObjectInputs = { id: 'ORDER', z: 6, lines: { halpha: { lumErgS: { value: 1e43 }, fwhmKms: { value: 2000 } } }, lamL5100: { value: 3e44 }, av: { value: 0 } };

  it('takes the configured continuum correction before broad Hα, without a fallback flag', () => {
    const d = derive(haAnd5100, settings({ bolometric: 'bc5100' }));
    expect(d.lbolMethod).toBe('bc5100');
    // Shen et al. 2011, ApJS 194, 45: BC5100 = 9.26, closed form.
    expectClose(d.logLbol!, lg(3e44) + lg(9.26), { atol: 1e-12, source: 'BC5100 = 9.26 (Shen et al. 2011), closed form' });
    expect(d.flags).not.toContain('lbol_fallback');
    expect(d.flags).not.toContain('measured_over_limit');
  });

  it('takes broad Hα first under the default method, and falls back to it from a continuum method without its band', () => {
    const def = derive(haAnd5100);
    expect(def.lbolMethod).toBe('halpha_gh05_bc5100');
    expectClose(def.logLbol!, lbolFromHalpha(43), { atol: 1e-12, source: 'Greene & Ho 2005 eq. 1 inverted × 9.26 (Shen et al. 2011), closed form' });
    expect(def.flags).not.toContain('lbol_fallback');
    const haOnly = { ...haAnd5100, id: 'HA-ONLY', lamL5100: undefined };
    const d = derive(haOnly, settings({ bolometric: 'bc3000' }));
    expect(d.lbolMethod).toBe('halpha_gh05_bc5100');
    expect(d.flags).toContain('lbol_fallback');
  });

  it('uses the bolometric correction of the settings on the continuum route', () => {
    const d = derive({ id: 'BC', z: 6, lines: {}, lamL5100: { value: 1e44 } }, settings({ bolometric: 'bc5100', bc5100: 10.33 }));
    // BC5100 = 10.33 as the recent Hα papers use (Richards et al. 2006), closed form.
    expectClose(d.logLbol!, 44 + lg(10.33), { atol: 1e-12, source: 'BC5100 = 10.33 (Richards et al. 2006), closed form' });
  });

  it("applies Netzer 2019's luminosity-dependent correction k = 40 (λL5100/1e42)^−0.2 and names it with the band", () => {
    const d = derive({ id: 'N19', z: 6, lines: {}, lamL5100: { value: 1e45 } }, settings({ bolometric: 'netzer19' }));
    expect(d.lbolMethod).toBe('netzer19_l5100');
    expect(d.flags).not.toContain('lbol_fallback');
    // Netzer 2019, MNRAS 488, 5185, Table 1, 5100 Å: c = 40, d = −0.2 (published-checks.md; from a code transcription), closed form.
    expectClose(d.logLbol!, 45 + lg(40) - 0.2 * 3, { atol: 1e-12, source: 'Netzer 2019 Table 1 (5100 Å), closed form' });
    const uv = derive({ id: 'N19-UV', z: 6, lines: {}, lamL3000: { value: 1e45 } }, settings({ bolometric: 'netzer19' }));
    expect(uv.lbolMethod).toBe('netzer19_l3000');
    // Netzer 2019 Table 1, 3000 Å: c = 19, d = −0.2 (published-checks.md; from a code transcription).
    expectClose(uv.logLbol!, 45 + lg(19) - 0.2 * 3, { atol: 1e-12, source: 'Netzer 2019 Table 1 (3000 Å), closed form' });
  });

  it('says so when nothing gives L_bol', () => {
    const d = derive({ id: 'NO-LBOL', z: 6, lines: { mgii: { fwhmKms: { value: 3000 }, lumErgS: { value: 1e42 } } } });
    expect(d.logLbol).toBeNull();
    expect(d.lbolMethod).toBeNull();
    expect(d.flags).toContain('no_lbol');
    expect(d.flags).not.toContain('lbol_fallback');
  });
});

describe('a measurement before a limit, flagged where it happened', () => {
  it('flags a mass taken past an upper-limit Hα flux even when L_bol never met the limit', () => {
    const o: ObjectInputs = {
      id: 'MOL-MASS', z: 6,
      lines: { halpha: { fwhmKms: { value: 2000 }, fluxCgs: { value: 5e-18 }, fluxIsLimit: true }, hbeta: { fwhmKms: { value: 2200 } } },
      lamL5100: { value: 1e44 }, av: { value: 0 },
    };
    const d = derive(o, settings({ bolometric: 'bc5100' }));
    expect(d.mbhMethod).toBe('vp06_hbeta');
    expect(d.lbolMethod).toBe('bc5100');
    expect(d.flags).toContain('measured_over_limit');
  });

  it('flags L_bol taken past an upper-limit Hα flux even when the mass never met it', () => {
    const o: ObjectInputs = {
      id: 'MOL-LBOL', z: 6,
      lines: { halpha: { fluxCgs: { value: 5e-18 }, fluxIsLimit: true }, hbeta: { fwhmKms: { value: 2200 } } },
      lamL5100: { value: 1e44 }, av: { value: 0 },
    };
    const d = derive(o);
    expect(d.mbhMethod).toBe('vp06_hbeta');
    expect(d.lbolMethod).toBe('bc5100');
    expect(d.flags).toContain('measured_over_limit');
  });

  it('does not flag an object with nothing but measurements', () => {
    const d = derive({ id: 'PLAIN', z: 6, lines: { halpha: { lumErgS: { value: 1e43 }, fwhmKms: { value: 2000 } } }, av: { value: 0 } });
    expect(d.flags).not.toContain('measured_over_limit');
    expect(d.flags).not.toContain('l5100_from_hbeta');
  });
});

describe('the Hβ mass through the Greene & Ho 2005 eq. 2 option', () => {
  it('flags λL5100 from L(Hβ) when only the mass used it (L_bol from broad Hα)', () => {
    const o: ObjectInputs = { id: 'GH05-MASS', z: 6, lines: { hbeta: { fwhmKms: { value: 3000 }, lumErgS: { value: 1e42 } }, halpha: { lumErgS: { value: 3e42 } } }, av: { value: 0 } };
    const d = derive(o, settings({ hbetaWithoutContinuum: 'gh05_eq2', linePriority: ['hbeta', 'halpha'] }));
    expect(d.mbhMethod).toBe('vp06_hbeta');
    expect(d.lbolMethod).toBe('halpha_gh05_bc5100');
    expect(d.flags).toContain('l5100_from_hbeta');
  });

  it('never puts a line other than Hβ on the continuum of L(Hβ): an Mg II width without λL3000 gives no mass', () => {
    const o: ObjectInputs = { id: 'MG-NO3000', z: 6, lines: { mgii: { fwhmKms: { value: 3000 } }, hbeta: { lumErgS: { value: 1e42 } } }, av: { value: 0 } };
    const d = derive(o, settings({ hbetaWithoutContinuum: 'gh05_eq2', linePriority: ['mgii'] }));
    expect(d.logMbh).toBeNull();
    expect(d.flags).toContain('no_mass');
  });

  it('never lends L(Hβ) to another line\'s width, even under a calibration on λL5100', () => {
    // An Hα width configured with the Hβ–λL5100 calibration and no continuum: no mass, with either Hβ option.
    const o: ObjectInputs = { id: 'HA-ON-5100', z: 6, lines: { halpha: { fwhmKms: { value: 2000 } }, hbeta: { lumErgS: { value: 1e42 } } }, av: { value: 0 } };
    for (const hbetaWithoutContinuum of ['gh05_eq2', 'line'] as const) {
      const d = derive(o, settings({ hbetaWithoutContinuum, linePriority: ['halpha'], calibrations: { ...DEFAULT_SETTINGS.calibrations, halpha: 'vp06_hbeta' } }));
      expect(d.logMbh).toBeNull();
      expect(d.flags).toContain('no_mass');
    }
  });
});

describe('dust from a Balmer decrement', () => {
  it('corrects the luminosities with E(B−V) from the decrement (Calzetti et al. 2000, intrinsic 2.86)', () => {
    const d = derive({ id: 'BD', z: 6, lines: { halpha: { lumErgS: { value: 1e43 }, fwhmKms: { value: 2000 } } }, balmerDecrement: { value: 5, errLo: 0.5 } });
    expect(d.flags).not.toContain('balmer_from_line_fluxes');
    // Closed form: E(B−V) = 2.5/(k(Hβ) − k(Hα)) log10(5/2.86) (Calzetti et al. 2000, ApJ 533, 682; case B 2.86, Osterbrock & Ferland 2006).
    const k = (line: 'halpha' | 'hbeta') => kLambda('calzetti00', lineWavelengthAngstrom(line));
    const ebv = (2.5 / (k('hbeta') - k('halpha'))) * lg(5 / 2.86);
    expectClose(d.logLum.halpha!, 43 + 0.4 * k('halpha') * ebv, { atol: 1e-9, source: 'Calzetti et al. 2000 with the case-B decrement 2.86, closed form' });
    // The draws carry the decrement's error: L_bol's interval has a width.
    expect(d.pct.logLbol!.p84 - d.pct.logLbol!.p16).toBeGreaterThan(0.01);
  });

  it('flags a decrement below the intrinsic 2.86, and not one equal to it', () => {
    const o = (id: string, v: number): ObjectInputs => ({ id, z: 6, lines: { halpha: { lumErgS: { value: 1e43 }, fwhmKms: { value: 2000 } } }, balmerDecrement: { value: v } });
    expect(derive(o('BD-LOW', 2.5)).flags).toContain('balmer_below_intrinsic');
    expect(derive(o('BD-EQ', DEFAULT_SETTINGS.intrinsicBalmer)).flags).not.toContain('balmer_below_intrinsic');
    expect(derive(o('BD-HIGH', 4)).flags).not.toContain('balmer_below_intrinsic');
  });

  it('forms the decrement from the line fluxes only when both are measured fluxes', () => {
    const base = { halpha: { fluxCgs: { value: 4e-17, errLo: 4e-18 }, fwhmKms: { value: 2000 } }, hbeta: { fluxCgs: { value: 1e-17, errLo: 1e-18 } } };
    const bd = { value: 4, errLo: 0.4 };
    expect(derive({ id: 'F-BOTH', z: 6, lines: base, balmerDecrement: bd }).flags).toContain('balmer_from_line_fluxes');
    const haLum = { ...base, halpha: { lumErgS: { value: 4e43, errLo: 4e42 }, fwhmKms: { value: 2000 } } };
    expect(derive({ id: 'F-LUM', z: 6, lines: haLum, balmerDecrement: bd }).flags).not.toContain('balmer_from_line_fluxes');
    // A flux over a luminosity is not a decrement, even when the numbers' ratio is 4.
    const hbLum = { ...base, hbeta: { lumErgS: { value: 1e-17, errLo: 1e-18 } } };
    expect(derive({ id: 'F-HBLUM', z: 6, lines: hbLum, balmerDecrement: bd }).flags).not.toContain('balmer_from_line_fluxes');
    const haLumHbFlux = { halpha: { lumErgS: { value: 4e-17, errLo: 4e-18 }, fwhmKms: { value: 2000 } }, hbeta: base.hbeta };
    expect(derive({ id: 'F-HALUM', z: 6, lines: haLumHbFlux, balmerDecrement: bd }).flags).not.toContain('balmer_from_line_fluxes');
    const hbLimit = { ...base, hbeta: { fluxCgs: { value: 1e-17 }, fluxIsLimit: true } };
    expect(derive({ id: 'F-LIM', z: 6, lines: hbLimit, balmerDecrement: bd }).flags).not.toContain('balmer_from_line_fluxes');
    const haLimit = { ...base, halpha: { fluxCgs: { value: 4e-17 }, fluxIsLimit: true, fwhmKms: { value: 2000 } } };
    expect(derive({ id: 'F-HALIM', z: 6, lines: haLimit, balmerDecrement: bd }).flags).not.toContain('balmer_from_line_fluxes');
    expect(derive({ id: 'F-NOHB', z: 6, lines: { halpha: base.halpha }, balmerDecrement: bd }).flags).not.toContain('balmer_from_line_fluxes');
  });
});

describe('the Monte Carlo of single measurements', () => {
  it('draws an asymmetric luminosity error as a split normal: its median lies above the value when the upper error is larger', () => {
    // Split normal (a fraction σlo/(σlo+σhi) = 0.25 below the value): the median is L + σhi·t with
    // 0.25 + 0.75 (2Φ(t) − 1) = 0.5, i.e. Φ(t) = 2/3 (closed form). L_bol is monotone in L.
    const o: ObjectInputs = { id: 'SPLIT', z: 6, lines: { halpha: { lumErgS: { value: 1e43, errLo: 1e42, errHi: 3e42 }, fwhmKms: { value: 2000 } } }, av: { value: 0 } };
    const d = derive(o, settings({ draws: 20000 }));
    const t = probit(2 / 3);
    // 20000 draws: the sample median's spread is below 1e-3 dex here; 4e-3 dex allowed.
    expectClose(d.pct.logLbol!.p50, lbolFromHalpha(lg(1e43 + 3e42 * t)), { atol: 4e-3, source: 'split-normal median, closed form' });
  });

  it('draws a magnification with an error: L_bol spreads as L/μ', () => {
    // μ = 10 ± 1: the 84th percentile of L/μ is at μ's 16th percentile, 10 − 0.9945 (Φ⁻¹(0.84), closed form).
    const o: ObjectInputs = { id: 'MU', z: 6, lines: { halpha: { lumErgS: { value: 1e43 }, fwhmKms: { value: 2000 } } }, av: { value: 0 }, mu: { value: 10, errLo: 1 } };
    const d = derive(o, settings({ draws: 20000 }));
    expectClose(d.logLbol!, lbolFromHalpha(42), { atol: 1e-12, source: 'Greene & Ho 2005 eq. 1 inverted × 9.26 at L/μ, closed form' });
    expectClose(d.pct.logLbol!.p84, lbolFromHalpha(43 - lg(10 - probit(0.84))), { atol: 4e-3, source: 'quantile of L/μ with μ normal, closed form' });
    // A one-sided error (only above the value) is drawn too: every draw of L/μ lies below the nominal value, so the
    // nominal L_bol is above its own 84th percentile and left empty.
    const up = derive({ ...o, id: 'MU-UP', mu: { value: 10, errLo: 0, errHi: 1 } }, settings({ draws: 20000 }));
    expect(up.logLbol).toBeNull();
    expect(up.flags).toContain('implausible');
  });

  it('keeps the log10 of each measurement apart in one bank: widths of 2000 and 4000 km/s, or errors of 5 and 20 %, are not confused', () => {
    const bank = createDrawBank(createRng(99), 4000);
    const s = settings({ draws: 4000 });
    const o = (fwhm: number, err: number): ObjectInputs => ({ id: 'BANK', z: 6, lines: { halpha: { lumErgS: { value: 1e43, errLo: err * 1e43 }, fwhmKms: { value: fwhm, errLo: 100 } } }, av: { value: 0 } });
    const a = deriveObject(o(2000, 0.05), s, bank);
    const b = deriveObject(o(4000, 0.05), s, bank);
    const c = deriveObject(o(2000, 0.2), s, bank);
    // Reines & Volonteri 2015 eq. 5: twice the width adds 2.06 log10 2 to the mass; the nominal values say so, and the medians must follow
    // (the 100 km/s error is 5 % of one width and 2.5 % of the other: the medians shift by 2.06 log10 2 to within 0.02 dex).
    expectClose(b.pct.logMbh!.p50 - a.pct.logMbh!.p50, 2.06 * lg(2), { atol: 0.02, source: 'Reines & Volonteri 2015 eq. 5, closed form' });
    // L_bol's 16–84 half-width from a 5 % and a 20 % luminosity error: about (1/1.157) log10(1 ± 0.9945 σ/L) (closed form).
    const half = (p: { p16: number; p84: number }) => (p.p84 - p.p16) / 2;
    const expected = (f: number) => (lg(1 + 0.9945 * f) - lg(1 - 0.9945 * f)) / 2 / 1.157;
    expectClose(half(a.pct.logLbol!), expected(0.05), { rtol: 0.1, source: 'first-order propagation through Greene & Ho 2005 eq. 1, closed form' });
    expectClose(half(c.pct.logLbol!), expected(0.2), { rtol: 0.1, source: 'first-order propagation through Greene & Ho 2005 eq. 1, closed form' });
  });

  it('keeps asymmetric errors apart in one bank: the lower error sets the 16th percentile, the upper the 84th', () => {
    // Split normal with P(below) = σlo/(σlo+σhi) (closed form): the 16th percentile is L − σlo·s with
    // (σlo/(σlo+σhi))·2(1 − Φ(s)) = 0.16; the 84th is L + σhi·t with P(below) + (σhi/(σlo+σhi))(2Φ(t) − 1) = 0.84.
    const bank = createDrawBank(createRng(7), 8000);
    const s = settings({ draws: 8000 });
    const o = (lo: number, hi: number): ObjectInputs => ({ id: 'ASYM', z: 6, lines: { halpha: { lumErgS: { value: 1e43, errLo: lo, errHi: hi }, fwhmKms: { value: 2000 } } }, av: { value: 0 } });
    const p16 = (lo: number, hi: number) => 1e43 - lo * probit(1 - 0.08 * (lo + hi) / lo);
    const p84 = (lo: number, hi: number) => 1e43 + hi * probit(0.5 + (0.84 - lo / (lo + hi)) * (lo + hi) / hi / 2);
    const cases = [[1e42, 3e42], [2e42, 3e42], [1e42, 1e42]] as const;
    const got = cases.map(([lo, hi]) => deriveObject(o(lo, hi), s, bank).pct.logLbol!);
    cases.forEach(([lo, hi], k) => {
      // 8000 draws: the sample percentiles' spread is about 1e-3 dex here; 5e-3 allowed.
      expectClose(got[k]!.p16, lbolFromHalpha(lg(p16(lo, hi))), { atol: 5e-3, source: 'split-normal 16th percentile, closed form' });
      expectClose(got[k]!.p84, lbolFromHalpha(lg(p84(lo, hi))), { atol: 5e-3, source: 'split-normal 84th percentile, closed form' });
    });
  });

  it('needs 100 draws for the interval test: at exactly 100 a luminosity at S/N 0.1 is judged implausible', () => {
    // Truncated at zero, (Φ(0) − Φ(−0.1))/(1 − Φ(−0.1)) = 0.074 of the draws lie below the value (closed form): the nominal L_bol is below p16.
    const o: ObjectInputs = { id: 'SNR100', z: 5, lines: { halpha: { lumErgS: { value: 1e43, errLo: 1e44 }, fwhmKms: { value: 2000 } } }, av: { value: 0 } };
    const d = derive(o, settings({ draws: 100 }));
    expect(d.logLbol).toBeNull();
    expect(d.flags).toContain('implausible');
  });
});

describe('values left empty, and what rests on them', () => {
  it('leaves a mass above 1e12 Msun empty and flags it, with the Eddington ratio, while L_bol stays', () => {
    // A width of 1e6 km/s (m/s read as km/s): Reines & Volonteri 2015 eq. 5 gives 13.2 > 12 (closed form).
    const d = derive({ id: 'WIDE', z: 5, lines: { halpha: { lumErgS: { value: 1e43, errLo: 1e42 }, fwhmKms: { value: 1e6, errLo: 1e5 } } }, av: { value: 0 }, logMstar: { value: 10, errLo: 0.2 } });
    expect(d.flags).toContain('implausible');
    expect(d.logMbh).toBeNull();
    expectClose(d.logLbol!, lbolFromHalpha(43), { atol: 1e-12, source: 'Greene & Ho 2005 eq. 1 inverted × 9.26, closed form' });
    expect(d.logEddRatio).toBeNull();
    expect(d.pct.logEddRatio).toBeNull();
    expect(d.pSuperEddington).toBeNull();
    expect(d.deltaLogMbhLocal).toBeNull();
    expect(d.lambdaReqLight).toBeNull();
  });

  it('does not mark a bound that was left empty as a bound', () => {
    // An upper-limit flux of 5 erg/s/cm² (1e-18 units read as cgs): mass and L_bol bounds far outside the physical ranges.
    const d = derive({ id: 'BIG-LIMIT', z: 6, lines: { halpha: { fluxCgs: { value: 5 }, fluxIsLimit: true, fwhmKms: { value: 2000 } } }, av: { value: 0 }, logMstar: { value: 10 } });
    expect(d.flags).toEqual(expect.arrayContaining(['implausible', 'mbh_upper_limit', 'lbol_upper_limit']));
    expect(d.isLimit).toEqual({ logMbh: false, logLbol: false, logEddRatio: false, logMseed: false, lambdaReq: false, deltaLogMbhLocal: false });
  });

  it('gives an object without a mass no growth rates', () => {
    const d = derive({ id: 'NOMASS-GROWTH', z: 6, lines: { halpha: { lumErgS: { value: 1e43 } } }, av: { value: 0 } });
    expect(d.lambdaReqLight).toBeNull();
    expect(d.lambdaReqHeavy).toBeNull();
  });

  it('gives an upper-limit mass above the seed redshift no seed-mass percentiles and no growth-rate bound', () => {
    const d = derive({ id: 'LIM-Z25', z: 25, lines: { halpha: { fluxCgs: { value: 3e-19 }, fluxIsLimit: true, fwhmKms: { value: 2000 } } }, av: { value: 0 } });
    expect(d.isLimit.logMbh).toBe(true);
    expect(d.isLimit.lambdaReq).toBe(false);
    const m = derive({ id: 'MEAS-Z25', z: 25, lines: { halpha: { lumErgS: { value: 1e43, errLo: 1e42 }, fwhmKms: { value: 2000 } } }, av: { value: 0 } });
    expect(m.pct.logMbh).not.toBeNull();
    expect(m.pct.logMseed).toBeNull();
  });
});

describe('the outputs themselves', () => {
  it('reports the line luminosities only, not the continuum bands, under logLum', () => {
    const d = derive({ id: 'KEYS', z: 6, lines: { halpha: { lumErgS: { value: 1e43 }, fwhmKms: { value: 2000 } } }, lamL5100: { value: 1e44 }, lamL3000: { value: 2e44 }, av: { value: 0 } });
    expect(Object.keys(d.logLum)).toEqual(['halpha']);
  });

  it('lists the flags in alphabetical order', () => {
    const d = derive({ id: 'ORDERED', z: 25, lines: { halpha: { lumErgS: { value: 1e43, errLo: 8e42 }, fwhmKms: { value: 2000 } } }, mu: { value: 3 } });
    expect(d.flags.length).toBeGreaterThan(3);
    expect(d.flags).toEqual([...d.flags].sort());
  });

  it('flags S/N exactly 2 as enough, in a luminosity and in a width', () => {
    const d = derive({ id: 'SNR2', z: 6, lines: { halpha: { lumErgS: { value: 1e43, errLo: 5e42 }, fwhmKms: { value: 2000, errLo: 1000 } } }, av: { value: 0 } });
    expect(d.flags).not.toContain('low_snr');
  });
});
