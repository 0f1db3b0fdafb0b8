import { describe, expect, it } from 'vitest';
import { deriveObject } from '../../../src/core/derive/deriveObject.ts';
import { DEFAULT_SETTINGS } from '../../../src/core/derive/defaultSettings.ts';
import type { DeriveSettings, ObjectInputs } from '../../../src/core/derive/types.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { seedFor } from '../../../src/core/random/seedFor.ts';
import { kLambda } from '../../../src/core/dust/kLambda.ts';
import { lineWavelengthAngstrom } from '../../../src/core/dust/lineWavelengths.ts';
import { getCalibration } from '../../../src/core/virial/calibrations.ts';
import { getCosmology } from '../../../src/core/cosmology/getCosmology.ts';
import { logMassAfter } from '../../../src/core/growth/salpeterGrowth.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const settings = (over: Partial<DeriveSettings> = {}): DeriveSettings => ({ ...DEFAULT_SETTINGS, ...over });
const rngFor = (id: string, s = DEFAULT_SETTINGS.seed) => createRng(seedFor(s, id));

/** Standard normal CDF by the Abramowitz & Stegun 26.2.17 rational approximation (|error| < 7.5e-8). */
function normalCdf(x: number): number {
  const t = 1 / (1 + 0.2316419 * Math.abs(x));
  const d = 0.3989422804014327 * Math.exp(-0.5 * x * x);
  const p = d * t * (0.31938153 + t * (-0.356563782 + t * (1.781477937 + t * (-1.821255978 + t * 1.330274429))));
  return x >= 0 ? 1 - p : p;
}

/** A broad-Hα object given by luminosity, no errors, no dust, no lensing. */
const haObject = (id: string, lum: number, fwhm: number, extra: Partial<ObjectInputs> = {}): ObjectInputs => ({
  id,
  z: 5,
  lines: { halpha: { lumErgS: { value: lum }, fwhmKms: { value: fwhm } } },
  av: { value: 0 },
  ...extra,
});

describe('deriveObject against published high-redshift values', () => {
  it('recomputes the Matthee et al. 2024 mass and L_bol of GOODS-N-4014 from its published inputs', () => {
    // Matthee et al. 2024 multiply by BC5100 = 10.33 (Richards et al. 2006), not the default 9.26.
    const d = deriveObject(haObject('g', 4.6e42, 2103), settings({ bc5100: 10.33 }), rngFor('g'));
    // Matthee et al. 2024, ApJ 963, 129, Table 2: log M = 7.58 (two decimals published)
    expectClose(d.logMbh!, 7.58, { atol: 0.005, source: 'Matthee et al. 2024 ApJ 963, 129, GOODS-N-4014, RV15 with ε = 1.075' });
    // Same table: L_bol = 9.3e44 (two digits); the rounded input 4.6e42 gives 9.22e44, within the two roundings (1.5 %)
    expectClose(10 ** d.logLbol!, 9.3e44, { rtol: 0.015, source: 'Matthee et al. 2024 ApJ 963, 129, GOODS-N-4014 L_bol' });
    expect(d.mbhMethod).toBe('rv15_halpha');
    expect(d.lbolMethod).toBe('halpha_gh05_bc5100');
  });

  it('recomputes the Harikane et al. 2023 mass of CEERS-01244 with Greene & Ho 2005 eq. 6', () => {
    const d = deriveObject(haObject('c', 7.7e42, 2228), settings({ calibrations: { ...DEFAULT_SETTINGS.calibrations, halpha: 'gh05_halpha' } }), rngFor('c'));
    // Harikane et al. 2023 ApJ 959, 39, Table: M = 3.2e7 Msun (two digits)
    expectClose(10 ** d.logMbh!, 3.2e7, { rtol: 0.016, source: 'Harikane et al. 2023 ApJ 959, 39, CEERS-01244' });
  });
});

