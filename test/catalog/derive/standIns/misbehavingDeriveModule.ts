// TEST STAND-IN: the deriveObject stand-in, except that the object with id STALL never returns
// (a worker stuck mid-batch) and the object with id EXIT ends its worker thread with status 0
// (a worker that quits mid-batch without an error).
import type { DeriveSettings, DerivedObject, ObjectInputs } from '../../../../src/core/derive/types.ts';
import type { Rng } from '../../../../src/core/random/index.ts';
import { deriveObject as standIn } from './deriveObjectStandIn.ts';

export function deriveObject(inputs: ObjectInputs, settings: DeriveSettings, rng: Rng): DerivedObject {
  if (inputs.id === 'STALL') for (;;) Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, 1000);
  if (inputs.id === 'EXIT') process.exit(0);
  return standIn(inputs, settings, rng);
}
