import { describe, expect, it } from 'vitest';
import { COSMOLOGY_PRESETS, CosmologyError, createCosmology, getCosmology } from '../../../src/core/cosmology/index.ts';
import type { CosmologyId } from '../../../src/core/derive/types.ts';

describe('cosmology presets and parameters', () => {
  it('are keyed by exactly the CosmologyId values and each carries a reference', () => {
    const ids: CosmologyId[] = ['planck18', 'planck15', 'wmap9', 'flat70'];
    expect(Object.keys(COSMOLOGY_PRESETS).sort()).toEqual([...ids].sort());
    for (const id of ids) expect(COSMOLOGY_PRESETS[id].reference.length, id).toBeGreaterThan(20);
  });

  it('hold the Planck 2018 VI Table 2 (TT,TE,EE+lowE+lensing+BAO) parameters for planck18', () => {
    // Planck 2018 VI, A&A 641, A6, Table 2 last column, as in astropy's Planck18.
    expect(COSMOLOGY_PRESETS.planck18).toMatchObject({ H0: 67.66, Om0: 0.30966, Ob0: 0.04897, Tcmb0: 2.7255, Neff: 3.046, mNuEv: [0, 0, 0.06] });
  });

  it('make getCosmology return one shared instance per id', () => {
    expect(getCosmology('planck18')).toBe(getCosmology('planck18'));
    expect(getCosmology('wmap9')).not.toBe(getCosmology('planck18'));
  });

  it('reject an unknown id with a message naming it', () => {
    expect(() => getCosmology('planck99' as CosmologyId)).toThrow(/unknown cosmology "planck99"/);
    expect(() => getCosmology('toString' as CosmologyId)).toThrow(/unknown cosmology "toString"/);
  });

  it('reject bad parameters with a message naming the parameter and the model', () => {
    const base = { name: 'mine', H0: 70, Om0: 0.3, Tcmb0: 2.7, Neff: 3.04, reference: 'test' };
    expect(() => createCosmology({ ...base, H0: -1 })).toThrow(CosmologyError);
    expect(() => createCosmology({ ...base, H0: -1 })).toThrow(/cosmology "mine": H0/);
    expect(() => createCosmology({ ...base, Om0: Number.NaN })).toThrow(/Om0/);
    expect(() => createCosmology({ ...base, mNuEv: [0.06] })).toThrow(/mNuEv has 1 masses, expected floor\(Neff\) = 3/);
  });

  it('reject a redshift ≤ −1 and an age outside (0, age today]', () => {
    const c = getCosmology('planck18');
    expect(() => c.ageGyr(-1)).toThrow(/redshift must be a number > -1, got -1/);
    expect(() => c.luminosityDistanceMpc(Number.NaN)).toThrow(/redshift/);
    expect(() => c.redshiftAtAgeGyr(20)).toThrow(/age 20 Gyr is outside \(0, 13\.78689\]/);
    expect(() => c.redshiftAtAgeGyr(0)).toThrow(/outside/);
  });

  it('reject a model without a big bang when its tables are built', () => {
    // ΩΛ = 2, Ωm = 0.1: E² = 0.1(1+z)³ − 1.1(1+z)² + 2 turns negative near z ≈ 2 (loitering/bounce).
    const bounce = createCosmology({ name: 'bounce', H0: 70, Om0: 0.1, Ode0: 2, Tcmb0: 0, Neff: 0, reference: 'test' });
    expect(() => bounce.ageGyr(1)).toThrow(/cosmology "bounce": E\(z\) is not positive/);
  });
});