describe('deriveObject corrections', () => {
  it('divides line luminosities by the magnification', () => {
    const plain = deriveObject(haObject('m', 1e43, 2000), settings(), rngFor('m'));
    const lensed = deriveObject(haObject('m', 1e43, 2000, { mu: { value: 10 } }), settings(), rngFor('m'));
    expectClose(lensed.logLum.halpha!, plain.logLum.halpha! - 1, { atol: 1e-12, source: 'closed form: log10(L/μ) with μ = 10' });
    expect(lensed.flags).toContain('lensed');
  });

  it('corrects for dust with A_λ = k(λ) A_V / R_V of the Calzetti et al. 2000 curve', () => {
    const d = deriveObject(haObject('d', 1e43, 2000, { av: { value: 1 } }), settings(), rngFor('d'));
    const expected = 43 + (0.4 * kLambda('calzetti00', lineWavelengthAngstrom('halpha'))) / 4.05;
    expectClose(d.logLum.halpha!, expected, { atol: 1e-12, source: 'closed form, Calzetti et al. 2000 ApJ 533, 682 (R_V = 4.05)' });
  });

  it('flags objects without a dust correction', () => {
    const inputs = haObject('n', 1e43, 2000);
    delete inputs.av;
    expect(deriveObject(inputs, settings(), rngFor('n')).flags).toContain('no_dust_correction');
  });

  it('turns an upper-limit flux into upper limits on mass, L_bol and Eddington ratio', () => {
    const inputs: ObjectInputs = {
      id: 'u',
      z: 6,
      lines: { halpha: { fluxCgs: { value: 3e-18 }, fluxIsLimit: true, fwhmKms: { value: 1500, errLo: 150, errHi: 150 } } },
    };
    const d = deriveObject(inputs, settings(), rngFor('u'));
    expect(d.flags).toEqual(expect.arrayContaining(['mbh_upper_limit', 'lbol_upper_limit', 'edd_ratio_upper_limit']));
    // The bound is the value at the limit flux: L = 4πD_L² F (Planck18, z = 6), then
    // Reines & Volonteri 2015, ApJ 813, 82, eq. 5 (ε = 1.075) and Greene & Ho 2005 eq. 1 inverted × BC5100 = 9.26 (Shen et al. 2011).
    const dl = getCosmology('planck18').luminosityDistanceMpc(6) * 3.0856775814913673e24; // cm per Mpc (IAU 2015 parsec)
    const logL = Math.log10(3e-18 * 4 * Math.PI * dl * dl);
    expectClose(d.logMbh!, Math.log10(1.075) + 6.57 + 0.47 * (logL - 42) + 2.06 * Math.log10(1.5), { atol: 1e-9, source: 'Reines & Volonteri 2015 eq. 5 at the limit, closed form' });
    expectClose(d.logLbol!, 44 + (logL - Math.log10(5.25e42)) / 1.157 + Math.log10(9.26), { atol: 1e-9, source: 'Greene & Ho 2005 eq. 1 inverted × 9.26 at the limit, closed form' });
    expect(d.isLimit.logMbh && d.isLimit.logLbol && d.isLimit.logEddRatio).toBe(true);
    expect(d.pct.logMbh).toBeNull();
  });

  it('takes an Hβ mass from L5100 and falls back to BC5100 for L_bol when there is no Hα', () => {
    const inputs: ObjectInputs = { id: 'b', z: 8, lines: { hbeta: { fwhmKms: { value: 3000 }, lumErgS: { value: 1e42 } } }, lamL5100: { value: 1e44 }, av: { value: 0 } };
    const d = deriveObject(inputs, settings(), rngFor('b'));
    // Vestergaard & Peterson 2006 ApJ 641, 689 eq. 5: log M = 6.91 + 0.5·0 + 2·log10(3) (closed form)
    expectClose(d.logMbh!, 6.91 + 2 * Math.log10(3), { atol: 1e-9, source: 'Vestergaard & Peterson 2006 eq. 5, closed form' });
    expect(d.mbhMethod).toBe('vp06_hbeta');
    expect(d.lbolMethod).toBe('bc5100');
    expect(d.flags).toContain('lbol_fallback');
    expectClose(d.logLbol!, 44 + Math.log10(9.26), { atol: 1e-12, source: 'BC5100 = 9.26 (Shen et al. 2011, ApJS 194, 45), closed form' });
  });

  it('gives an Hβ-only object without a continuum its L_bol through L5100 from L(Hβ), flagged', () => {
    const inputs: ObjectInputs = { id: 'hb', z: 8.5, lines: { hbeta: { fwhmKms: { value: 2500 }, lumErgS: { value: 1e42 } } }, av: { value: 0 } };
    const d = deriveObject(inputs, settings(), rngFor('hb'));
    expect(d.lbolMethod).toBe('hbeta_gh05_bc5100');
    expect(d.flags).toEqual(expect.arrayContaining(['lbol_fallback', 'l5100_from_hbeta']));
    // Greene & Ho 2005 eq. 2 (coefficients from memory, as in src/core/virial): L_Hβ = 1.425e42 (L5100/1e44)^1.133, inverted; × BC5100 = 9.26 (Shen et al. 2011)
    const logL5100 = 44 + (42 - Math.log10(1.425e42)) / 1.133;
    expectClose(d.logLbol!, logL5100 + Math.log10(9.26), { atol: 1e-9, source: 'Greene & Ho 2005 eq. 2 inverted (from memory) × 9.26 (Shen et al. 2011), closed form' });
    expectClose(d.logL5100!, logL5100, { atol: 1e-9, source: 'Greene & Ho 2005 eq. 2 inverted (from memory), closed form' });
  });

  it('flags the Eddington ratio as unconstrained when mass and L_bol rest on two different limited fluxes', () => {
    const inputs: ObjectInputs = {
      id: 'two-limits',
      z: 6,
      lines: { hbeta: { fwhmKms: { value: 2500 }, fluxCgs: { value: 2e-18 }, fluxIsLimit: true }, halpha: { fluxCgs: { value: 6e-18 }, fluxIsLimit: true } },
    };
    const d = deriveObject(inputs, settings({ linePriority: ['hbeta', 'halpha'] }), rngFor('two-limits'));
    expect(d.flags).toContain('edd_ratio_unconstrained');
    expect(d.flags).not.toContain('edd_ratio_upper_limit');
    expect(d.flags).toEqual(expect.arrayContaining(['mbh_upper_limit', 'lbol_upper_limit']));
    // The bounds themselves: the mass at the Hβ limit flux, L_bol at the Hα limit flux, no ratio.
    const dl = getCosmology('planck18').luminosityDistanceMpc(6) * 3.0856775814913673e24; // cm per Mpc (IAU 2015 parsec)
    const logLhb = Math.log10(2e-18 * 4 * Math.PI * dl * dl);
    const logLha = Math.log10(6e-18 * 4 * Math.PI * dl * dl);
    // Vestergaard & Peterson 2006, ApJ 641, 689, Hβ line-luminosity calibration (coefficients from memory, as in src/core/virial): 6.67 + 0.63 (log L_Hβ − 42) + 2 log(FWHM/1000)
    expectClose(d.logMbh!, 6.67 + 0.63 * (logLhb - 42) + 2 * Math.log10(2.5), { atol: 1e-9, source: 'Vestergaard & Peterson 2006 L(Hβ) calibration (from memory), closed form' });
    // Greene & Ho 2005, ApJ 630, 122, eq. 1 inverted × BC5100 = 9.26 (Shen et al. 2011)
    expectClose(d.logLbol!, 44 + (logLha - Math.log10(5.25e42)) / 1.157 + Math.log10(9.26), { atol: 1e-9, source: 'Greene & Ho 2005 eq. 1 inverted × 9.26, closed form' });
    expect(d.logEddRatio).toBeNull();
    expect(d.pct.logMbh).toBeNull();
    expect(d.pct.logLbol).toBeNull();
  });

  it('flags a mass taken from a later line when an earlier one has a width but no luminosity', () => {
    const inputs: ObjectInputs = {
      id: 'fb',
      z: 6,
      lines: { halpha: { fwhmKms: { value: 2000 } }, hbeta: { fwhmKms: { value: 2100 } } },
      lamL5100: { value: 1e44 },
    };
    const d = deriveObject(inputs, settings(), rngFor('fb'));
    expect(d.mbhMethod).toBe('vp06_hbeta');
    expect(d.flags).toContain('mass_line_fallback');
    expect(deriveObject(haObject('nf', 1e43, 2000), settings(), rngFor('nf')).flags).not.toContain('mass_line_fallback');
  });

  it('takes an error given on one side only as symmetric', () => {
    const one = deriveObject(haObject('e', 1e43, 2000, { logMstar: { value: 9.5, errHi: 0.3 } }), settings(), rngFor('e'));
    const both = deriveObject(haObject('e', 1e43, 2000, { logMstar: { value: 9.5, errLo: 0.3, errHi: 0.3 } }), settings(), rngFor('e'));
    expect(one.pct.deltaLogMbhLocal).toEqual(both.pct.deltaLogMbhLocal);
  });

  it('says so when no line gives a mass and leaves the mass-based quantities empty', () => {
    const d = deriveObject({ id: 'x', z: 5, lines: { halpha: { lumErgS: { value: 1e42 } } } }, settings(), rngFor('x'));
    expect(d.logMbh).toBeNull();
    expect(d.logEddRatio).toBeNull();
    expect(d.pct.logMbh).toBeNull();
    expect(d.flags).toContain('no_mass');
  });

  it('leaves the local offset empty and flags objects without a host mass', () => {
    const d = deriveObject(haObject('h', 1e43, 2000), settings(), rngFor('h'));
    expect(d.deltaLogMbhLocal).toBeNull();
    expect(d.flags).toContain('no_host_mass');
  });
});

