import type { Cosmology } from '../../core/cosmology/index.ts';

/** Round ages (Gyr) offered as ticks of the cosmic-time axis. */
const AGES_GYR = [0.1, 0.15, 0.2, 0.25, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10, 12];

/** A tick of the cosmic-time axis: where it sits (redshift) and what it reads (age). */
export interface AgeTick {
  z: number;
  ageGyr: number;
  label: string;
}

/** "300 Myr" below 1 Gyr, else "1.5 Gyr". */
export function formatAge(ageGyr: number): string {
  return ageGyr < 1 ? `${Math.round(ageGyr * 1000)} Myr` : `${Number(ageGyr.toPrecision(3))} Gyr`;
}

/**
 * Ticks for an age-of-the-universe axis over a redshift domain: round ages whose redshift lies
 * inside `zDomain`, thinned to at most `maxTicks` (every other one, then every third, …), then
 * kept only where a tick lies at least `minGap` (a fraction of the axis length) from the one
 * kept before it, so the labels never run together where ages crowd (low z on a long axis,
 * e.g. up to z_seed = 25).
 */
export function cosmicTimeTicks(cosmology: Cosmology, zDomain: readonly [number, number], maxTicks = 8, minGap = 0): AgeTick[] {
  const all = evenTicks(cosmology, zDomain, maxTicks);
  const span = Math.abs(zDomain[1] - zDomain[0]) || 1;
  const kept: AgeTick[] = [];
  for (const t of all) if (!kept.length || Math.abs(t.z - kept[kept.length - 1]!.z) / span >= minGap) kept.push(t);
  return kept;
}

function evenTicks(cosmology: Cosmology, zDomain: readonly [number, number], maxTicks: number): AgeTick[] {
  const zLo = Math.min(zDomain[0], zDomain[1]);
  const zHi = Math.max(zDomain[0], zDomain[1]);
  const ticks: AgeTick[] = [];
  const ageNow = cosmology.ageGyr(0);
  for (const t of AGES_GYR) {
    if (t >= ageNow) break;
    const z = cosmology.redshiftAtAgeGyr(t);
    if (z >= zLo && z <= zHi) ticks.push({ z, ageGyr: t, label: formatAge(t) });
  }
  for (let step = 2; ticks.length > maxTicks; step++) {
    const thinned = ticks.filter((_, i) => i % step === 0);
    if (thinned.length <= maxTicks) return thinned;
  }
  return ticks;
}
