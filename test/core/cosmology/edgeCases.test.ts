import { describe, expect, it } from 'vitest';
import { expectClose } from '../../helpers/expectClose.ts';
import { createCosmology, getCosmology } from '../../../src/core/cosmology/index.ts';
import { CosmologyError } from '../../../src/core/cosmology/densityParameters.ts';
import { cubicHermite, cubicHermiteSlope } from '../../../src/core/cosmology/cubicHermite.ts';
import { integrateAdaptive } from '../../../src/core/cosmology/gaussKronrod.ts';
import type { CosmologyId } from '../../../src/core/derive/types.ts';

// Expected values computed with astropy 5.2.1 (Debian python3-astropy 5.2.1-2), printed to 16 digits;
// astropy integrates with scipy quad at epsrel 1.49e-8, so rtol 2e-8 (as astropyCrossChecks.test.ts).
const RTOL = 2e-8;
const astropy = (what: string) => `computed with astropy 5.2.1: ${what}`;

describe('the cosmology off its tables', () => {
  const p15 = getCosmology('planck15');

  it('gives ages, distances and lookback times in the future (−1 < z < 0) as astropy does', () => {
    // [z, age (Gyr), comoving distance (Mpc), lookback time (Gyr), luminosity distance (Mpc)]
    const rows = [
      [-0.5, 24.87320836531202, -2428.106758640069, -11.075592468415639, -1214.0533793200345],
      [-0.9, 52.662944080455894, -4539.5492080347485, -38.86532818355964, -453.95492080347475],
    ] as const;
    for (const [z, age, dc, lb, dl] of rows) {
      expectClose(p15.ageGyr(z), age, { rtol: RTOL, source: astropy(`Planck15.age(${z})`) });
      expectClose(p15.comovingDistanceMpc(z), dc, { rtol: RTOL, source: astropy(`Planck15.comoving_distance(${z})`) });
      expectClose(p15.lookbackTimeGyr(z), lb, { rtol: RTOL, source: astropy(`Planck15.lookback_time(${z})`) });
      expectClose(p15.luminosityDistanceMpc(z), dl, { rtol: RTOL, source: astropy(`Planck15.luminosity_distance(${z})`) });
    }
  });

  it('keeps the lookback time accurate as z → 0, where age(0) − age(z) would cancel', () => {
    expectClose(p15.lookbackTimeGyr(1e-10), 1.4434488066271602e-9, { rtol: RTOL, source: astropy('Planck15.lookback_time(1e-10)') });
    expectClose(p15.lookbackTimeGyr(1e-6), 1.4434477504718963e-5, { rtol: RTOL, source: astropy('Planck15.lookback_time(1e-6)') });
  });

  it('inverts the age beyond the tables (z > 1e4)', () => {
    // The age itself there is checked against the matter + radiation closed form (closedForms.test.ts); astropy 5.2.1's
    // own age(1e5) of Planck15 (2.05e-9 Gyr) is off by a factor 36 from that closed form (7.5e-8 Gyr), so it is not used.
    // Round trip, closed form: the inverse of the age function returns the redshift it was given.
    for (const z of [2e4, 1e5, 3e6]) expectClose(p15.redshiftAtAgeGyr(p15.ageGyr(z)), z, { rtol: 1e-9, source: 'inverse of the age, closed form' });
  });

  it('gives redshift exactly 0 for the age of the universe today, and refuses an age beyond it, naming it', () => {
    const age0 = p15.ageGyr(0);
    expect(p15.redshiftAtAgeGyr(age0)).toBe(0);
    expect(() => p15.redshiftAtAgeGyr(age0 * (1 + 1e-12))).toThrow(`cosmology "Planck15": age ${age0 * (1 + 1e-12)} Gyr is outside (0, ${age0.toFixed(5)}] Gyr (big bang to today)`);
    expect(() => p15.redshiftAtAgeGyr(0)).toThrow('is outside');
  });
});

describe('massless neutrinos and a universe without radiation', () => {
  it('counts massless neutrinos as radiation, Ω_ν = 0.2271 N_eff Ω_γ, as astropy does', () => {
    const c = createCosmology({ name: 'massless', H0: 70, Om0: 0.3, Tcmb0: 2.725, Neff: 3.04, mNuEv: [0, 0, 0], reference: 'test model' });
    expect(c.densities.massiveNeutrinos).toBeNull();
    // The physical constants agree with astropy's to about 3e-11 relative: rtol 1e-10.
    expectClose(c.densities.Onu0, 3.4818471030137025e-5, { rtol: 1e-10, source: astropy('FlatLambdaCDM(70, 0.3, Tcmb0=2.725, Neff=3.04, m_nu=0).Onu0') });
    expectClose(c.densities.Ogamma0, 5.043185986175516e-5, { rtol: 1e-10, source: astropy('same model, Ogamma0') });
    expectClose(c.ageGyr(2), 3.2226816474326667, { rtol: RTOL, source: astropy('same model, age(2)') });
  });

  it('has no relic neutrinos without a CMB temperature, whatever their masses', () => {
    const c = createCosmology({ name: 'cold', H0: 70, Om0: 0.3, Tcmb0: 0, Neff: 3.04, mNuEv: [0.02, 0.03, 0.05], reference: 'test model' });
    expect(c.densities.Onu0).toBe(0);
    expect(c.densities.Ogamma0).toBe(0);
    expectClose(c.ageGyr(2), 3.2266270600643443, { rtol: RTOL, source: astropy('FlatLambdaCDM(70, 0.3, Tcmb0=0, m_nu=[0.02,0.03,0.05]).age(2)') });
  });
});

