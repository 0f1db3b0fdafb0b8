import type { Cosmology } from '../../core/cosmology/index.ts';
import { logMassAfter } from '../../core/growth/index.ts';

/** One growth track: log mass (M_sun) against redshift from the seed redshift down to `zEnd`. */
export interface GrowthTrack {
  seed: 'light' | 'heavy';
  logMseed: number;
  points: { z: number; logM: number }[];
}

/**
 * Tracks of continuous growth at Eddington ratio `lambda` (default 1, duty cycle 1) from a light
 * and a heavy seed placed at `zSeed`: log M(z) = logMassAfter(log M_seed, t(z) − t(z_seed), ε, λ, f)
 * (src/core/growth), sampled at `samples` redshifts evenly spaced in cosmic time down to `zEnd`.
 */
export function growthTracks(
  cosmology: Cosmology,
  settings: { zSeed: number; efficiency: number; lightSeedMsun: number; heavySeedMsun: number },
  zEnd: number,
  lambda = 1,
  dutyCycle = 1,
  samples = 80,
): GrowthTrack[] {
  const tSeed = cosmology.ageGyr(settings.zSeed);
  const tEnd = cosmology.ageGyr(zEnd);
  const seeds = [
    ['light', settings.lightSeedMsun],
    ['heavy', settings.heavySeedMsun],
  ] as const;
  return seeds.map(([seed, msun]) => {
    const logMseed = Math.log10(msun);
    const points: GrowthTrack['points'] = [];
    for (let i = 0; i <= samples; i++) {
      const t = tSeed + ((tEnd - tSeed) * i) / samples;
      // exact ends: the seed redshift and zEnd themselves, not a round trip through the age inversion
      const z = i === 0 ? settings.zSeed : i === samples ? zEnd : cosmology.redshiftAtAgeGyr(t);
      points.push({ z, logM: logMassAfter(logMseed, t - tSeed, settings.efficiency, lambda, dutyCycle) });
    }
    return { seed, logMseed, points };
  });
}