describe('deriveObject growth quantities', () => {
  it('gives the seed mass of the published-checks example: 1e8 Msun at z = 6 needs 30.39 Msun at z = 20', () => {
    const d = deriveObject(haObject('s', 1e43, 2000, { z: 6 }), settings(), rngFor('s'));
    // published-checks.md: M = 1e8 at z = 6, seed at z = 20, ε = 0.1, λ = 1 → 30.39 Msun (computed, Planck18 ages).
    // The seed mass scales with M, so log Mseed − log M = log10(30.39) − 8.
    expectClose(d.logMseed! - d.logMbh!, Math.log10(30.39) - 8, { atol: 2e-4, source: 'computed, shared/reference/published-checks.md (4 digits)' });
  });

  it('gives constant Eddington ratios that grow the light and heavy seeds exactly to the observed mass', () => {
    const s = settings();
    const d = deriveObject(haObject('l', 1e43, 3000, { z: 6 }), s, rngFor('l'));
    const cosmo = getCosmology('planck18');
    const dt = cosmo.ageGyr(6) - cosmo.ageGyr(s.zSeed);
    expectClose(logMassAfter(2, dt, s.efficiency, d.lambdaReqLight!, 1), d.logMbh!, { atol: 1e-9, source: 'internal consistency with growth/logMassAfter' });
    expectClose(logMassAfter(5, dt, s.efficiency, d.lambdaReqHeavy!, 1), d.logMbh!, { atol: 1e-9, source: 'internal consistency with growth/logMassAfter' });
    expect(d.lambdaReqHeavy!).toBeLessThan(d.lambdaReqLight!);
  });

  it("shifts the mass percentiles by the object's e-folds to give the seed-mass percentiles", () => {
    const d = deriveObject(haObject('sp', 1e43, 2000, { z: 6 }), settings(), rngFor('sp'));
    const shift = d.logMseed! - d.logMbh!;
    for (const k of ['p16', 'p50', 'p84'] as const) {
      expectClose(d.pct.logMseed![k], d.pct.logMbh![k] + shift, { atol: 1e-12, source: 'closed form: log Mseed = log M − N_e log10 e' });
    }
  });

  it('has no seed quantities for an object above the seed redshift', () => {
    const d = deriveObject(haObject('z', 1e43, 2000, { z: 25 }), settings(), rngFor('z'));
    expect(d.logMseed).toBeNull();
    expect(d.lambdaReqLight).toBeNull();
    expect(d.flags).toContain('z_above_seed_redshift');
  });
});

