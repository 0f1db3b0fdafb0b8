/// <reference lib="webworker" />
/**
 * Web worker of the live custom reading. `load` fetches the population's inputs (the build's
 * data/readings-inputs.json) once, keeps them, and derives one object to warm the code up;
 * `derive` derives a slice of them under a reading and transfers the packed rows back.
 */
import type { DeriveSettings, ObjectInputs } from '../../core/derive/types.ts';
import type { Reading } from '../../core/readings/reading.ts';
import type { ReadingsInputsFile } from './readingsInputsFile.ts';
import { rederiveBatch } from './rederiveBatch.ts';
import { packRederived } from './rederivedColumns.ts';

export type RederiveRequest =
  | { type: 'load'; seq: number; url: string; warm: { settings: DeriveSettings; reading: Reading }; describe: boolean }
  | { type: 'derive'; seq: number; from: number; to: number; settings: DeriveSettings; reading: Reading };

/** What `load` answers: the number of objects, and (when asked to describe) what the page draws besides the derived values. */
export interface LoadedPopulation {
  n: number;
  ids?: string[];
  z?: Float64Array;
  logMstar?: Float64Array;
}

const scope = self as unknown as Worker;
let inputs: ObjectInputs[] = [];
/** Object-draws of the warm-up (about 0.1 s on one core): enough for the first real derivation to run optimised code. */
const WARM_OBJECT_DRAWS = 200_000;

async function load(req: Extract<RederiveRequest, { type: 'load' }>): Promise<LoadedPopulation> {
  const res = await fetch(req.url);
  if (!res.ok) throw new Error(`the population's inputs (${req.url}) could not be fetched: HTTP ${res.status}`);
  const file = (await res.json()) as ReadingsInputsFile;
  inputs = file.inputs;
  // One object leaves the code interpreted; a few hundred thousand object-draws let the engine optimise it.
  const warm = Math.max(16, Math.ceil(WARM_OBJECT_DRAWS / Math.max(1, req.warm.settings.draws)));
  if (inputs.length) rederiveBatch(inputs.slice(0, warm), req.warm.settings, req.warm.reading);
  if (!req.describe) return { n: inputs.length };
  return {
    n: inputs.length,
    ids: inputs.map((o) => o.id),
    z: Float64Array.from(inputs, (o) => o.z),
    logMstar: Float64Array.from(file.logMstar, (x) => x ?? NaN),
  };
}

self.onmessage = async (e: MessageEvent<RederiveRequest>) => {
  const req = e.data;
  try {
    if (req.type === 'load') {
      const loaded = await load(req);
      scope.postMessage({ seq: req.seq, loaded }, [loaded.z?.buffer, loaded.logMstar?.buffer].filter((b): b is ArrayBuffer => b !== undefined));
    } else {
      const packed = packRederived(rederiveBatch(inputs.slice(req.from, req.to), req.settings, req.reading));
      scope.postMessage({ seq: req.seq, packed }, [packed.values.buffer]);
    }
  } catch (err) {
    scope.postMessage({ seq: req.seq, error: err instanceof Error ? err.message : String(err) });
  }
};
