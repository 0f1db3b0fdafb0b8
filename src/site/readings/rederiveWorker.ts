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
import { detachOnce } from '../../shared/workers/detachOnce.ts';

export type RederiveRequest =
  | { type: 'load'; seq: number; url: string; warm: WarmUp; worker: number; workers: number; describe: boolean }
  | { type: 'derive'; seq: number; from: number; to: number; settings: DeriveSettings; reading: Reading };

/**
 * How a worker warms up: its slice under `readings[0]` (which fills the objects' banks of
 * deviates), then a few objects under each other reading, so that every path a reader's reading
 * may take (deflated widths, no dust, a fixed L_bol/λL5100, another ε) runs optimised code at the
 * first submit: warmed under one built-in reading only, the first submit derived 1.5–3× slower
 * than the next ones.
 */
export interface WarmUp {
  settings: DeriveSettings;
  readings: Reading[];
}

/** What `load` answers: the number of objects, and (when asked to describe) what the page draws besides the derived values. */
export interface LoadedPopulation {
  n: number;
  ids?: string[];
  z?: Float64Array;
  logMstar?: Float64Array;
}

const scope = self as unknown as Worker;
// Before the warm-up compiles anything: the answers transfer their buffers (see detachOnce).
detachOnce();
let inputs: ObjectInputs[] = [];
const banks = new KeptDrawBanks();
/**
 * Object-draws of the warm-up: under its first reading the whole slice up to WARM_SLICE_MAX
 * (about 1 s on one core; the demo's slices are 400,000, those of 10,000 objects × 200 draws on
 * two workers 1,000,000), else WARM_OBJECT_DRAWS; under each other reading WARM_OBJECT_DRAWS.
 */
const WARM_SLICE_MAX = 2_000_000;
const WARM_OBJECT_DRAWS = 200_000;

async function load(req: Extract<RederiveRequest, { type: 'load' }>): Promise<LoadedPopulation> {
  const res = await fetch(req.url);
  if (!res.ok) throw new Error(`the population's inputs (${req.url}) could not be fetched: HTTP ${res.status}`);
  const file = (await res.json()) as ReadingsInputsFile;
  inputs = file.inputs;
  const { settings, readings } = req.warm;
  const draws = Math.max(1, settings.draws);
  const [from, to] = workerSlice(inputs.length, req.worker, req.workers);
  const few = Math.max(16, Math.ceil(WARM_OBJECT_DRAWS / draws));
  const random = (o: ObjectInputs) => banks.randomFor(o.id, settings);
  readings.forEach((reading, i) => {
    const n = i === 0 && (to - from) * draws <= WARM_SLICE_MAX ? to - from : few;
    if (to > from) rederiveBatch(inputs.slice(from, Math.min(to, from + n)), settings, reading, random);
  });
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
