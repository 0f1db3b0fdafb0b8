import { describe, expect, it } from 'vitest';
import { deriveObject } from '../../../src/core/derive/deriveObject.ts';
import { DEFAULT_SETTINGS } from '../../../src/core/derive/defaultSettings.ts';
import type { DeriveSettings, ObjectInputs } from '../../../src/core/derive/types.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { seedFor } from '../../../src/core/random/seedFor.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// Flags and host quantities the other derive tests do not look at: the S/N flag on limits, the
// σ*-based local relation, the bulge-mass flag, and which flags an object without a mass carries.

const settings = (over: Partial<DeriveSettings> = {}): DeriveSettings => ({ ...DEFAULT_SETTINGS, draws: 400, ...over });
const derive = (o: ObjectInputs, s = settings()) => deriveObject(o, s, createRng(seedFor(s.seed, o.id)));
const lg = Math.log10;
// Reines & Volonteri 2015, ApJ 813, 82, eq. 5 with ε = 1.075 (the default Hα calibration).
const rv15Halpha = (lum: number, fwhm: number) => lg(1.075) + 6.57 + 0.47 * lg(lum / 1e42) + 2.06 * lg(fwhm / 1e3);
const ha = { halpha: { lumErgS: { value: 1e43, errLo: 1e42 }, fwhmKms: { value: 2000, errLo: 200 } } };

describe('the low signal-to-noise flag', () => {
  it('is not raised by an upper-limit flux, whatever error comes with it (a limit is not drawn)', () => {
    const d = derive({ id: 'LIM-ERR', z: 6, lines: { halpha: { fluxCgs: { value: 3e-18, errLo: 3e-18 }, fluxIsLimit: true, fwhmKms: { value: 2000, errLo: 200 } } } });
    expect(d.flags).toContain('mbh_upper_limit');
    expect(d.flags).not.toContain('low_snr');
  });

  it('is raised by a width at S/N below 2 even when the mass rests on a limit', () => {
    const d = derive({ id: 'LIM-FWHM', z: 6, lines: { halpha: { fluxCgs: { value: 3e-18 }, fluxIsLimit: true, fwhmKms: { value: 2000, errLo: 1500 } } } });
    expect(d.flags).toContain('low_snr');
  });

  it('is raised by the fluxes a Balmer decrement is formed from, and not by a line no route uses', () => {
    // Hβ flux at S/N 1.25 only enters through the decrement formed from the fluxes (ratio 4.0 = the decrement given).
    const lines = { halpha: { fluxCgs: { value: 4e-17, errLo: 1e-18 }, fwhmKms: { value: 2000, errLo: 100 } }, hbeta: { fluxCgs: { value: 1e-17, errLo: 8e-18 } } };
    const d = derive({ id: 'BD-SNR', z: 6, lines, lamL5100: { value: 1e44 }, balmerDecrement: { value: 4 } }, settings({ bolometric: 'bc5100' }));
    expect(d.flags).toContain('balmer_from_line_fluxes');
    expect(d.flags).toContain('low_snr');
    // The same Hβ flux with no decrement: Hβ feeds neither the mass (Hα) nor L_bol (λL5100), so no flag.
    const unused = derive({ id: 'BD-NONE', z: 6, lines, lamL5100: { value: 1e44 }, av: { value: 0 } }, settings({ bolometric: 'bc5100' }));
    expect(unused.flags).not.toContain('low_snr');
  });
});

describe('the local relation on σ* (Kormendy & Ho 2013 eq. 7)', () => {
  const sigma = settings({ localRelation: 'kh13_sigma' });

  it('flags an object without σ* as having no host measurement, even with a stellar mass', () => {
    const d = derive({ id: 'NO-SIG', z: 5, lines: ha, av: { value: 0 }, logMstar: { value: 10.5, errLo: 0.2 } }, sigma);
    expect(d.flags).toContain('no_host_mass');
    expect(d.deltaLogMbhLocal).toBeNull();
    expect(d.localOffsetSigma).toBeNull();
    expect(d.pAboveLocal).toBeNull();
  });

  it('takes the offset from log σ*: M/1e9 = 0.309 (σ/200 km/s)^4.38', () => {
    const d = derive({ id: 'SIG', z: 5, lines: ha, av: { value: 0 }, sigmaStarKms: { value: 150, errLo: 15 } }, sigma);
    expect(d.flags).not.toContain('no_host_mass');
    expect(d.flags).not.toContain('bulge_mass_from_total');
    // Kormendy & Ho 2013, ARA&A 51, 511, eq. 7 (published-checks.md), closed form.
    expectClose(d.deltaLogMbhLocal!, rv15Halpha(1e43, 2000) - (9 + lg(0.309) + 4.38 * lg(150 / 200)), { atol: 1e-12, source: 'RV15 eq. 5 minus KH13 eq. 7, closed form' });
    // σ* = 150 ± 15 km/s: 4.38 log σ spreads the offset by about 4.38 × 0.1/ln 10 = 0.19 dex on top of the 0.4 dex calibration scatter,
    // so the 16–84 half-width lies near hypot(0.19, 0.4) = 0.44 dex (closed form; 400 draws, 15 % slack).
    const half = (d.pct.deltaLogMbhLocal!.p84 - d.pct.deltaLogMbhLocal!.p16) / 2;
    expectClose(half, Math.hypot((4.38 * 0.1) / Math.LN10, 0.4), { rtol: 0.15, source: 'propagation of the σ* error through KH13 eq. 7, closed form' });
  });

  it('is flagged extrapolated below 70 km/s and inside the relation\'s range otherwise', () => {
    // Kormendy & Ho 2013 sample: σ* from about 70 to 400 km/s (src/core/local/localRelations.ts validity).
    expect(derive({ id: 'SIG-LO', z: 5, lines: ha, av: { value: 0 }, sigmaStarKms: { value: 60 } }, sigma).flags).toContain('local_relation_extrapolated');
    expect(derive({ id: 'SIG-IN', z: 5, lines: ha, av: { value: 0 }, sigmaStarKms: { value: 200 } }, sigma).flags).not.toContain('local_relation_extrapolated');
  });
});

describe('the bulge-mass relation (Kormendy & Ho 2013 eq. 10)', () => {
  it('flags the total stellar mass used as the bulge mass, and only with that relation', () => {
    const o: ObjectInputs = { id: 'BULGE', z: 5, lines: ha, av: { value: 0 }, logMstar: { value: 10.5, errLo: 0.2 } };
    expect(derive(o, settings({ localRelation: 'kh13_mbulge' })).flags).toContain('bulge_mass_from_total');
    expect(derive(o).flags).not.toContain('bulge_mass_from_total');
    expect(derive({ ...o, logMstar: undefined }, settings({ localRelation: 'kh13_mbulge' })).flags).toEqual(expect.arrayContaining(['no_host_mass']));
  });
});

describe('an object without a mass', () => {
  it('is not flagged implausible for the Eddington ratio or offset it cannot have', () => {
    const d = derive({ id: 'NO-MASS', z: 5, lines: { halpha: { lumErgS: { value: 1e43, errLo: 1e42 } } }, av: { value: 0 }, logMstar: { value: 10, errLo: 0.2 } });
    expect(d.flags).toContain('no_mass');
    expect(d.flags).not.toContain('implausible');
    expect(d.logLbol).not.toBeNull();
    expect(d.logEddRatio).toBeNull();
    expect(d.deltaLogMbhLocal).toBeNull();
  });
});
