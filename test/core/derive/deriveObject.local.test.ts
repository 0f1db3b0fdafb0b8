import { describe, expect, it } from 'vitest';
import { deriveObject } from '../../../src/core/derive/deriveObject.ts';
import { DEFAULT_SETTINGS } from '../../../src/core/derive/defaultSettings.ts';
import type { DeriveSettings, ObjectInputs } from '../../../src/core/derive/types.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { seedFor } from '../../../src/core/random/seedFor.ts';
import { normalCdf } from '../random/normalCdf.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// The offset from the local relation and the two numbers that summarise it: P(above the local
// relation) and local_offset_sigma. Each check is a closed form of the Gaussian case, in which
// every input is exact except the host mass and the virial calibration's intrinsic scatter.

const draws = 20000;
const settings = (over: Partial<DeriveSettings> = {}): DeriveSettings => ({ ...DEFAULT_SETTINGS, draws, ...over });
const rngFor = (id: string) => createRng(seedFor(DEFAULT_SETTINGS.seed, id));
const lg = Math.log10;

// Reines & Volonteri 2015, ApJ 813, 82, eq. 5 with ε = 1.075 (the default Hα calibration):
// log M = log 1.075 + 6.57 + 0.47 log(L/1e42) + 2.06 log(FWHM/1e3).
const rv15Halpha = (lum: number, fwhm: number) => lg(1.075) + 6.57 + 0.47 * lg(lum / 1e42) + 2.06 * lg(fwhm / 1e3);
// Reines & Volonteri 2015 eq. 4, AGN: log M = 7.45 + 1.05 (log M* − 11); intrinsic scatter 0.55 dex (from memory).
const rv15Agn = (logMstar: number) => 7.45 + 1.05 * (logMstar - 11);
const RV15_AGN_SCATTER = 0.55;
// Intrinsic scatter of the Hα calibration drawn in the Monte Carlo: 0.4 dex (common practice, src/core/virial).
const CAL_SCATTER = 0.4;
/** Φ⁻¹(0.84), closed form to 6 digits. */
const Z84 = 0.994458;

const object = (id: string, logMstar: number, errMstar: number): ObjectInputs => ({
  id,
  z: 5,
  lines: { halpha: { lumErgS: { value: 1e43 }, fwhmKms: { value: 2000 } } },
  av: { value: 0 },
  logMstar: { value: logMstar, errLo: errMstar, errHi: errMstar },
});

describe('deriveObject: offset from the local relation', () => {
  it('gives the nominal offset as the virial mass minus the Reines & Volonteri 2015 AGN relation', () => {
    const d = deriveObject(object('off', 10, 0.3), settings(), rngFor('off'));
    expectClose(d.deltaLogMbhLocal!, rv15Halpha(1e43, 2000) - rv15Agn(10), { atol: 1e-12, source: 'RV15 eq. 5 (ε = 1.075) minus RV15 eq. 4 AGN, closed form' });
  });

  it('gives P(above the local relation) as the normal tail Φ(Δ/σ) of the offset draws, for an object above and one below', () => {
    // Draws of Δ: N(Δ, σ) with σ = sqrt((1.05 σ_M*)² + σ_cal² + σ_relation²) (closed form): "above a local black
    // hole of the same host quantity" includes the relation's intrinsic scatter, as local_offset_sigma does.
    // M* chosen so that Δ is about ±0.5σ, where a wrong sign or a wrong tail moves P by ~0.4.
    const sigma = Math.hypot(1.05 * 0.3, CAL_SCATTER, RV15_AGN_SCATTER);
    for (const [id, logMstar] of [['above', 10.99], ['below', 11.47]] as const) {
      const d = deriveObject(object(id, logMstar, 0.3), settings(), rngFor(id));
      const expected = normalCdf(d.deltaLogMbhLocal! / sigma);
      // binomial standard error sqrt(p(1−p)/N), 4 of them
      expectClose(d.pAboveLocal!, expected, { atol: 4 * Math.sqrt((expected * (1 - expected)) / draws), source: `closed form Φ(Δ/σ), ${id} the relation` });
    }
  });

  it('puts P(above) near 1 far above the relation and near 0 far below it', () => {
    // Δ ≈ ±3.3 dex against σ = hypot(0.105, 0.4, 0.55) = 0.69 dex: about 4.8σ either way.
    expect(deriveObject(object('far-above', 7.5, 0.1), settings(), rngFor('far-above')).pAboveLocal!).toBeGreaterThan(0.999);
    expect(deriveObject(object('far-below', 13.5, 0.1), settings(), rngFor('far-below')).pAboveLocal!).toBeLessThan(0.001);
  });

  it("divides the offset by the relation's intrinsic scatter and the draws' half 16–84 width in quadrature for local_offset_sigma", () => {
    const d = deriveObject(object('sig', 10, 0.3), settings(), rngFor('sig'));
    // Half 16–84 width of N(Δ, σ): Φ⁻¹(0.84) σ (closed form); its sampling error at N = 2e4 is
    // ~0.0107 σ per percentile, so about 0.008 σ for the half width; 4 of them.
    const sigma = Math.hypot(1.05 * 0.3, CAL_SCATTER);
    const half = Z84 * sigma;
    const expected = d.deltaLogMbhLocal! / Math.hypot(RV15_AGN_SCATTER, half);
    const dExpected_dHalf = (d.deltaLogMbhLocal! * half) / Math.hypot(RV15_AGN_SCATTER, half) ** 3;
    expectClose(d.localOffsetSigma!, expected, { atol: 4 * 0.008 * sigma * dExpected_dHalf, source: 'closed form, RV15 AGN scatter 0.55 dex (from memory)' });
    // Leaving out the relation's scatter would give Δ/half, 1.5 times larger here.
    expect(d.localOffsetSigma!).toBeLessThan(0.8 * (d.deltaLogMbhLocal! / half));
  });

  it('agrees with the percentiles it reports: local_offset_sigma = Δ / hypot(σ_relation, (p84 − p16)/2)', () => {
    const d = deriveObject(object('sig-pct', 10.5, 0.2), settings(), rngFor('sig-pct'));
    const p = d.pct.deltaLogMbhLocal!;
    expectClose(d.localOffsetSigma!, d.deltaLogMbhLocal! / Math.hypot(RV15_AGN_SCATTER, (p.p84 - p.p16) / 2), {
      atol: 1e-12,
      source: 'definition (DerivedObject.localOffsetSigma), RV15 AGN scatter 0.55 dex (from memory)',
    });
  });
});

describe('deriveObject: no local offset without its inputs', () => {
  it('leaves the offset, local_offset_sigma and P(above) empty without a host mass', () => {
    const d = deriveObject({ id: 'no-host', z: 5, lines: { halpha: { lumErgS: { value: 1e43 }, fwhmKms: { value: 2000 } } } }, settings(), rngFor('no-host'));
    expect(d.deltaLogMbhLocal).toBeNull();
    expect(d.localOffsetSigma).toBeNull();
    expect(d.pAboveLocal).toBeNull();
  });

  it('leaves them empty without a black-hole mass, even with a host mass', () => {
    const d = deriveObject({ id: 'no-mass', z: 5, lines: { halpha: { lumErgS: { value: 1e43 } } }, logMstar: { value: 10, errLo: 0.2, errHi: 0.2 } }, settings(), rngFor('no-mass'));
    expect(d.logMbh).toBeNull();
    expect(d.deltaLogMbhLocal).toBeNull();
    expect(d.localOffsetSigma).toBeNull();
    expect(d.pAboveLocal).toBeNull();
  });
});
