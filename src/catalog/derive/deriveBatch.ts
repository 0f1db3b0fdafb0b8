import type { DeriveSettings, DerivedObject, ObjectInputs } from '../../core/derive/types.ts';
import { createRng, seedFor } from '../../core/random/index.ts';
import type { Rng } from '../../core/random/index.ts';
import { ReusableDrawBank, type DrawBank } from '../../core/random/drawBank.ts';
import { drawCount } from '../../core/derive/drawCount.ts';
import { allocatePacked, packInto } from './packedDerived.ts';
import type { PackedDerived } from './packedDerived.ts';
import type { Reading } from '../../core/readings/reading.ts';
import { deriveUnderReading } from '../../core/readings/deriveUnderReading.ts';

/** The readings of a run: the primary one fills the main catalog; `list` fills the readings table. */
export interface BatchReadings {
  primary: Reading;
  list: readonly Reading[];
}

/** Signature of `deriveObject` (src/core/derive/deriveObject.ts). */
export type DeriveObjectFn = (inputs: ObjectInputs, settings: DeriveSettings, random: Rng | DrawBank) => DerivedObject;

/**
 * Derives every object of a batch, each with its own random stream seeded from
 * (settings.seed, id), so an object's result does not depend on the batch, its position
 * or the thread that runs it. A derivation that throws is recorded in `errors` (its numbers
 * stay NaN) instead of failing the batch.
 */
export function deriveBatch(
  inputs: readonly ObjectInputs[],
  settings: DeriveSettings,
  deriveObject: DeriveObjectFn,
  readings?: BatchReadings,
): PackedDerived {
  const packed = allocatePacked(inputs.length);
  const under = readings ? readings.list.map(() => allocatePacked(inputs.length)) : null;
  const rngOf = (id: string): Rng => createRng(seedFor(settings.seed, id));
  // One bank of deviates per object, shared by its readings: the same results as a fresh
  // stream per reading, with the deviates drawn once.
  const bank = new ReusableDrawBank();
  const draws = drawCount(settings);
  for (let i = 0; i < inputs.length; i++) {
    const input = inputs[i]!;
    try {
      const deviates = bank.reset(rngOf(input.id), draws);
      const main = readings ? deriveUnderReading(input, settings, readings.primary, deriveObject, deviates) : deriveObject(input, settings, deviates);
      packInto(packed, i, main);
      if (readings && under) {
        readings.list.forEach((r, j) => {
          const d = r.id === readings.primary.id ? main : deriveUnderReading(input, settings, r, deriveObject, deviates);
          packInto(under[j]!, i, d);
        });
      }
    } catch (error) {
      packed.errors[i] = error instanceof Error ? error.message : String(error);
      if (under) for (const u of under) u.errors[i] = packed.errors[i]!;
    }
  }
  if (under) packed.readings = under;
  return packed;
}
