import { C_KM_S, GYR_S, MPC_KM } from '../constants/index.ts';
import type { Cosmology } from './cosmology.ts';
import type { CosmologyParams } from './cosmologyParams.ts';
import { buildCosmologyTables, interpolateTable, type CosmologyTables } from './cosmologyTables.ts';
import { densityParameters } from './densityParameters.ts';
import { createExpansion } from './expansion.ts';
import { uAtLnAge } from './ageInversion.ts';
import {
  ageInHubbleTimes,
  comovingBetweenInHubbleDistances,
  comovingInHubbleDistances,
  lookbackInHubbleTimes,
} from './hubbleIntegrals.ts';
import { exp, expm1, log, log1p } from '../math/index.ts';

function checkZ(name: string, z: number): void {
  if (!(z > -1)) throw new RangeError(`cosmology "${name}": redshift must be a number > -1, got ${z}`);
}

/**
 * Builds a {@link Cosmology} from parameters (validated; throws CosmologyError naming a bad
 * one). Cheap: the tables (≈1200 nodes) are built at the first distance or age call.
 */
export function createCosmology(params: CosmologyParams): Cosmology {
  const densities = densityParameters(params);
  const expansion = createExpansion(densities);
  const { name } = params;
  const hubbleTimeGyr = MPC_KM / params.H0 / GYR_S;
  const hubbleDistanceMpc = C_KM_S / params.H0;
  const { Ok0 } = densities;
  const sqrtOk = Math.sqrt(Math.abs(Ok0));

  let tables: CosmologyTables | null = null;
  const tab = (): CosmologyTables => (tables ??= buildCosmologyTables(expansion, name));

  /** D_C/D_H: table for 0 ≤ z ≤ z_max; z < 0 and z > z_max integrate directly. */
  const comovingHubble = (z: number): number => {
    checkZ(name, z);
    const t = tab();
    if (z < 0) return comovingInHubbleDistances(expansion, z);
    const u = log1p(z);
    if (u <= t.uMax) return interpolateTable(t, t.comoving, t.comovingSlope, u);
    return (t.comoving[t.n] as number) + comovingBetweenInHubbleDistances(expansion, 1 / (1 + z), exp(-t.uMax));
  };
  const transverseHubble = (z: number): number => {
    const dc = comovingHubble(z);
    // Flat is exact 0 for presets and flat custom models; curved models use the sinh/sin forms.
    if (Ok0 === 0) return dc;
    return Ok0 > 0 ? Math.sinh(sqrtOk * dc) / sqrtOk : Math.sin(sqrtOk * dc) / sqrtOk;
  };
  const ageHubble = (z: number): number => {
    checkZ(name, z);
    const t = tab();
    if (z === Infinity) return 0;
    if (z < 0) return exp(t.lnAge[0] as number) - lookbackInHubbleTimes(expansion, z);
    const u = log1p(z);
    if (u <= t.uMax) return exp(interpolateTable(t, t.lnAge, t.lnAgeSlope, u));
    return ageInHubbleTimes(expansion, 1 / (1 + z));
  };

  return {
    params,
    densities,
    hubbleTimeGyr,
    hubbleDistanceMpc,
    efunc: (z) => {
      checkZ(name, z);
      return expansion.efunc(z);
    },
    comovingDistanceMpc: (z) => hubbleDistanceMpc * comovingHubble(z),
    transverseComovingDistanceMpc: (z) => hubbleDistanceMpc * transverseHubble(z),
    luminosityDistanceMpc: (z) => hubbleDistanceMpc * transverseHubble(z) * (1 + z),
    angularDiameterDistanceMpc: (z) => (hubbleDistanceMpc * transverseHubble(z)) / (1 + z),
    lookbackTimeGyr: (z) => {
      checkZ(name, z);
      const t = tab();
      const u = log1p(z);
      // The lookback table avoids age(0) − age(z), which cancels at small z.
      if (z >= 0 && u <= t.uMax) return hubbleTimeGyr * interpolateTable(t, t.lookback, t.lookbackSlope, u);
      if (z < 0) return hubbleTimeGyr * lookbackInHubbleTimes(expansion, z);
      return hubbleTimeGyr * (exp(t.lnAge[0] as number) - ageHubble(z));
    },
    ageGyr: (z) => hubbleTimeGyr * ageHubble(z),
    redshiftAtAgeGyr: (tGyr) => {
      const t = tab();
      const age0 = hubbleTimeGyr * exp(t.lnAge[0] as number);
      if (!(tGyr > 0 && tGyr <= age0 * (1 + 1e-14))) {
        throw new RangeError(`cosmology "${name}": age ${tGyr} Gyr is outside (0, ${age0.toFixed(5)}] Gyr (big bang to today)`);
      }
      // Today exactly (or within rounding of it): z = 0 without a root search.
      if (tGyr >= age0) return 0;
      return expm1(uAtLnAge(t, expansion, log(tGyr / hubbleTimeGyr)));
    },
    differentialComovingVolumeMpc3Sr: (z) => {
      const dm = hubbleDistanceMpc * transverseHubble(z);
      return (hubbleDistanceMpc * dm * dm) / expansion.efunc(z);
    },
  };
}
