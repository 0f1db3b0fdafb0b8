/**
 * Re-derives the whole population under a reading in web workers (one per core, at most 4).
 * The workers are started, fed the population's inputs (fetched once by each, from the build's
 * data/readings-inputs.json) and warmed up before the reader asks, by {@link startPopulation};
 * each keeps its objects' deviates between derivations (keptDrawBanks.ts);
 * a derivation then sends each worker only the reading and its slice's bounds, and the rows
 * come back packed in transferred typed arrays, in input order.
 */
import type { DeriveSettings } from '../../core/derive/types.ts';
import type { Reading } from '../../core/readings/reading.ts';
import type { RederivedRow } from './rederiveBatch.ts';
import { unpackRederived, type RederivedColumns } from './rederivedColumns.ts';
import type { LoadedPopulation, RederiveRequest, WarmUp } from './rederiveWorker.ts';
import { workerSlice } from './workerSlice.ts';

/** The population, loaded in the workers. */
export interface Population {
  ids: string[];
  z: Float64Array;
  /** NaN where the catalog has no host mass. */
  logMstar: Float64Array;
  /** The population's rows under `reading`, and the milliseconds the workers took. */
  derive(settings: DeriveSettings, reading: Reading): Promise<{ rows: RederivedRow[]; ms: number }>;
}

type Reply = { seq: number; error?: string; loaded?: LoadedPopulation; packed?: RederivedColumns };
let seq = 0;

function ask(worker: Worker, req: RederiveRequest): Promise<Reply> {
  return new Promise((resolve, reject) => {
    const onMessage = (e: MessageEvent<Reply>) => {
      if (e.data.seq !== req.seq) return;
      worker.removeEventListener('message', onMessage);
      worker.removeEventListener('error', onError);
      if (e.data.error !== undefined) reject(new Error(e.data.error));
      else resolve(e.data);
    };
    const onError = (e: ErrorEvent) => {
      worker.removeEventListener('message', onMessage);
      reject(new Error(e.message || 'the worker could not start'));
    };
    worker.addEventListener('message', onMessage);
    worker.addEventListener('error', onError);
    worker.postMessage(req);
  });
}

let started: Promise<Population> | null = null;

/**
 * Starts the workers and loads the population into each (once per page: later calls return the
 * same promise). `url`: the inputs file; `warm`: the readings each worker warms up with (its
 * slice under the first, or part of it for large slices; a few objects under the others), so
 * the first real derivation runs compiled code and finds the objects' deviates drawn.
 */
export function startPopulation(url: string, warm: WarmUp): Promise<Population> {
  started ??= (async () => {
    const n = Math.max(1, Math.min(4, navigator.hardwareConcurrency || 2));
    const workers = Array.from({ length: n }, () => new Worker(new URL('./rederiveWorker.ts', import.meta.url), { type: 'module' }));
    const replies = await Promise.all(workers.map((w, i) => ask(w, { type: 'load', seq: seq++, url, warm, worker: i, workers: workers.length, describe: i === 0 })));
    const first = replies[0]!.loaded!;
    const ids = first.ids!;
    const slices = workers.map((_, i) => workerSlice(first.n, i, workers.length));
    return {
      ids,
      z: first.z!,
      logMstar: first.logMstar!,
      async derive(settings, reading) {
        const t0 = performance.now();
        const parts = await Promise.all(workers.map((w, i) => ask(w, { type: 'derive', seq: seq++, from: slices[i]![0], to: slices[i]![1], settings, reading })));
        const rows = parts.flatMap((p, i) => unpackRederived(p.packed!, ids.slice(slices[i]![0], slices[i]![1])));
        return { rows, ms: performance.now() - t0 };
      },
    };
  })();
  started.catch(() => {
    started = null;
  });
  return started;
}
