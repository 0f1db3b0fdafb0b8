import { describe, expect, it } from 'vitest';
import { detectableIntervals } from '../../../src/core/population/detectableIntervals.ts';
import { getCosmology } from '../../../src/core/cosmology/getCosmology.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const cosmo = getCosmology('planck18');
const dl = (z: number) => cosmo.luminosityDistanceMpc(z);
/** Hα vacuum wavelength, Å (Vanden Berk et al. 2001, as in src/core/dust/lineWavelengths.ts). */
const HALPHA = 6564.61;

describe('detectableIntervals', () => {
  it('ends a constant limit where the flux, dimmed as D_L⁻², meets it', () => {
    // At the edge z': F_obs (D_L(z)/D_L(z'))² = F_lim, so D_L(z') = D_L(z) √(F_obs/F_lim) (inverse square law, closed form).
    const obj = { z: 5, line: 'halpha' as const, fluxObsCgs: 4e-18 };
    const out = detectableIntervals(cosmo, obj, { kind: 'constant', fluxCgs: 1e-18 }, { zMin: 0.5, zMax: 12 }, 5);
    expect(out).toHaveLength(1);
    const [lo, hi] = out[0]!;
    expect(lo).toBe(0.5);
    expectClose(dl(hi), dl(5) * 2, { rtol: 1e-9, source: 'inverse square law, closed form' });
  });

  it('takes the S/N floor (minSnr × flux error) when it is above the limit', () => {
    const obj = { z: 5, line: 'halpha' as const, fluxObsCgs: 4e-18, fluxErrCgs: 0.25e-18 };
    // Floor 4 × 0.25e-18 = 1e-18 above the limit 1e-19: D_L(z') = D_L(z) √(4e-18 / 1e-18).
    const [[, hi]] = detectableIntervals(cosmo, obj, { kind: 'constant', fluxCgs: 1e-19 }, { zMin: 0, zMax: 12 }, 4) as [[number, number]];
    expectClose(dl(hi), dl(5) * 2, { rtol: 1e-9, source: 'inverse square law, closed form' });
  });

  it('keeps the whole window for an object bright enough everywhere in it, and nothing for one too faint everywhere', () => {
    const bright = { z: 5, line: 'halpha' as const, fluxObsCgs: 1e-15 };
    expect(detectableIntervals(cosmo, bright, { kind: 'constant', fluxCgs: 1e-18 }, { zMin: 3, zMax: 7 }, 5)).toEqual([[3, 7]]);
    const faint = { z: 5, line: 'halpha' as const, fluxObsCgs: 1e-20 };
    expect(detectableIntervals(cosmo, faint, { kind: 'constant', fluxCgs: 1e-18 }, { zMin: 3, zMax: 7 }, 5)).toEqual([]);
    expect(detectableIntervals(cosmo, bright, { kind: 'constant', fluxCgs: 1e-18 }, { zMin: 7, zMax: 7 }, 5)).toEqual([]);
  });

  it('starts just above zero when the window starts at zero (D_L = 0 there)', () => {
    const bright = { z: 5, line: 'halpha' as const, fluxObsCgs: 1e-15 };
    expect(detectableIntervals(cosmo, bright, { kind: 'constant', fluxCgs: 1e-18 }, { zMin: 0, zMax: 2 }, 5)).toEqual([[1e-8, 2]]);
  });

  it('follows a tabulated limit: detectable only where the table reaches, with a gap where the limit rises above the flux', () => {
    // An invented sensitivity table: 1e-19 over 30000–50000 Å except a band at 40000 Å where the limit is 1e-15.
    const table = { kind: 'table' as const, lamObsAngstrom: [30000, 39000, 40000, 41000, 50000], fluxCgs: [1e-19, 1e-19, 1e-15, 1e-19, 1e-19] };
    const obj = { z: 5, line: 'halpha' as const, fluxObsCgs: 1e-17 };
    const out = detectableIntervals(cosmo, obj, table, { zMin: 0, zMax: 10 }, 0);
    expect(out).toHaveLength(2);
    // Table ends, closed form: λ_rest (1 + z') = 30000 and 50000 Å; found to the bisection's resolution over a 256-step scan.
    expectClose(out[0]![0], 30000 / HALPHA - 1, { atol: 1e-9, source: 'λ_obs = λ_rest (1 + z), closed form' });
    expectClose(out[1]![1], 50000 / HALPHA - 1, { atol: 1e-9, source: 'λ_obs = λ_rest (1 + z), closed form' });
    // The gap: where the interpolated limit rises to the object's flux at that z' (1e-17 (D_L(5)/D_L(z'))²).
    for (const zEdge of [out[0]![1], out[1]![0]]) {
      const lam = HALPHA * (1 + zEdge);
      const lim = lam < 40000 ? 1e-19 + ((lam - 39000) / 1000) * (1e-15 - 1e-19) : 1e-15 + ((lam - 40000) / 1000) * (1e-19 - 1e-15);
      expectClose(1e-17 * (dl(5) / dl(zEdge)) ** 2, lim, { rtol: 1e-6, source: 'inverse square law against the linear table, closed form' });
    }
    expect(out[0]![1]).toBeLessThan(40000 / HALPHA - 1);
    expect(out[1]![0]).toBeGreaterThan(40000 / HALPHA - 1);
  });
});
