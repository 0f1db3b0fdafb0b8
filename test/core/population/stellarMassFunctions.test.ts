import { describe, expect, it } from 'vitest';
import { schechterPerDex, STELLAR_MASS_FUNCTIONS, stellarMassFunctionAt } from '../../../src/core/population/stellarMassFunctions.ts';
import type { StellarMassFunction } from '../../../src/core/population/stellarMassFunctions.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const smf = (z: number, over: Partial<StellarMassFunction> = {}): StellarMassFunction => ({
  id: `t${z}`, label: 'test', z, logMchar: 10.5, alpha: -1.5, logPhiStar: -4, reference: 'invented for the test', provenance: 'from memory', ...over,
});

describe('schechterPerDex', () => {
  it('gives ln10 · φ* · e⁻¹ at the characteristic mass, whatever the slope', () => {
    // Schechter 1976 in log M, closed form: x = 1 gives ln 10 · φ* · 1 · e⁻¹.
    for (const alpha of [-1.2, -2]) {
      expectClose(schechterPerDex(smf(5, { alpha }), 10.5), Math.LN10 * 1e-4 * Math.exp(-1), { rtol: 1e-14, source: 'Schechter 1976 in log M, closed form' });
    }
  });

  it('rises as 10^{(1+α)(m−m*)} one dex below m*, with the exponential cut-off', () => {
    // m − m* = −1: x = 0.1, so ln10 · φ* · 0.1^{1+α} · e^{−0.1} (closed form).
    expectClose(schechterPerDex(smf(5), 9.5), Math.LN10 * 1e-4 * 0.1 ** -0.5 * Math.exp(-0.1), { rtol: 1e-13, source: 'Schechter 1976 in log M, closed form' });
    // m − m* = +1: x = 10, so ln10 · φ* · 10^{1+α} · e^{−10}.
    expectClose(schechterPerDex(smf(5), 11.5), Math.LN10 * 1e-4 * 10 ** -0.5 * Math.exp(-10), { rtol: 1e-13, source: 'Schechter 1976 in log M, closed form' });
  });
});

describe('stellarMassFunctionAt', () => {
  it('picks the record of the nearest redshift, ties going to the lower one', () => {
    const set = [smf(4), smf(6), smf(8)];
    expect(stellarMassFunctionAt(4.9, set).z).toBe(4);
    expect(stellarMassFunctionAt(5.1, set).z).toBe(6);
    expect(stellarMassFunctionAt(5, set).z).toBe(4);
    expect(stellarMassFunctionAt(7, set).z).toBe(6);
    expect(stellarMassFunctionAt(12, set).z).toBe(8);
    expect(stellarMassFunctionAt(0, set).z).toBe(4);
  });

  it('chooses among the Song et al. 2016 records by default', () => {
    expect(stellarMassFunctionAt(6.2)).toBe(STELLAR_MASS_FUNCTIONS.find((r) => r.z === 6));
    // Song et al. 2016 abstract: the low-mass slope −1.55 at z = 4 and −2.25 at z = 8.
    expect(stellarMassFunctionAt(3).alpha).toBe(-1.55);
    expect(stellarMassFunctionAt(9).alpha).toBe(-2.25);
  });
});