describe('deriveObject Monte Carlo', () => {
  const draws = 20000;
  // Standard error of the 16th percentile of N normal draws: sqrt(p(1−p)/N)/φ(z_p) σ = 0.0107σ at N = 2e4; we allow 4 standard errors.
  const qtol = (sigma: number) => (4 * Math.sqrt((0.16 * 0.84) / draws)) / 0.2420 * sigma;

  it('matches the analytic percentiles of a log-normal host mass in the local offset', () => {
    const s = settings({ draws });
    const inputs = haObject('ln', 1e43, 2000, { logMstar: { value: 9.5, errLo: 0.3, errHi: 0.3 } });
    const d = deriveObject(inputs, s, rngFor('ln'));
    // Every input but M* is exact; the calibration's intrinsic scatter σ_cal adds in quadrature:
    // Δ ~ N(Δ_nominal, sqrt((1.05·0.3)² + σ_cal²)) (RV15 AGN slope 1.05), so p16/p84 = Δ ∓ 0.99446 σ (normal quantile, closed form).
    const sigma = Math.hypot(1.05 * 0.3, getCalibration('rv15_halpha').scatterDex);
    const z84 = 0.994458;
    expectClose(d.pct.deltaLogMbhLocal!.p50, d.deltaLogMbhLocal!, { atol: qtol(sigma), source: 'closed form (normal median), tolerance 4 standard errors' });
    expectClose(d.pct.deltaLogMbhLocal!.p16, d.deltaLogMbhLocal! - z84 * sigma, { atol: qtol(sigma), source: 'closed form (normal 16th percentile)' });
    expectClose(d.pct.deltaLogMbhLocal!.p84, d.deltaLogMbhLocal! + z84 * sigma, { atol: qtol(sigma), source: 'closed form (normal 84th percentile)' });
  });

  it('gives P(λ_Edd > 1) equal to the normal tail when only the calibration scatter varies', () => {
    const s = settings({ draws });
    const d = deriveObject(haObject('pe', 3e43, 900), s, rngFor('pe'));
    const sigma = getCalibration('rv15_halpha').scatterDex;
    const expected = normalCdf(d.logEddRatio! / sigma);
    // binomial standard error sqrt(p(1−p)/N); 4 of them
    expectClose(d.pSuperEddington!, expected, { atol: 4 * Math.sqrt((expected * (1 - expected)) / draws) + 1e-9, source: 'closed form: Φ(log λ/σ_cal)' });
  });

  it('draws the same numbers for the same seed and id, and different ones for another id', () => {
    const inputs = haObject('r1', 1e43, 2000, { lines: { halpha: { lumErgS: { value: 1e43, errLo: 1e42, errHi: 1e42 }, fwhmKms: { value: 2000, errLo: 200, errHi: 300 } } } });
    const a = deriveObject(inputs, settings(), rngFor('r1'));
    const b = deriveObject(inputs, settings(), rngFor('r1'));
    const c = deriveObject(inputs, settings(), rngFor('r2'));
    expect(b).toEqual(a);
    expect(c.pct.logMbh!.p16).not.toBe(a.pct.logMbh!.p16);
    expect(c.logMbh).toBe(a.logMbh); // the nominal value has no noise
  });
});
