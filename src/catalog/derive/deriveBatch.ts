import type { DeriveSettings, DerivedObject, ObjectInputs } from '../../core/derive/types.ts';
import { createRng, seedFor } from '../../core/random/index.ts';
import type { Rng } from '../../core/random/index.ts';
import { allocatePacked, packInto } from './packedDerived.ts';
import type { PackedDerived } from './packedDerived.ts';

/** Signature of `deriveObject` (src/core/derive/deriveObject.ts). */
export type DeriveObjectFn = (inputs: ObjectInputs, settings: DeriveSettings, rng: Rng) => DerivedObject;

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
): PackedDerived {
  const packed = allocatePacked(inputs.length);
  for (let i = 0; i < inputs.length; i++) {
    const input = inputs[i]!;
    try {
      packInto(packed, i, deriveObject(input, settings, createRng(seedFor(settings.seed, input.id))));
    } catch (error) {
      packed.errors[i] = error instanceof Error ? error.message : String(error);
    }
  }
  return packed;
}