describe('parameters that do not describe a model', () => {
  const base = { name: 'bad', H0: 70, Om0: 0.3, Tcmb0: 2.725, Neff: 3.04, reference: 'test model' };
  const refusal = (over: object) => {
    try {
      createCosmology({ ...base, ...over });
    } catch (e) {
      return e as Error;
    }
    return null;
  };

  it('names the parameter and its value in a CosmologyError', () => {
    const cases: [object, string][] = [
      [{ H0: 0 }, 'cosmology "bad": H0 must be a positive number of km/s/Mpc, got 0'],
      [{ Om0: -0.1 }, 'cosmology "bad": Om0 must be ≥ 0, got -0.1'],
      [{ Om0: NaN }, 'cosmology "bad": Om0 must be ≥ 0, got NaN'],
      [{ Tcmb0: -1 }, 'cosmology "bad": Tcmb0 must be ≥ 0 K, got -1'],
      [{ Tcmb0: Infinity }, 'cosmology "bad": Tcmb0 must be ≥ 0 K, got Infinity'],
      [{ Neff: -1 }, 'cosmology "bad": Neff must be ≥ 0, got -1'],
      [{ Neff: NaN }, 'cosmology "bad": Neff must be ≥ 0, got NaN'],
      [{ Ode0: NaN }, 'cosmology "bad": Ode0 must be a number, got NaN'],
      [{ Neff: 0.5, mNuEv: [0.06] }, 'cosmology "bad": massive neutrinos need Neff ≥ 1, got 0.5'],
      [{ mNuEv: [0.06, -0.01, 0] }, 'cosmology "bad": neutrino masses must be ≥ 0 eV'],
      [{ mNuEv: [0.06, Infinity, 0] }, 'cosmology "bad": neutrino masses must be ≥ 0 eV'],
    ];
    for (const [over, message] of cases) {
      const e = refusal(over);
      expect(e, message).toBeInstanceOf(CosmologyError);
      expect(e!.message).toBe(message);
      expect(e!.name).toBe('CosmologyError');
    }
  });

  it('accepts one massive species at N_eff = 1, and massless neutrinos at N_eff < 1', () => {
    expect(refusal({ Neff: 1, mNuEv: [0.06] })).toBeNull();
    expect(refusal({ Neff: 0.5 })).toBeNull();
  });

  it('refuses an unknown preset, naming it and the known ones', () => {
    expect(() => getCosmology('planck99' as CosmologyId)).toThrow(/^unknown cosmology "planck99", expected one of planck18, /);
  });
});

describe('cubic Hermite interpolation', () => {
  it('reproduces a cubic and its derivative exactly from the values and slopes at the ends', () => {
    // f(x) = 2 − x + 3x² − 0.5x³ on [1, 3] (h = 2): closed form.
    const f = (x: number) => 2 - x + 3 * x * x - 0.5 * x ** 3;
    const df = (x: number) => -1 + 6 * x - 1.5 * x * x;
    for (const t of [0, 0.25, 0.5, 0.8, 1]) {
      const x = 1 + 2 * t;
      expectClose(cubicHermite(f(1), f(3), df(1), df(3), 2, t), f(x), { atol: 1e-13, source: 'cubic, closed form' });
      expectClose(cubicHermiteSlope(f(1), f(3), df(1), df(3), 2, t), df(x), { atol: 1e-13, source: 'derivative of the cubic, closed form' });
    }
  });
});

describe('adaptive Gauss–Kronrod', () => {
  it('refuses an integrand that is not finite, naming the interval', () => {
    expect(() => integrateAdaptive(() => NaN, 0, 2)).toThrow('integrand not finite on [0, 2]');
    expect(() => integrateAdaptive((x) => 1 / (x - 1 + 1e-300 * 0), 0, 2)).toThrow('integrand not finite on [0, 2]');
  });

  it('refines a peaked integrand to its tolerance: ∫ exp(−x²/2σ²) over [−1, 1] with σ = 0.01', () => {
    // Closed form: σ √(2π) erf(1/(σ√2)) = σ √(2π) to double precision at 100σ.
    expectClose(integrateAdaptive((x) => Math.exp(-0.5 * (x / 0.01) ** 2), -1, 1.3), 0.01 * Math.sqrt(2 * Math.PI), { rtol: 1e-12, source: 'Gaussian integral, closed form' });
  });
});
