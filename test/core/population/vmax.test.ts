import { describe, expect, it } from 'vitest';
import { getCosmology } from '../../../src/core/cosmology/getCosmology.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { comovingVolumeMpc3Sr } from '../../../src/core/population/comovingVolume.ts';
import { lineRedshiftWindow } from '../../../src/core/population/lineRedshiftWindow.ts';
import { vmax } from '../../../src/core/population/vmax.ts';
import type { SurveySpec } from '../../../src/core/population/surveySpec.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const cosmo = getCosmology('planck18');
const LIMIT = 1e-18;
const survey = (over: Partial<SurveySpec> = {}): SurveySpec => ({
  fields: [{ name: 'A', areaArcmin2: 100, limits: { halpha: { kind: 'constant', fluxCgs: LIMIT } } }],
  lamObsRangeAngstrom: [27000, 53000],
  minFwhmKms: 1000,
  minSnr: 0,
  ...over,
});

describe('vmax', () => {
  it('equals the field\'s comoving volume across the Hα window for an object far above the limit', () => {
    // astropy 5.2.1 Planck18: (comoving_volume(53000/6564.61 − 1) − comoving_volume(27000/6564.61 − 1)) × Ω/4π
    // with Ω = 100 arcmin² → 1131221.4885504968 Mpc³; the core's distances agree with astropy to ~1e-11.
    const r = vmax(cosmo, survey(), { z: 5, line: 'halpha', fluxObsCgs: 1e-15 }, 0);
    expect(r.belowLimit).toBe(false);
    expectClose(r.vmaxCmpc3 as number, 1131221.4885504968, { rtol: 1e-8, source: 'computed with astropy 5.2.1 Planck18.comoving_volume' });
  });

  it('stops at the redshift where the flux falls to the limit', () => {
    // F = 1.2 F_lim at z = 5: D_L(z_lim) = √1.2 D_L(5) → z_lim = 5.405408956466625 (astropy 5.2.1 z_at_value);
    // V_max = 713675.767365867 Mpc³ and V(<z) = 599890.2776279682 Mpc³ for 100 arcmin² (astropy 5.2.1 Planck18).
    const r = vmax(cosmo, survey(), { z: 5, line: 'halpha', fluxObsCgs: 1.2 * LIMIT }, 0);
    expectClose(r.vmaxCmpc3 as number, 713675.767365867, { rtol: 1e-7, source: 'computed with astropy 5.2.1 Planck18 + z_at_value' });
    expectClose(r.vCmpc3 as number, 599890.2776279682, { rtol: 1e-8, source: 'computed with astropy 5.2.1 Planck18.comoving_volume' });
  });

  it('treats the S/N criterion as a flux floor of minSnr × σ_F', () => {
    // σ_F = 0.2 F_lim with minSnr 6 makes a floor of 1.2 F_lim; an object at 1.44 F_lim stops where its flux has
    // fallen by a factor 1.2, the same z_lim as the previous case.
    const r = vmax(cosmo, survey({ minSnr: 6 }), { z: 5, line: 'halpha', fluxObsCgs: 1.44 * LIMIT, fluxErrCgs: 0.2 * LIMIT }, 0);
    expectClose(r.vmaxCmpc3 as number, 713675.767365867, { rtol: 1e-7, source: 'computed with astropy 5.2.1 Planck18 + z_at_value' });
  });

  it('gives the same volume for a flat tabulated limit as for the constant', () => {
    const table = survey({ fields: [{ name: 'A', areaArcmin2: 100, limits: { halpha: { kind: 'table', lamObsAngstrom: [20000, 60000], fluxCgs: [LIMIT, LIMIT] } } }] });
    const a = vmax(cosmo, survey(), { z: 5, line: 'halpha', fluxObsCgs: 1.2 * LIMIT }, 0).vmaxCmpc3 as number;
    const b = vmax(cosmo, table, { z: 5, line: 'halpha', fluxObsCgs: 1.2 * LIMIT }, 0).vmaxCmpc3 as number;
    expectClose(b, a, { rtol: 1e-9, source: 'internal consistency: the two descriptions are the same limit' });
  });

  it('sums fields and uses a lensed field\'s source-plane area', () => {
    const two = survey({
      fields: [
        { name: 'A', areaArcmin2: 100, limits: { halpha: { kind: 'constant', fluxCgs: LIMIT } } },
        { name: 'cluster', areaArcmin2: 50, sourcePlaneAreaArcmin2: 10, limits: { halpha: { kind: 'constant', fluxCgs: LIMIT } } },
      ],
    });
    const one = vmax(cosmo, survey(), { z: 5, line: 'halpha', fluxObsCgs: 1e-15 }, 0).vmaxCmpc3 as number;
    const both = vmax(cosmo, two, { z: 5, line: 'halpha', fluxObsCgs: 1e-15 }, 0).vmaxCmpc3 as number;
    expectClose(both, one * 1.1, { rtol: 1e-12, source: 'closed form: 100 + 10 arcmin² of the same window' });
  });

  it('flags an object below its own field\'s limit or outside the line\'s window', () => {
    expect(vmax(cosmo, survey(), { z: 5, line: 'halpha', fluxObsCgs: 0.9 * LIMIT }, 0)).toEqual({ vmaxCmpc3: null, vCmpc3: null, belowLimit: true });
    expect(vmax(cosmo, survey(), { z: 8, line: 'halpha', fluxObsCgs: 1e-15 }, 0).belowLimit).toBe(true);
    expect(vmax(cosmo, survey(), { z: 5, line: 'hbeta', fluxObsCgs: 1e-15 }, 0).belowLimit).toBe(true);
  });

  it('gives no volume for an object below the line\'s window or in a field the survey does not have', () => {
    // The Hα window of 27000–53000 Å starts at z = 27000/6564.61 − 1 = 3.113.
    const none = { vmaxCmpc3: null, vCmpc3: null, belowLimit: true };
    expect(vmax(cosmo, survey(), { z: 3, line: 'halpha', fluxObsCgs: 1e-15 }, 0)).toEqual(none);
    expect(vmax(cosmo, survey(), { z: 5, line: 'halpha', fluxObsCgs: 1e-15 }, 1)).toEqual(none);
  });

  it('leaves out a field without a limit for the object\'s line', () => {
    // Only field A observes Hα: the same V_max as the first case, astropy 5.2.1 Planck18 (see above).
    const two = survey({
      fields: [
        { name: 'A', areaArcmin2: 100, limits: { halpha: { kind: 'constant', fluxCgs: LIMIT } } },
        { name: 'B', areaArcmin2: 300, limits: { hbeta: { kind: 'constant', fluxCgs: LIMIT } } },
      ],
    });
    const r = vmax(cosmo, two, { z: 5, line: 'halpha', fluxObsCgs: 1e-15 }, 0);
    expectClose(r.vmaxCmpc3 as number, 1131221.4885504968, { rtol: 1e-8, source: 'computed with astropy 5.2.1 Planck18.comoving_volume' });
  });

  it('counts in V only the detectable volume below the object\'s redshift when the window has a gap above it', () => {
    // A limit far above the object's flux from 36000 to 40000 Å splits the window in two intervals, the object (z = 4,
    // 32823 Å) in the first: V = Ω (V_C(4) − V_C(27000/6564.61 − 1)) / 4π = 296308.46126776485 Mpc³ for 100 arcmin²
    // (astropy 5.2.1 Planck18.comoving_volume).
    const gap = survey({
      fields: [{
        name: 'A', areaArcmin2: 100,
        limits: { halpha: { kind: 'table', lamObsAngstrom: [20000, 36000, 36001, 40000, 40001, 60000], fluxCgs: [LIMIT, LIMIT, 1e-10, 1e-10, LIMIT, LIMIT] } },
      }],
    });
    const r = vmax(cosmo, gap, { z: 4, line: 'halpha', fluxObsCgs: 1e-15 }, 0);
    expectClose(r.vCmpc3 as number, 296308.46126776485, { rtol: 1e-8, source: 'computed with astropy 5.2.1 Planck18.comoving_volume' });
    expect(r.vmaxCmpc3 as number).toBeLessThan(1131221.4885504968);
  });

  it('gives ⟨V/V_max⟩ = 0.5 for a population uniform in comoving volume (Schmidt 1968)', () => {
    // Schmidt 1968, ApJ 151, 393: for a non-evolving population uniform in space, V/V_max is uniform on [0, 1].
    // Seeded; 4000 selected objects give a standard error of 1/√(12·4000) = 0.0046; tolerance 3.5σ = 0.016.
    const rng = createRng(1968);
    const w = lineRedshiftWindow('halpha', [27000, 53000]) as { zMin: number; zMax: number };
    const vTot = comovingVolumeMpc3Sr(cosmo, w.zMin, w.zMax);
    const vLo = comovingVolumeMpc3Sr(cosmo, 0, w.zMin);
    const zOfV = (v: number): number => {
      let a = w.zMin;
      let b = w.zMax;
      for (let i = 0; i < 60; i++) {
        const m = 0.5 * (a + b);
        if (comovingVolumeMpc3Sr(cosmo, 0, m) - vLo < v) a = m; else b = m;
      }
      return 0.5 * (a + b);
    };
    let sum = 0;
    let n = 0;
    while (n < 4000) {
      const z = zOfV(rng.next() * vTot);
      const logL = 41 + 2 * rng.next();
      const dlCm = cosmo.luminosityDistanceMpc(z) * 3.0856775814913673e24;
      const flux = 10 ** logL / (4 * Math.PI * dlCm * dlCm);
      const r = vmax(cosmo, survey(), { z, line: 'halpha', fluxObsCgs: flux }, 0);
      if (r.belowLimit) continue;
      sum += (r.vCmpc3 as number) / (r.vmaxCmpc3 as number);
      n++;
    }
    expectClose(sum / n, 0.5, { atol: 0.016, source: 'Schmidt 1968 ⟨V/V_max⟩ = 1/2; tolerance 3.5 × 1/√(12 N), N = 4000' });
  });
});
