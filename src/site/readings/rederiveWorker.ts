/// <reference lib="webworker" />
/**
 * Web worker of the live custom reading. `load` fetches the population's inputs (the build's
 * data/readings-inputs.json) once, keeps them, and derives its slice of the population once to
 * warm the code up and fill the objects' banks of deviates, kept for every later reading
 * (keptDrawBanks.ts); `derive` derives a slice under a reading and transfers the packed rows back.
 */
import type { DeriveSettings, ObjectInputs } from '../../core/derive/types.ts';
import type { Reading } from '../../core/readings/reading.ts';
import type { ReadingsInputsFile } from './readingsInputsFile.ts';
import { KeptDrawBanks } from './keptDrawBanks.ts';
import { rederiveBatch } from './rederiveBatch.ts';
import { packRederived } from './rederivedColumns.ts';
import { workerSlice } from './workerSlice.ts';

export type RederiveRequest =
  | { type: 'load'; seq: number; url: string; warm: { settings: DeriveSettings; reading: Reading }; worker: number; workers: number; describe: boolean }
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
const banks = new KeptDrawBanks();
/**
 * Object-draws of the warm-up: the whole slice up to WARM_SLICE_MAX (about 1 s on one core; the
 * demo's slices are 400,000, those of 10,000 objects × 200 draws on two workers 1,000,000), else
 * WARM_OBJECT_DRAWS, enough for the first real derivation to run optimised code.
 */
const WARM_SLICE_MAX = 2_000_000;
const WARM_OBJECT_DRAWS = 200_000;

async function load(req: Extract<RederiveRequest, { type: 'load' }>): Promise<LoadedPopulation> {
  const res = await fetch(req.url);
  if (!res.ok) throw new Error(`the population's inputs (${req.url}) could not be fetched: HTTP ${res.status}`);
  const file = (await res.json()) as ReadingsInputsFile;
  inputs = file.inputs;
  const draws = Math.max(1, req.warm.settings.draws);
  const [from, to] = workerSlice(inputs.length, req.worker, req.workers);
  const warm = (to - from) * draws <= WARM_SLICE_MAX ? to - from : Math.max(16, Math.ceil(WARM_OBJECT_DRAWS / draws));
  if (to > from) rederiveBatch(inputs.slice(from, Math.min(to, from + warm)), req.warm.settings, req.warm.reading, (o) => banks.randomFor(o.id, req.warm.settings));
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
      const packed = packRederived(rederiveBatch(inputs.slice(req.from, req.to), req.settings, req.reading, (o) => banks.randomFor(o.id, req.settings)));
      scope.postMessage({ seq: req.seq, packed }, [packed.values.buffer]);
    }
  } catch (err) {
    scope.postMessage({ seq: req.seq, error: err instanceof Error ? err.message : String(err) });
  }
};
