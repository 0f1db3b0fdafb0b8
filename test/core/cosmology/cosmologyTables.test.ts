import { describe, expect, it } from 'vitest';
import { buildCosmologyTables, TABLE_DU } from '../../../src/core/cosmology/cosmologyTables.ts';
import { kronrod15 } from '../../../src/core/cosmology/gaussKronrod.ts';
import { createExpansion } from '../../../src/core/cosmology/expansion.ts';
import { densityParameters } from '../../../src/core/cosmology/densityParameters.ts';
import { COSMOLOGY_PRESETS } from '../../../src/core/cosmology/presets.ts';
import { exp, expm1 } from '../../../src/core/math/index.ts';

describe('cosmology tables', () => {
  // The tables take 1/E once per node for both integrals of an interval; each step must be, bit
  // for bit, the 15-point rule applied to its own integrand (as the tables were first written).
  it('has every comoving and lookback step equal to kronrod15 of its integrand, bit for bit', () => {
    for (const params of [COSMOLOGY_PRESETS.planck18, COSMOLOGY_PRESETS.flat70, { ...COSMOLOGY_PRESETS.planck18, name: 'curved', Ode0: 0.6 }]) {
      const expansion = createExpansion(densityParameters(params));
      const t = buildCosmologyTables(expansion, params.name);
      const invE = (u: number): number => 1 / expansion.efunc(expm1(u));
      for (const i of [0, 1, 200, 320, 777, t.n - 1]) {
        const u0 = i * TABLE_DU;
        const u1 = u0 + TABLE_DU;
        const comoving = (t.comoving[i] as number) + kronrod15((u) => exp(u) * invE(u), u0, u1).value;
        const lookback = (t.lookback[i] as number) + kronrod15(invE, u0, u1).value;
        expect(Object.is(t.comoving[i + 1], comoving), `${params.name} comoving node ${i + 1}`).toBe(true);
        expect(Object.is(t.lookback[i + 1], lookback), `${params.name} lookback node ${i + 1}`).toBe(true);
      }
    }
  });

  it('stops with the cosmology named where E(z) is not positive', () => {
    const expansion = { efunc: (z: number) => (z > 3 ? -1 : 1), a4E2: () => 1 };
    expect(() => buildCosmologyTables(expansion, 'bounce')).toThrow(/cosmology "bounce": E\(z\) is not positive at z = 3\.0\d*/);
  });
});
